import Link from "next/link";
import type { OrderStatus } from "@/db/schema-orders";
import { formatMoney } from "@/lib/payments/money";
import { StatusBadge } from "./status-badge";

export type OrderRow = {
  id: string; ref: string; status: OrderStatus; buildTitle: string; currency: string; totalCents: number; expiresAt: Date | null;
  updatedAt: Date; lineCount: number; counterpart: string; href: string;
};

const day = (d: Date) => d.toLocaleDateString("en-GB", { day: "numeric", month: "short", timeZone: "UTC" });

/** One row per quote or order, newest change first. */
export function OrdersTable({ rows, counterpartLabel, empty }: { rows: OrderRow[]; counterpartLabel: string; empty: React.ReactNode }) {
  if (!rows.length) return <div className="rounded-lg border border-dashed border-line px-6 py-10 text-center text-muted">{empty}</div>;
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface">
      <table className="w-full min-w-[680px] text-sm">
        <thead className="border-b border-line text-left text-xs uppercase tracking-wide text-muted">
          <tr>
            <th scope="col" className="px-4 py-2 font-medium">Number</th>
            <th scope="col" className="px-3 py-2 font-medium">For the train</th>
            <th scope="col" className="px-3 py-2 font-medium">{counterpartLabel}</th>
            <th scope="col" className="px-3 py-2 font-medium">Status</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Total</th>
            <th scope="col" className="px-4 py-2 text-right font-medium">Updated</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id} className="border-b border-line/70 last:border-0 hover:bg-sunken/50">
              <td className="px-4 py-2.5"><Link href={r.href} className="code font-medium text-ink underline decoration-brass underline-offset-4">{r.ref}</Link></td>
              <td className="max-w-[18rem] truncate px-3 py-2.5" title={r.buildTitle}>{r.buildTitle}<span className="text-xs text-muted"> · {r.lineCount} part{r.lineCount === 1 ? "" : "s"}</span></td>
              <td className="px-3 py-2.5">{r.counterpart}</td>
              <td className="px-3 py-2.5"><StatusBadge status={r.status} expiresAt={r.expiresAt} /></td>
              <td className="num px-3 py-2.5 text-right font-medium">{formatMoney(r.totalCents, r.currency)}</td>
              <td className="num px-4 py-2.5 text-right text-muted">{day(r.updatedAt)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
