import Link from "next/link";
import type { OrderStatus } from "@/db/schema-orders";
import { formatMoney } from "@/lib/payments/money";
import { rowClass, Table } from "@/components/ui/table";
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
    <Table className="min-w-[680px]" columns={[
      { label: "Number" }, { label: "For the train" }, { label: counterpartLabel }, { label: "Status" },
      { label: "Total", right: true }, { label: "Updated", right: true },
    ]}>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id} className={`${rowClass} hover:bg-sunken/50`}>
              <td className="px-4 py-2.5"><Link href={r.href} className="code font-medium text-ink underline decoration-brass underline-offset-4">{r.ref}</Link></td>
              <td className="max-w-[18rem] truncate px-3 py-2.5" title={r.buildTitle}>{r.buildTitle}<span className="text-xs text-muted"> · {r.lineCount} part{r.lineCount === 1 ? "" : "s"}</span></td>
              <td className="px-3 py-2.5">{r.counterpart}</td>
              <td className="px-3 py-2.5"><StatusBadge status={r.status} expiresAt={r.expiresAt} /></td>
              <td className="num px-3 py-2.5 text-right font-medium">{formatMoney(r.totalCents, r.currency)}</td>
              <td className="num px-4 py-2.5 text-right text-muted">{day(r.updatedAt)}</td>
            </tr>
          ))}
        </tbody>
    </Table>
  );
}
