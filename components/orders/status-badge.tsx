import type { OrderStatus } from "@/db/schema-orders";
import { displayStatus, isExpired, STATUS_TONE, type StatusTone } from "@/lib/payments/status";

const TONE: Record<StatusTone, string> = {
  brass: "border-brass/60 bg-brass/15 text-brass-ink",
  glass: "border-glass/50 bg-glass/10 text-glass-ink",
  ok: "border-ok/40 bg-ok/10 text-ok",
  muted: "border-line bg-sunken text-muted",
  bad: "border-bad/40 bg-bad/10 text-bad",
};

export function StatusBadge({ status, expiresAt }: { status: OrderStatus; expiresAt: Date | string | null }) {
  const tone = isExpired({ status, expiresAt }) ? "bad" : STATUS_TONE[status];
  return <span data-status={status} className={`inline-flex items-center whitespace-nowrap rounded-full border px-2.5 py-0.5 text-xs font-semibold ${TONE[tone]}`}>{displayStatus({ status, expiresAt })}</span>;
}

const STEPS: { key: OrderStatus; label: string }[] = [
  { key: "requested", label: "Requested" }, { key: "quoted", label: "Quoted" }, { key: "awaiting_payment", label: "Paying" },
  { key: "paid", label: "Paid" }, { key: "shipped", label: "Shipped" },
];

/** Where the order stands, as a row of five stations; cancelled and refunded say so instead. */
export function StatusSteps({ status }: { status: OrderStatus }) {
  if (status === "cancelled" || status === "refunded") return null;
  const at = STEPS.findIndex((s) => s.key === status);
  return (
    <ol aria-label="Order progress" className="flex flex-wrap items-center gap-y-2 text-xs">
      {STEPS.map((s, i) => (
        <li key={s.key} aria-current={i === at ? "step" : undefined} className="flex items-center">
          <span className={`flex items-center gap-1.5 ${i <= at ? "text-ink" : "text-muted"}`}>
            <span aria-hidden className={`h-2.5 w-2.5 rounded-full border ${i < at ? "border-brass bg-brass" : i === at ? "border-brass bg-brass/30 ring-2 ring-brass/30" : "border-line bg-surface"}`} />
            <span className={i === at ? "font-semibold" : ""}>{s.label}</span>
          </span>
          {i < STEPS.length - 1 ? <span aria-hidden className={`mx-2 h-px w-6 sm:w-10 ${i < at ? "bg-brass" : "bg-line"}`} /> : null}
        </li>
      ))}
    </ol>
  );
}
