import { notFound } from "next/navigation";
import { listPendingMail } from "@/db/queries/jobs";
import { listOutboxMessages } from "@/db/queries/outbox";
import { PendingMailList } from "@/components/outbox/pending-mail";
import { PageTitle } from "@/components/ui/card";
import { getSessionUser } from "@/lib/auth/session";
import { mayReadOutbox } from "@/lib/dev/outbox-access";

export const metadata = { title: "Local outbox" };

function linkify(text: string) {
  return text.split(/(https?:\/\/\S+)/g).map((part, i) =>
    /^https?:\/\//.test(part) ? <a key={i} href={part} className="break-all underline decoration-brass underline-offset-2">{part}</a> : <span key={i}>{part}</span>);
}

export default async function OutboxPage() {
  if (!mayReadOutbox(await getSessionUser())) notFound();
  const [messages, pending] = await Promise.all([listOutboxMessages({ limit: 100 }), listPendingMail()]);
  return (
    <div className="max-w-4xl">
      <PageTitle title="Local outbox" lead="Mail sent by this copy of Trainyard stays here instead of leaving the machine. Newest first." />
      <PendingMailList items={pending} />
      <h2 className="mb-3 font-semibold text-ink">Sent <span className="num text-muted">({messages.length})</span></h2>
      {messages.length === 0 ? <p className="text-muted">No messages yet.</p> : (
        <ol className="space-y-3">
          {messages.map((m, i) => (
            <li key={i} className="rounded-lg border border-line bg-surface p-4">
              <div className="flex flex-wrap justify-between gap-2 text-sm">
                <span className="font-medium text-ink">{m.subject}</span>
                <time className="num text-muted" dateTime={m.createdAt.toISOString()}>{m.createdAt.toISOString().replace("T", " ").slice(0, 19)} UTC</time>
              </div>
              <div className="text-sm text-muted">to {m.to}</div>
              <p className="mt-2 whitespace-pre-wrap text-sm">{linkify(m.text ?? "")}</p>
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
