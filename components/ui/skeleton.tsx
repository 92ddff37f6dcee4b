// Quiet placeholders while a page's data is on its way: flat blocks in the page's own
// surfaces (no shimmer, no spinner), announced once to screen readers.
import type { ReactNode } from "react";

/** A grey block where text or a figure will be. */
export function Bone({ className = "" }: { className?: string }) {
  return <div aria-hidden className={`animate-pulse rounded bg-sunken ${className}`} />;
}

/** A region that is loading: busy, with its words for screen readers only. */
export function LoadingRegion({ label, className = "", children }: { label: string; className?: string; children: ReactNode }) {
  return (
    <div role="status" aria-busy="true" aria-live="polite" className={className}>
      <span className="sr-only">{label}</span>
      {children}
    </div>
  );
}

/** Where a page title and its lead will be. */
export function TitleBones() {
  return (
    <div className="mb-6 space-y-2">
      <Bone className="h-8 w-56" />
      <Bone className="h-4 w-full max-w-xl" />
    </div>
  );
}

/** Cards in a grid, each with a heading line and two lines of text. */
export function CardBones({ count = 4, className = "grid gap-4 sm:grid-cols-2" }: { count?: number; className?: string }) {
  return (
    <div className={className}>
      {Array.from({ length: count }, (_, i) => (
        <div key={i} className="space-y-2 rounded-lg border border-line bg-surface p-5">
          <Bone className="h-4 w-1/3" /><Bone className="h-3 w-full" /><Bone className="h-3 w-2/3" />
        </div>
      ))}
    </div>
  );
}

/** A bordered table: a header rule and `rows` lines. */
export function TableBones({ rows = 8 }: { rows?: number }) {
  return (
    <div className="rounded-lg border border-line bg-surface">
      <div className="border-b border-line px-4 py-2.5"><Bone className="h-3 w-1/2" /></div>
      {Array.from({ length: rows }, (_, i) => (
        <div key={i} className="flex gap-4 border-b border-line/70 px-4 py-3 last:border-0">
          <Bone className="h-3.5 flex-[2]" /><Bone className="h-3.5 flex-1" /><Bone className="h-3.5 w-16" />
        </div>
      ))}
    </div>
  );
}
