// Talking to the running app in integration tests: a tiny cookie-keeping client.
export const BASE_URL = process.env.TRAINYARD_BASE_URL ?? "";
export const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "trainyard-demo";

if (!BASE_URL) throw new Error("BASE_URL is not set: run integration tests through `npm test`.");

export class Client {
  private cookies = new Map<string, string>();

  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  async request(path: string, init: RequestInit & { json?: unknown } = {}): Promise<Response> {
    const headers = new Headers(init.headers);
    headers.set("origin", BASE_URL);
    if (this.cookies.size) headers.set("cookie", this.cookieHeader());
    let body = init.body;
    if (init.json !== undefined) {
      headers.set("content-type", "application/json");
      body = JSON.stringify(init.json);
    }
    const res = await fetch(`${BASE_URL}${path}`, { ...init, headers, body, redirect: init.redirect ?? "manual" });
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const i = pair.indexOf("=");
      const name = pair.slice(0, i).trim();
      const value = pair.slice(i + 1).trim();
      if (value === "" || /max-age=0/i.test(c)) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
    return res;
  }

  get(path: string) { return this.request(path); }
  post(path: string, json?: unknown) { return this.request(path, { method: "POST", json }); }
  patch(path: string, json?: unknown) { return this.request(path, { method: "PATCH", json }); }
  delete(path: string) { return this.request(path, { method: "DELETE" }); }

  async signIn(email: string, password = DEMO_PASSWORD) {
    const res = await this.post("/api/auth/sign-in/email", { email, password });
    if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${await res.text()}`);
    return this;
  }
}

export async function signedIn(email: string) {
  return new Client().signIn(email);
}

export type OutboxMessage = { to: string; subject: string; text: string; html: string; createdAt: string };

// The outbox is for admins only (it holds reset links): tests read it as the demo admin.
let outboxReader: Promise<Client> | undefined;

export async function outboxFor(email: string): Promise<OutboxMessage[]> {
  outboxReader ??= new Client().signIn("admin@trainyard.test");
  const res = await (await outboxReader).get(`/api/dev/outbox`);
  if (!res.ok) throw new Error(`outbox answered ${res.status}`);
  const { messages } = (await res.json()) as { messages: OutboxMessage[] };
  return messages.filter((m) => m.to.toLowerCase().includes(email.toLowerCase()));
}

/** Mail is delivered through SMTP asynchronously, by the job worker; poll (a loaded machine can take seconds). */
export async function waitForMail(email: string, subjectPart: string, timeoutMs = 30_000): Promise<OutboxMessage> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await outboxFor(email)).find((m) => m.subject.includes(subjectPart));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no "${subjectPart}" mail for ${email}`);
}

/**
 * Wait until the mail queue is empty (up to `timeoutMs`): a test file that sends many mails
 * calls it last, so the next file's mail is not stuck behind its backlog.
 */
export async function waitForMailQueue(timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    outboxReader ??= new Client().signIn("admin@trainyard.test");
    const res = await (await outboxReader).get(`/api/dev/outbox`);
    if (!res.ok) throw new Error(`outbox answered ${res.status}`);
    if (!((await res.json()) as { pending: unknown[] }).pending.length) return;
    await new Promise((r) => setTimeout(r, 250));
  }
}

export function firstLink(text: string): string {
  const m = text.match(/https?:\/\/\S+/);
  if (!m) throw new Error("no link in message");
  return m[0];
}

export const uniqueEmail = (tag: string) => `${tag}-${Date.now()}-${Math.floor(Math.random() * 1e6)}@example.org`;
