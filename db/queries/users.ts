import "server-only";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { user } from "@/db/schema";

export async function listUsers({ limit = 200 }: { limit?: number } = {}) {
  return db.select({ id: user.id, email: user.email, name: user.name, role: user.role, emailVerified: user.emailVerified, createdAt: user.createdAt })
    .from(user).orderBy(asc(user.createdAt)).limit(limit);
}

/** Name and e-mail of one user, for mail about their own things. */
export async function getUserContact({ id }: { id: string }) {
  const [row] = await db.select({ email: user.email, name: user.name }).from(user).where(eq(user.id, id)).limit(1);
  return row ?? null;
}
