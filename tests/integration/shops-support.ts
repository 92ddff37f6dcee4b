// Shared by the shop integration tests: fresh verified users, a fresh shop of their own, and
// small request helpers (PUT, raw CSV bodies, API keys).
import pg from "pg";
import { DEMO_CASES } from "@/seed/catalog/index";
import { Client, firstLink, uniqueEmail, waitForMail } from "../support/http";

export const PASSWORD = "shop test password 7";

export async function newVerifiedUser(tag: string): Promise<{ client: Client; email: string }> {
  const email = uniqueEmail(tag);
  const c = new Client();
  const res = await c.post("/api/auth/sign-up/email", { name: `Test ${tag}`, email, password: PASSWORD });
  if (res.status !== 200) throw new Error(`sign-up failed: ${res.status} ${await res.text()}`);
  const link = new URL(firstLink((await waitForMail(email, "Confirm your e-mail")).text));
  await new Client().request(link.pathname + link.search);
  return { client: await new Client().signIn(email, PASSWORD), email };
}

/** A new user who creates (and so owns) a new, empty shop through better-auth's organization API. */
export async function newShop(tag: string) {
  const owner = await newVerifiedUser(`${tag}-owner`);
  const slug = `${tag}-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e4)}`;
  const res = await owner.client.post("/api/auth/organization/create", { name: `Test Shop ${tag}`, slug });
  if (res.status !== 200) throw new Error(`shop create failed: ${res.status} ${await res.text()}`);
  return { owner, slug };
}

export const put = (c: Client, path: string, json: unknown, headers: Record<string, string> = {}) =>
  c.request(path, { method: "PUT", json, headers });

export const postCsv = (c: Client, slug: string, csv: string | Uint8Array<ArrayBuffer>, confirm = false) =>
  c.request(`/api/v1/shops/${slug}/inventory/import${confirm ? "?confirm=1" : ""}`, { method: "POST", headers: { "content-type": "text/csv" }, body: csv });

export const bearer = (key: string) => ({ authorization: `Bearer ${key}` });

export async function inventoryOf(c: Client, slug: string, headers: Record<string, string> = {}) {
  const res = await c.request(`/api/v1/shops/${slug}/inventory`, { headers });
  if (res.status !== 200) throw new Error(`inventory ${res.status}`);
  return (await res.json()).items as { slug: string; sku: string; priceCents: number; currency: string; onHand: number; reserved: number; available: number }[];
}

const f = DEMO_CASES.flagship;
/** The demo flagship question (55 mm flattener, 2-inch wheel, cooled camera) with a parts source. */
export const flagshipWith = (source: unknown) => ({
  optics: { partId: f.telescope }, corrector: { partId: f.optics }, camera: { partId: f.camera },
  stations: f.stations.map((partId) => ({ partId })), filters: [{ thicknessMm: f.filterThicknessMm }], source,
});

/** Direct SQL for what only the orders flow does (reserving stock); the test runner sets DATABASE_URL. */
export async function sql<T = unknown>(text: string, values: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await client.connect();
  try { return (await client.query(text, values)).rows as T[]; } finally { await client.end(); }
}
