/** A to-scale drawing for the home page: corrector → spacer → wheel → camera, 55 mm. */
const SCALE = 3.4; // px per mm
const ITEMS = [
  { label: "spacer", mm: 18, kind: "part" },
  { label: "filter wheel", mm: 20, kind: "station" },
  { label: "camera", mm: 17.5, kind: "camera" },
] as const;

export function HeroTrain() {
  const x0 = 96;
  let x = x0;
  const boxes = ITEMS.map((it, i) => {
    const w = it.mm * SCALE;
    const g = (
      <g key={it.label}>
        <rect x={x} y={it.kind === "camera" ? 42 : 50} width={w} height={it.kind === "camera" ? 40 : 24} rx={it.kind === "camera" ? 6 : 2}
          fill={it.kind === "station" ? "var(--c-station)" : "var(--c-surface)"} stroke="var(--c-ink)" strokeWidth="1.2" />
        <rect x={x - 2} y={57} width="4" height="10" fill="var(--c-brass)" />
        <text x={x + w / 2} y={i % 2 ? 34 : 102} textAnchor="middle" fontSize="9" fill="var(--c-muted)">{it.label}</text>
        <text x={x + w / 2} y={i % 2 ? 24 : 113} textAnchor="middle" fontSize="9" fill="var(--c-text)" className="num">{it.mm} mm</text>
      </g>
    );
    x += w;
    return g;
  });
  const end = x;
  return (
    <svg viewBox="0 0 320 150" className="h-auto w-full" role="img" aria-label="A flattener, an 18 mm spacer, a 20 mm filter wheel and a camera 17.5 mm deep: 55.5 mm, inside the 55.7 ± 0.5 mm window a 55 mm back focus asks for with 2 mm of filter glass">
      <path d={`M12 32 L${x0 - 8} 32 L${x0} 40 L${x0} 84 L${x0 - 8} 92 L12 92 Z`} fill="color-mix(in srgb, var(--c-glass) 16%, var(--c-surface))" stroke="var(--c-glass)" strokeWidth="1.2" />
      <text x={(12 + x0) / 2} y={66} textAnchor="middle" fontSize="9" fill="var(--c-glass-ink)">flattener</text>
      {boxes}
      <line x1={end} y1={38} x2={end} y2={88} stroke="var(--c-ok)" strokeWidth="2" />
      <line x1={x0} y1={128} x2={end} y2={128} stroke="var(--c-ink)" strokeWidth="1" />
      <line x1={x0} y1={123} x2={x0} y2={133} stroke="var(--c-ink)" />
      <line x1={end} y1={121} x2={end} y2={135} stroke="var(--c-ok)" strokeWidth="2" />
      <text x={(x0 + end) / 2} y={145} textAnchor="middle" fontSize="9.5" fill="var(--c-text)" className="num">55.5 mm — target 55 + 0.7 for the filter glass, ± 0.5</text>
    </svg>
  );
}
