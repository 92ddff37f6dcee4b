import type { PendingMail } from "@/db/queries/jobs";

const STATE: Record<string, string> = { created: "waiting", retry: "retrying", active: "sending" };
const when = (d: Date) => `${d.toISOString().replace("T", " ").slice(0, 19)} UTC`;

/** Mail queued but not yet accepted by the mail server (lib/jobs): shown above what was sent. */
export function PendingMailList({ items }: { items: PendingMail[] }) {
  return (
    <section aria-labelledby="pending-heading" className="mb-8 space-y-3">
      <h2 id="pending-heading" className="font-semibold text-ink">Waiting to send <span className="num text-muted">({items.length})</span></h2>
      {items.length === 0 ? <p className="text-sm text-muted">Nothing waiting: every queued message has reached the mail server.</p> : (
        <ol className="space-y-2">
          {items.map((m) => (
            <li key={m.id} className="flex flex-wrap justify-between gap-2 rounded-lg border border-dashed border-line bg-surface px-4 py-3 text-sm">
              <span><span className="font-medium text-ink">{m.subject}</span> <span className="text-muted">to {m.to}</span></span>
              <span className="num text-muted">
                {STATE[m.state] ?? m.state}{m.retryCount ? ` · ${m.retryCount} failed attempt${m.retryCount === 1 ? "" : "s"}, next at ${when(m.startAfter)}` : ` · queued ${when(m.createdOn)}`}
              </span>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
