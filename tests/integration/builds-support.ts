// Shared by the builds integration tests: the flagship plan and a way to save it.
import { DEMO_CASES } from "@/seed/catalog/index";
import { Client } from "../support/http";

const f = DEMO_CASES.flagship;

/** The body of POST /api/v1/solve for the demo flagship train (catalog references). */
export const flagshipRequest = {
  optics: { partId: f.telescope },
  corrector: { partId: f.optics },
  camera: { partId: f.camera },
  stations: f.stations.map((partId) => ({ partId })),
  filters: [{ thicknessMm: f.filterThicknessMm }],
  source: { kind: "catalog" },
};

export type Visibility = "private" | "unlisted" | "public";

export async function saveBuild(owner: Client, visibility: Visibility, extra: Record<string, unknown> = {}): Promise<string> {
  const res = await owner.post("/api/v1/builds", {
    title: `Flagship ${visibility} ${Date.now()}-${Math.floor(Math.random() * 1e6)}`,
    notes: "Two M48 spacers between the flattener and the wheel.",
    visibility, request: flagshipRequest, solutionIndex: 0, ...extra,
  });
  if (res.status !== 201) throw new Error(`save failed: ${res.status} ${await res.text()}`);
  const { slug } = (await res.json()) as { slug: string };
  return slug;
}

export type Viewers = { owner: Client; other: Client; moderator: Client; anon: Client };

export async function viewers(): Promise<Viewers & { admin: Client }> {
  const [owner, other, moderator, admin] = await Promise.all([
    new Client().signIn("member@trainyard.test"),
    new Client().signIn("shop@trainyard.test"),
    new Client().signIn("moderator@trainyard.test"),
    new Client().signIn("admin@trainyard.test"),
  ]);
  return { owner, other, moderator, admin, anon: new Client() };
}
