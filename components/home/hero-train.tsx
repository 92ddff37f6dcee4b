/** A small to-scale drawing for the home page: corrector → spacer → wheel → camera, 55 mm. */
export function HeroTrain() {
  const items = [
    { label: "flattener", w: 70, kind: "optic" },
    { label: "spacer 16.5", w: 33, kind: "part" },
    { label: "filter wheel 20", w: 40, kind: "station" },
    { label: "camera 17.5", w: 35, kind: "camera" },
  ];
  let x = 10;
  return (
    <svg viewBox="0 0 300 120" className="h-auto w-full" role="img" aria-label="A corrector, a spacer, a filter wheel and a camera, adding up to 55 millimetres of back focus">
      {items.map((it, i) => {
        const el = (
          <g key={it.label}>
            <rect x={x} y={it.kind === "optic" ? 24 : 36} width={it.w} height={it.kind === "optic" ? 48 : 24} rx={it.kind === "camera" ? 5 : 2}
              fill={it.kind === "optic" ? "color-mix(in srgb, var(--c-glass) 18%, var(--c-surface))" : it.kind === "station" ? "var(--c-station)" : "var(--c-surface)"}
              stroke={it.kind === "optic" ? "var(--c-glass)" : "var(--c-ink)"} strokeWidth="1.2" />
            <text x={x + it.w / 2} y={92} textAnchor="middle" fontSize="7.5" fill="var(--c-muted)">{it.label}</text>
            {i > 0 ? <rect x={x - 2} y={44} width="4" height="8" fill="var(--c-brass)" /> : null}
          </g>
        );
        x += it.w;
        return el;
      })}
      <line x1="80" y1="106" x2="188" y2="106" stroke="var(--c-ink)" strokeWidth="1" />
      <line x1="80" y1="102" x2="80" y2="110" stroke="var(--c-ink)" />
      <line x1="188" y1="100" x2="188" y2="112" stroke="var(--c-ok)" strokeWidth="2" />
      <text x="134" y="118" textAnchor="middle" fontSize="8" fill="var(--c-text)" className="num">55.0 mm to the sensor</text>
    </svg>
  );
}
