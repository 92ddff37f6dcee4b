// GET /api/v1/admin/users — accounts and their roles (admins only)
import { listUsers } from "@/db/queries/users";
import { withSession } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

export const GET = withSession(async () => Response.json({ items: await listUsers() }), { permission: { user: "list" } });
