// GET /api/dev/outbox — messages caught by the local mail fake, newest first (admins only; absent with real SMTP)
import { listOutboxMessages } from "@/db/queries/outbox";
import { withSession } from "@/lib/auth/session";
import { mayReadOutbox } from "@/lib/dev/outbox-access";
import { AppError } from "@/lib/errors";

export const dynamic = "force-dynamic";

export const GET = withSession(async (request, { user }) => {
  // 404, not 403: the outbox does not exist for anyone else.
  if (!mayReadOutbox(user)) throw new AppError("not_found", "Not found.");
  const to = new URL(request.url).searchParams.get("to")?.toLowerCase();
  const messages = await listOutboxMessages({ limit: 200 });
  return Response.json({ messages: to ? messages.filter((m) => m.to.toLowerCase().includes(to)) : messages });
}, { anonymous: true });
