// The saved train, drawn on the server: sky left, sensor right, boxes to scale behind the
// optics, each joint labelled with its interface code, and the back-focus ruler underneath.
import { interfaceHue, interfaceLabel } from "@/lib/interfaces";
import { MIN_LEADER_GAP, layoutCallouts } from "@/lib/builds/label-layout";
import { genderSign, landsInside, signedMm, type BuildTrain, type TrainItem } from "@/lib/builds/train";
import type { Chain } from "@/lib/solver/types";

const W = 1000;
const CY = 118;
const HEIGHT: Record<TrainItem["role"], number> = { telescope: 80, optics: 108, connector: 50, station: 90, camera: 94 };

type Placed = TrainItem & { x: number; w: number };

/**
 * Callouts that never collide (lib/builds/label-layout.ts): leaders closer than
 * MIN_LEADER_GAP share one label ("M48x0.75 · ♂→♀ ×3"), then rows are found outward from the train.
 */
function callouts(labels: { label: string; cx: number }[], px: number, mono: boolean) {
  const groups: { texts: string[]; xs: number[] }[] = [];
  for (const l of labels) {
    const g = groups[groups.length - 1];
    if (g && l.cx - g.xs[0] < MIN_LEADER_GAP) { g.texts.push(l.label); g.xs.push(l.cx); } else groups.push({ texts: [l.label], xs: [l.cx] });
  }
  const merged = groups.map((g) => {
    const unique = [...new Set(g.texts)];
    const label = unique.length === 1 && g.texts.length > 1 ? `${unique[0]} ×${g.texts.length}` : unique.join(" + ");
    return { label, cx: (g.xs[0] + g.xs[g.xs.length - 1]) / 2, width: textWidth(label, px, mono) };
  });
  const placed = layoutCallouts(merged, 4, W - 4);
  return merged.map((m, i) => ({ ...m, ...placed[i], x: (placed[i].left + placed[i].right) / 2 }));
}

const shortName = (name: string, max = 22) => (name.length > max ? `${name.slice(0, max - 1)}…` : name);
const textWidth = (s: string, px: number, mono = false) => [...s].reduce((w, ch) => w + (/[♂♀→]/.test(ch) ? 1 : mono ? 0.62 : 0.56), 0) * px;

function Box({ p }: { p: Placed }) {
  const h = HEIGHT[p.role];
  const y = CY - h / 2;
  const common = { strokeWidth: 1.2, vectorEffect: "non-scaling-stroke" as const };
  if (p.role === "optics") {
    const bulge = Math.min(14, p.w / 3);
    return (
      <path d={`M${p.x + bulge} ${y} L${p.x + p.w} ${y} Q${p.x + p.w - bulge} ${CY} ${p.x + p.w} ${y + h} L${p.x + bulge} ${y + h} Q${p.x - bulge} ${CY} ${p.x + bulge} ${y} Z`}
        fill="color-mix(in srgb, var(--c-glass) 20%, var(--c-surface))" stroke="var(--c-glass)" {...common} />
    );
  }
  if (p.role === "telescope") {
    return <rect x={p.x} y={y} width={p.w} height={h} rx={10} fill="color-mix(in srgb, var(--c-glass) 8%, var(--c-surface))" stroke="var(--c-glass-ink)" strokeDasharray="5 4" {...common} />;
  }
  const fill = p.role === "station" ? "var(--c-station)" : p.role === "camera" ? "var(--c-sunken)" : "var(--c-surface)";
  return (
    <g>
      <rect x={p.x} y={y} width={p.w} height={h} rx={p.role === "camera" ? 9 : 1.5} fill={fill} stroke="var(--c-ink)" {...common} />
      {p.role === "camera" ? <line x1={p.x + p.w - 3} y1={CY - 30} x2={p.x + p.w - 3} y2={CY + 30} stroke="var(--c-glass)" strokeWidth={3} /> : null}
    </g>
  );
}

export function TrainFigure({ train, chain, targetMm, toleranceMm, filterShiftMm }: {
  train: BuildTrain; chain: Chain; targetMm: number | null; toleranceMm: number | null; filterShiftMm: number;
}) {
  // Left of the optics: not to scale (the telescope is long); behind it: to scale.
  let x = 46;
  const placed: Placed[] = [];
  const opticsIndex = train.items.findIndex((i) => i.role === "optics");
  train.items.forEach((item, i) => {
    if (i > opticsIndex) return;
    const w = item.role === "telescope" ? 96 : item.role === "optics" ? 62 : Math.max(14, Math.min(56, item.lengthMm * 1.1));
    placed.push({ ...item, x, w });
    x += w;
  });
  const x0 = x;
  const extent = Math.max(chain.sensorDistanceMm, (targetMm ?? 0) + (toleranceMm ?? 0), 10) * 1.04;
  const scale = (W - x0 - 70) / extent;
  for (const item of train.items.slice(opticsIndex + 1)) {
    placed.push({ ...item, x: x0 + (item.startMm ?? 0) * scale, w: Math.max(item.lengthMm * scale, 1.5) });
  }
  const sensorX = x0 + chain.sensorDistanceMm * scale;

  const joints = callouts(train.joints.map((j, i) => ({
    label: `${interfaceLabel(j.code)} · ${genderSign(j.skyGender)}→${genderSign(j.sensorGender)}`, cx: placed[i + 1].x,
  })), 11, true);
  const names = callouts(placed.map((p) => ({
    label: shortName(p.role === "telescope" || p.role === "optics" ? p.name.split(" ").slice(-3).join(" ") : p.name.replace(/^\S+ \S+ /, "")),
    cx: p.x + p.w / 2,
  })), 11.5, false);
  const nameRoles = new Map(placed.map((p) => [p.x + p.w / 2, p.role]));
  const jointRows = Math.max(1, ...joints.map((j) => j.row + 1));
  const top = 14 + jointRows * 17;
  const nameRows = Math.max(1, ...names.map((n) => n.row + 1));
  const namesTop = CY + 58 + top - 48;
  const rulerY = namesTop + nameRows * 17 + 40;
  const H = rulerY + 60;
  const dy = top - 48;

  const tx = (mm: number) => x0 + mm * scale;
  const stepMm = extent > 120 ? 20 : extent > 60 ? 10 : 5;
  const ticks: number[] = [];
  for (let v = 0; v <= extent; v += stepMm) ticks.push(v);
  const inside = landsInside(chain, toleranceMm);
  const markerColor = inside ? "var(--c-ok)" : "var(--c-bad)";
  const targetLabel = targetMm !== null ? `target ${targetMm.toFixed(2)} ± ${(toleranceMm ?? 0).toFixed(2)} mm` : "";
  const sensorLabel = `sensor at ${chain.sensorDistanceMm.toFixed(2)} mm${chain.errorMm !== null ? ` (${signedMm(chain.errorMm)})` : ""}`;
  const clampX = (cx: number, label: string) => {
    const half = textWidth(label, 11.5) / 2;
    return Math.min(W - 8 - half, Math.max(x0 + half, cx));
  };

  return (
    <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full min-w-[720px] font-sans" role="img"
      aria-label={`The train from sky to sensor: ${train.items.map((i) => i.name).join(", then ")}. The sensor sits ${chain.sensorDistanceMm.toFixed(1)} mm behind the optics${targetMm !== null ? `; the target is ${targetMm.toFixed(2)} mm` : ""}.`}>
      <defs>
        <pattern id="filter-hatch" width="5" height="5" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <line x1="0" y1="0" x2="0" y2="5" stroke="var(--c-glass)" strokeWidth="2" />
        </pattern>
      </defs>
      <text x={8} y={CY + dy + 4} fontSize={11} fill="var(--c-muted)" letterSpacing="0.08em">SKY</text>
      <text x={W - 8} y={CY + dy + 4} fontSize={11} fill="var(--c-muted)" textAnchor="end" letterSpacing="0.08em">SENSOR</text>
      <g transform={`translate(0 ${dy})`}>
        <line x1={40} y1={CY} x2={sensorX} y2={CY} stroke="var(--c-line)" strokeDasharray="3 4" />
        {placed.map((p) => <g key={p.key}><title>{`${p.name} — ${p.lengthMm.toFixed(1)} mm${p.owned ? " (owned)" : ""}`}</title><Box p={p} /></g>)}
        {train.joints.map((j, i) => (
          <rect key={i} x={placed[i + 1].x - 2.5} y={CY - 16} width={5} height={32} rx={1} fill={`hsl(${interfaceHue(j.code)} 55% 45%)`} className="night:fill-brass">
            <title>{interfaceLabel(j.code)}</title>
          </rect>
        ))}
        {joints.map((j, i) => {
          const labelY = 14 + (jointRows - 1 - j.row) * 17 - dy;
          return (
            <g key={i} data-callout="joint">
              <line x1={j.cx} y1={labelY + 4} x2={j.cx} y2={CY - 20} stroke="var(--c-line)" />
              <text x={j.x} y={labelY} fontSize={11} textAnchor="middle" fontFamily="var(--font-mono)" fill="var(--c-brass-ink)">{j.label}</text>
            </g>
          );
        })}
        <line x1={sensorX} y1={CY - 40} x2={sensorX} y2={CY + 40} stroke={markerColor} strokeWidth={2} />
        {names.map(({ label, cx, x, row }, i) => {
          const y = CY + 58 + row * 17;
          const role = nameRoles.get(cx);
          const fromY = Math.max(...placed.filter((p) => Math.abs(p.x + p.w / 2 - cx) < MIN_LEADER_GAP).map((p) => CY + HEIGHT[p.role] / 2 + 2));
          return (
            <g key={i} data-callout="name">
              <line x1={cx} y1={fromY} x2={cx} y2={y - 11} stroke="var(--c-line)" />
              <text x={x} y={y} fontSize={11.5} textAnchor="middle" fill={role === "connector" || !role ? "var(--c-text)" : "var(--c-ink)"} fontWeight={role === "connector" || !role ? 400 : 600}>{label}</text>
            </g>
          );
        })}
      </g>
      <g aria-hidden>
        <text x={x0} y={rulerY - 26} fontSize={11} fill="var(--c-muted)">Back focus budget, from the optics&apos; rear joint (0) to the sensor</text>
        {targetMm !== null && toleranceMm !== null ? (
          <rect x={tx(targetMm - toleranceMm)} y={rulerY - 12} width={Math.max(2 * toleranceMm * scale, 2)} height={24} fill="color-mix(in srgb, var(--c-ok) 22%, transparent)" />
        ) : null}
        {targetMm !== null && filterShiftMm > 0 ? (
          <rect x={tx(targetMm - filterShiftMm)} y={rulerY - 6} width={filterShiftMm * scale} height={12} fill="url(#filter-hatch)" />
        ) : null}
        <line x1={x0} y1={rulerY} x2={tx(extent)} y2={rulerY} stroke="var(--c-ink)" />
        {ticks.map((v) => (
          <g key={v}>
            <line x1={tx(v)} y1={rulerY} x2={tx(v)} y2={rulerY + 6} stroke="var(--c-ink)" />
            <text x={tx(v)} y={rulerY + 19} fontSize={10.5} textAnchor="middle" fill="var(--c-muted)" className="num">{v}</text>
          </g>
        ))}
        {targetMm !== null ? <line x1={tx(targetMm)} y1={rulerY - 16} x2={tx(targetMm)} y2={rulerY + 10} stroke="var(--c-ink)" strokeWidth={1.5} strokeDasharray="3 2" /> : null}
        <path d={`M${sensorX} ${rulerY - 2} l-6 -11 h12 z`} fill={markerColor} />
        {targetMm !== null ? (
          <text x={clampX(tx(targetMm), targetLabel)} y={rulerY + 34} fontSize={11} textAnchor="middle" fill="var(--c-text)" className="num">{targetLabel}</text>
        ) : null}
        <text x={clampX(sensorX, sensorLabel)} y={rulerY + 51} fontSize={12} fontWeight={600} textAnchor="middle" fill={markerColor} className="num">{sensorLabel}</text>
      </g>
    </svg>
  );
}
