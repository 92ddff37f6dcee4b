// GET /api/dev/outbox — messages caught by the local mail fake, newest first (admins only; absent with real SMTP)
import { listPendingMail } from "@/db/queries/jobs";
import { listOutboxMessages } from "@/db/queries/outbox";
import { withSession } from "@/lib/auth/session";
import { mayReadOutbox } from "@/lib/dev/outbox-access";
import { AppError } from "@/lib/errors";

export const dynamic = "force-dynamic";

export const GET = withSession(async (request, { user }) => {
  // 404, not 403: the outbox does not exist for anyone else.
  if (!mayReadOutbox(user)) throw new AppError("not_found", "Not found.");
  const to = new URL(request.url).searchParams.get("to")?.toLowerCase();
  const [messages, pending] = await Promise.all([listOutboxMessages({ limit: 200 }), listPendingMail({ limit: 200 })]);
  const mine = <T extends { to: string }>(list: T[]) => (to ? list.filter((m) => m.to.toLowerCase().includes(to)) : list);
  return Response.json({ messages: mine(messages), pending: mine(pending) });
}, { anonymous: true });
