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

// Fit states differ by shape, fill and words as well as colour: night mode shows every
// state in the same red, so an outlined tick and a filled cross must tell them apart.
export function FitBadge({ fits }: { fits: boolean }) {
  return fits
    ? <span data-state="fits" className="inline-flex items-center gap-1 rounded-full border border-ok/60 px-2.5 py-0.5 text-xs font-medium text-ok"><span aria-hidden>✓</span>Still fits</span>
    : <span data-state="broken" className="inline-flex items-center gap-1 rounded-full bg-bad px-2.5 py-0.5 text-xs font-bold text-bg"><span aria-hidden>✕</span>No longer fits</span>;
}

export function HiddenBadge() {
  return <span className="inline-flex items-center gap-1 rounded-full border border-dashed border-warn px-2.5 py-0.5 text-xs font-semibold text-warn"><span aria-hidden>⊘</span>Hidden</span>;
}

/** The full row of a build's labels, as its page and the review queue show it. */
export function BuildBadges({ endorsed, fits, visibility, hidden, className = "gap-2" }: { endorsed: boolean; fits: boolean; visibility: string; hidden: boolean; className?: string }) {
  return (
    <div className={`flex flex-wrap items-center ${className}`}>
      {endorsed ? <ReferenceBadge /> : null}
      <FitBadge fits={fits} />
      <VisibilityBadge visibility={visibility} />
      {hidden ? <HiddenBadge /> : null}
    </div>
  );
}
