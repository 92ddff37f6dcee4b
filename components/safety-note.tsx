export function SafetyNote({ compact = false }: { compact?: boolean }) {
  return (
    <aside role="note" aria-label="Safety" className="rounded-lg border border-warn/40 bg-warn/5 px-4 py-3 text-sm text-text">
      <p><strong className="text-warn">Never point a telescope, finder or camera lens at the Sun</strong> unless a certified full-aperture solar filter is fitted securely over the front of the objective. Sunlight focused through optics can blind in an instant and destroy a sensor.</p>
      {compact ? null : <p className="mt-1.5">Heavy trains can overload a focuser or let it slip: check the load your focuser is rated for, and follow your equipment maker&apos;s manual and local practice.</p>}
    </aside>
  );
}
