// GET /api/dev/outbox — messages caught by the local mail fake, newest first (absent with real SMTP)
import { listPendingMail } from "@/db/queries/jobs";
import { listOutboxMessages } from "@/db/queries/outbox";
import { toErrorResponse, AppError } from "@/lib/errors";
import { isMailFake } from "@/lib/mail";

export const dynamic = "force-dynamic";

export async function GET(request: Request) {
  if (!isMailFake()) return toErrorResponse(new AppError("not_found", "Not found."));
  const to = new URL(request.url).searchParams.get("to")?.toLowerCase();
  const [messages, pending] = await Promise.all([listOutboxMessages({ limit: 200 }), listPendingMail({ limit: 200 })]);
  const mine = <T extends { to: string }>(list: T[]) => (to ? list.filter((m) => m.to.toLowerCase().includes(to)) : list);
  return Response.json({ messages: mine(messages), pending: mine(pending) });
}
