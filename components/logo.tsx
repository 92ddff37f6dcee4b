/** The Trainyard mark: three cars of different lengths coupled by brass joints. */
export function Logo({ className = "" }: { className?: string }) {
  return (
    <svg viewBox="0 0 44 16" className={className} aria-hidden>
      <rect x="0.75" y="3.75" width="12" height="8.5" rx="2" fill="none" stroke="currentColor" strokeWidth="1.5" />
      <rect x="16.75" y="5.25" width="7" height="5.5" rx="1" fill="none" stroke="currentColor" strokeWidth="1.5" />
      <rect x="27.75" y="2.75" width="15.5" height="10.5" rx="1.5" fill="none" stroke="currentColor" strokeWidth="1.5" />
      <rect x="13" y="7" width="3.5" height="2" fill="var(--c-brass)" />
      <rect x="24" y="7" width="3.5" height="2" fill="var(--c-brass)" />
    </svg>
  );
}
