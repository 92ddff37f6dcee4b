import { getInterface, interfaceHue } from "@/lib/interfaces";

/**
 * A part's face seen from the side: threads draw teeth outside (male) or inside (female);
 * barrels draw a plain tube (male) or a clamp ring with a thumbscrew (female); bayonets, lugs.
 */
export function FaceGlyph({ code, gender, size = 56, side = "rear" }: { code: string; gender: "male" | "female"; size?: number; side?: "front" | "rear" }) {
  const spec = getInterface(code);
  const kind = spec?.kind ?? "thread";
  const color = `hsl(${interfaceHue(code)} 55% 42%)`;
  const h = size, w = size * 0.7, mid = w / 2;
  const teeth: React.ReactNode[] = [];
  const male = gender === "male";
  const bodyX = male ? w * 0.3 : w * 0.15;
  const bodyW = male ? w * 0.4 : w * 0.7;
  if (kind === "thread") {
    for (let y = h * 0.18; y < h * 0.82; y += h * 0.09) {
      teeth.push(male
        ? <path key={y} d={`M${bodyX} ${y} l${-w * 0.12} ${h * 0.045} l${w * 0.12} ${h * 0.045}`} fill="none" stroke={color} strokeWidth="1.5" />
        : <path key={y} d={`M${bodyX + w * 0.12} ${y} l${-w * 0.12} ${h * 0.045} l${w * 0.12} ${h * 0.045}`} fill="none" stroke={color} strokeWidth="1.5" />);
    }
  }
  return (
    <svg width={w} height={h} viewBox={`0 0 ${w} ${h}`} role="img" aria-label={`${side} face: ${spec?.name ?? code}, ${gender}`} style={side === "front" ? { transform: "scaleX(-1)" } : undefined}>
      <rect x={bodyX} y={h * 0.12} width={bodyW} height={h * 0.76} rx="2" fill="var(--c-sunken)" stroke="var(--c-ink)" strokeWidth="1" />
      {teeth}
      {kind === "barrel" && !male ? <><rect x={bodyX - 4} y={h * 0.4} width="4" height={h * 0.2} fill={color} /><circle cx={bodyX - 6} cy={h / 2} r="3" fill={color} /></> : null}
      {kind === "barrel" && male ? <line x1={bodyX} y1={h * 0.12} x2={bodyX} y2={h * 0.88} stroke={color} strokeWidth="3" /> : null}
      {kind === "bayonet" ? [0.25, 0.5, 0.75].map((f) => <rect key={f} x={male ? bodyX - 5 : bodyX} y={h * f - 3} width="5" height="6" fill={color} />) : null}
      <line x1={mid} y1={2} x2={mid} y2={h - 2} stroke="var(--c-line)" strokeDasharray="2 3" />
    </svg>
  );
}
