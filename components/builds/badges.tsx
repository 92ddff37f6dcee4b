// Small labels a build carries: reference, visibility, fit, hidden.

export function ReferenceBadge() {
  return (
    <span className="inline-flex items-center gap-1 rounded-full border border-brass/60 bg-brass/15 px-2.5 py-0.5 text-xs font-semibold text-brass-ink" title="Checked and endorsed by a moderator">
      <svg aria-hidden viewBox="0 0 12 12" className="h-3 w-3"><path d="M6 .8l1.5 3.2 3.5.4-2.6 2.4.7 3.5L6 8.6 2.9 10.3l.7-3.5L1 4.4l3.5-.4z" fill="currentColor" /></svg>
      Reference build
    </span>
  );
}

export function VisibilityBadge({ visibility }: { visibility: string }) {
  const label = visibility === "private" ? "Private" : visibility === "unlisted" ? "Unlisted" : "Public";
  return <span className="rounded-full border border-line px-2.5 py-0.5 text-xs text-muted">{label}</span>;
}

export function FitBadge({ fits }: { fits: boolean }) {
  return fits
    ? <span className="rounded-full bg-ok/10 px-2.5 py-0.5 text-xs font-medium text-ok">Still fits</span>
    : <span className="rounded-full bg-bad/10 px-2.5 py-0.5 text-xs font-semibold text-bad">No longer fits</span>;
}

export function HiddenBadge() {
  return <span className="rounded-full bg-warn/15 px-2.5 py-0.5 text-xs font-semibold text-warn">Hidden</span>;
}
