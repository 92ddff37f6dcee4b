import type { ReactNode } from "react";

export function AuthCard({ title, lead, children, footer }: { title: string; lead?: string; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="rounded-xl border border-line bg-surface p-6 shadow-[0_1px_0_var(--c-line)] sm:p-8">
      <h1 className="text-xl font-semibold tracking-tight text-ink">{title}</h1>
      {lead ? <p className="mt-1 text-sm text-muted">{lead}</p> : null}
      <div className="mt-6">{children}</div>
      {footer ? <div className="mt-6 border-t border-line pt-4 text-sm text-muted">{footer}</div> : null}
    </div>
  );
}
