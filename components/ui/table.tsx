// A bordered, sideways-scrolling table with the house header row; rows bring their own cells.
import type { ReactNode } from "react";

export type TableColumn = {
  label: ReactNode;
  /** Numbers: right-aligned. */
  right?: boolean;
  /** Hidden on a phone (the row folds it into another cell). */
  wide?: boolean;
};

/** A body row's rule, lighter than the header's, none under the last row. */
export const rowClass = "border-b border-line/70 last:border-0";

function headClass(c: TableColumn, i: number, n: number): string {
  const pad = i === 0 || i === n - 1 ? "px-4" : "px-3";
  return `${c.wide ? "hidden sm:table-cell " : ""}${pad} py-2 font-medium${c.right ? " text-right" : ""}`;
}

/** `children`: the tbody (and a tfoot); `after`: anything below the table inside the frame. */
export function Table({ columns, caption, className, children, after }: {
  columns: TableColumn[]; caption?: string; className?: string; children: ReactNode; after?: ReactNode;
}) {
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface">
      <table className={`w-full text-sm${className ? ` ${className}` : ""}`}>
        {caption ? <caption className="sr-only">{caption}</caption> : null}
        <thead className="border-b border-line text-left text-xs uppercase tracking-wide text-muted">
          <tr>{columns.map((c, i) => <th key={i} scope="col" className={headClass(c, i, columns.length)}>{c.label}</th>)}</tr>
        </thead>
        {children}
      </table>
      {after}
    </div>
  );
}
