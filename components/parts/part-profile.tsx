import { getInterface, interfaceHue, interfaceLabel } from "@/lib/interfaces";

type Port = { interface: string; gender: "male" | "female" } | null;

/**
 * The part seen from the side, sky on the left: each face drawn as the trade knows it —
 * a male thread with teeth on the outside of a spigot, a female thread with teeth inside a
 * bore, a barrel (male) as a plain tube, a holder (female) as a socket with a thumbscrew,
 * a bayonet with lugs.
 */
export function PartProfile({ front, rear, lengthMm, name }: { front: Port; rear: Port; lengthMm: number; name: string }) {
  const W = 420, H = 150, cy = 70;
  const bodyW = Math.max(90, Math.min(220, lengthMm * 4));
  const bodyX = (W - bodyW) / 2;
  const bodyH = 74;
  return (
    <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full max-w-xl" role="img"
      aria-label={`${name} from the side: sky side ${front ? `${interfaceLabel(front.interface)} ${front.gender}` : "open"}, sensor side ${rear ? `${interfaceLabel(rear.interface)} ${rear.gender}` : "closed"}`}>
      <rect x={bodyX} y={cy - bodyH / 2} width={bodyW} height={bodyH} rx="4" fill="var(--c-sunken)" stroke="var(--c-ink)" strokeWidth="1.4" />
      <line x1={10} y1={cy} x2={W - 10} y2={cy} stroke="var(--c-line)" strokeDasharray="3 4" />
      {front ? <Face port={front} x={bodyX} dir={-1} cy={cy} /> : <text x={bodyX - 12} y={cy + 4} textAnchor="end" fontSize="11" fill="var(--c-muted)">sky</text>}
      {rear ? <Face port={rear} x={bodyX + bodyW} dir={1} cy={cy} /> : <text x={bodyX + bodyW + 12} y={cy + 4} fontSize="11" fill="var(--c-muted)">sensor</text>}
      <text x={bodyX + bodyW / 2} y={cy + 4} textAnchor="middle" fontSize="12" fill="var(--c-text)" className="num">{lengthMm.toFixed(1)} mm</text>
      <text x={14} y={H - 10} fontSize="10.5" fill="var(--c-muted)">← sky side</text>
      <text x={W - 14} y={H - 10} textAnchor="end" fontSize="10.5" fill="var(--c-muted)">sensor side →</text>
    </svg>
  );
}

/** One face at x, pointing left (dir −1, sky side) or right (dir 1, sensor side). */
function Face({ port, x, dir, cy }: { port: NonNullable<Port>; x: number; dir: 1 | -1; cy: number }) {
  const spec = getInterface(port.interface);
  const kind = spec?.kind ?? "thread";
  const color = `hsl(${interfaceHue(port.interface)} 55% 42%)`;
  const male = port.gender === "male";
  const half = 24, reach = 34;
  const tipX = x + dir * reach;
  const label = (
    <text x={tipX + dir * 10} y={cy + 5} textAnchor={dir < 0 ? "end" : "start"} fontSize="14" fill={color} aria-hidden>{male ? "♂" : "♀"}</text>
  );
  if (male) {
    const teeth = kind === "thread" ? Array.from({ length: 6 }, (_, i) => {
      const tx = x + dir * (6 + i * 5);
      return <g key={i}><path d={`M${tx} ${cy - half} l${dir * 2.5} -4 l${dir * 2.5} 4`} stroke={color} strokeWidth="1.4" fill="none" /><path d={`M${tx} ${cy + half} l${dir * 2.5} 4 l${dir * 2.5} -4`} stroke={color} strokeWidth="1.4" fill="none" /></g>;
    }) : null;
    const lugs = kind === "bayonet" ? [-1, 1].map((s) => <rect key={s} x={Math.min(tipX, tipX - dir * 8)} y={cy + s * half - (s > 0 ? 0 : 6)} width="8" height="6" fill={color} />) : null;
    return (
      <g>
        <rect x={Math.min(x, tipX)} y={cy - half} width={reach} height={half * 2} fill="var(--c-surface)" stroke={color} strokeWidth="2" />
        {teeth}{lugs}{label}
      </g>
    );
  }
  // Female: a socket wider than the body face, open toward dir.
  const outer = half + 10;
  const teeth = kind === "thread" ? Array.from({ length: 6 }, (_, i) => {
    const tx = x + dir * (6 + i * 5);
    return <g key={i}><path d={`M${tx} ${cy - half} l${dir * 2.5} 4 l${dir * 2.5} -4`} stroke={color} strokeWidth="1.4" fill="none" /><path d={`M${tx} ${cy + half} l${dir * 2.5} -4 l${dir * 2.5} 4`} stroke={color} strokeWidth="1.4" fill="none" /></g>;
  }) : null;
  return (
    <g>
      <path d={`M${x} ${cy - outer} L${tipX} ${cy - outer} L${tipX} ${cy - half} L${x + dir * 2} ${cy - half} M${x} ${cy + outer} L${tipX} ${cy + outer} L${tipX} ${cy + half} L${x + dir * 2} ${cy + half}`}
        fill="none" stroke={color} strokeWidth="2" />
      {teeth}
      {kind === "barrel" ? <><rect x={x + dir * reach * 0.5 - 3} y={cy - outer - 10} width="6" height="10" fill={color} /><circle cx={x + dir * reach * 0.5} cy={cy - outer - 12} r="4" fill={color} /></> : null}
      {kind === "bayonet" ? [-1, 1].map((s) => <rect key={s} x={Math.min(tipX, tipX - dir * 6)} y={cy + s * half - (s > 0 ? 0 : 5)} width="6" height="5" fill={color} />) : null}
      {label}
    </g>
  );
}
