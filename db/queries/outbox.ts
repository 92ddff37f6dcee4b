import "server-only";
import { desc } from "drizzle-orm";
import { db } from "@/db/client";
import { mailOutbox } from "@/db/schema";

export async function listOutboxMessages({ limit = 100 }: { limit?: number } = {}) {
  return db.select({
    to: mailOutbox.to, subject: mailOutbox.subject, text: mailOutbox.text, html: mailOutbox.html, createdAt: mailOutbox.createdAt,
  }).from(mailOutbox).orderBy(desc(mailOutbox.createdAt)).limit(limit);
}
