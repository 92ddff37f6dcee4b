// GET /api/dev/outbox — messages caught by the local mail fake, newest first (absent with real SMTP)
import { listOutboxMessages } from "@/db/queries/outbox";
import { toErrorResponse, AppError } from "@/lib/errors";
import { isMailFake } from "@/lib/mail";

export const dynamic = "force-dynamic";

export async function GET(request: Request) {
  if (!isMailFake()) return toErrorResponse(new AppError("not_found", "Not found."));
  const to = new URL(request.url).searchParams.get("to")?.toLowerCase();
  const messages = await listOutboxMessages({ limit: 200 });
  return Response.json({ messages: to ? messages.filter((m) => m.to.toLowerCase().includes(to)) : messages });
}
