// GET /api/health — is the app up and can it reach its database?
import { pingDb } from "@/db/client";

export const dynamic = "force-dynamic";

export async function GET() {
  const up = await pingDb();
  return Response.json(up ? { ok: true, db: "up" } : { ok: false, db: "down" }, { status: up ? 200 : 503 });
}
