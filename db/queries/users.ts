import "server-only";
import { asc } from "drizzle-orm";
import { db } from "@/db/client";
import { user } from "@/db/schema";

export async function listUsers({ limit = 200 }: { limit?: number } = {}) {
  return db.select({ id: user.id, email: user.email, name: user.name, role: user.role, emailVerified: user.emailVerified, createdAt: user.createdAt })
    .from(user).orderBy(asc(user.createdAt)).limit(limit);
}
