// GET /b/:slug/opengraph-image — the link preview: title, the train drawn to scale, where the sensor lands
import { readFile } from "node:fs/promises";
import path from "node:path";
import { ImageResponse } from "next/og";
import { getBuildOrThrow } from "@/db/queries/builds";
import { hasPublicPreview } from "@/lib/builds/access";
import { chosenChain } from "@/lib/builds/chain";
import { ogSafe } from "@/lib/builds/og-text";
import { buildTrainOf, landsInside, type TrainItem } from "@/lib/builds/train";
import { AppError } from "@/lib/errors";
import type { PlanResponse } from "@/lib/planner/api-types";

export const dynamic = "force-dynamic";
export const alt = "The imaging train of this build, drawn from sky to sensor, with where the sensor lands";
export const size = { width: 1200, height: 630 };
export const contentType = "image/png";

const C = { bg: "#0d1326", paper: "#efe9dc", muted: "#98a1b6", brass: "#c08a3e", glass: "#2f9e96", ok: "#5cc487", bad: "#ef6b5f", line: "#3a4566" };
const fontsDir = path.join(process.cwd(), "app", "fonts");
let fonts: Promise<[Buffer, Buffer]> | null = null;
const loadFonts = () => (fonts ??= Promise.all([readFile(path.join(fontsDir, "public-sans-400.woff")), readFile(path.join(fontsDir, "public-sans-600.woff"))]));

const BOX: Record<TrainItem["role"], { h: number; bg: string; border: string; radius: number }> = {
  telescope: { h: 96, bg: "rgba(47,158,150,0.12)", border: "#1c6f69", radius: 14 },
  optics: { h: 136, bg: "rgba(47,158,150,0.35)", border: C.glass, radius: 40 },
  connector: { h: 62, bg: "#222d4a", border: "#c9c2b0", radius: 2 },
  station: { h: 112, bg: "#2a3a63", border: "#c9c2b0", radius: 4 },
  camera: { h: 118, bg: "#38476d", border: "#c9c2b0", radius: 14 },
};

function Stat({ label, value, color = C.paper, big = false }: { label: string; value: string; color?: string; big?: boolean }) {
  return (
    <div style={{ display: "flex", flexDirection: "column" }}>
      <div style={{ display: "flex", fontSize: 20, color: C.muted }}>{label}</div>
      <div style={{ display: "flex", fontSize: big ? 48 : 34, fontWeight: 600, color, lineHeight: 1.1 }}>{value}</div>
    </div>
  );
}

const notFound = () => new Response("Not found", { status: 404, headers: { "content-type": "text/plain" } });

export default async function Image({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  let build;
  try {
    ({ build } = await getBuildOrThrow({ slug, viewer: null }));
  } catch (err) {
    if (err instanceof AppError && err.status === 404) return notFound();
    throw err;
  }
  const result = build.result as PlanResponse;
  const chain = chosenChain(result, build.solutionIndex);
  if (!hasPublicPreview(build) || !chain) return notFound();

  const train = buildTrainOf(result, chain);
  const behind = train.items.filter((i) => i.startMm !== null && i.role !== "optics");
  const head = train.items.filter((i) => i.role === "telescope" || i.role === "optics");
  const headWidth = head.reduce((w, i) => w + (i.role === "telescope" ? 150 : 92), 0);
  const trainWidth = 1088 - headWidth - 40;
  const extent = Math.max(chain.sensorDistanceMm, (result.targetMm ?? 0) + (result.toleranceMm ?? 0), 10);
  const scale = trainWidth / extent;
  const inside = landsInside(chain, result.toleranceMm) && build.fits;
  const verdict = !build.fits ? "No longer fits" : inside ? "Reaches focus" : "Outside the window";
  const model = (id: string) => result.context.items[id]?.model ?? id;
  const ctx = result.context;
  const names = [[ctx.telescopeId, ctx.opticsId].filter((id): id is string => !!id).map(model).join(" + "), ...ctx.stationIds.map(model), model(ctx.cameraId)];
  let subtitle = ogSafe(names.join("  >  "));
  if (subtitle.length > 92) subtitle = `${subtitle.slice(0, 90).trimEnd()}…`;
  const [regular, semibold] = await loadFonts();
  const tx = (mm: number) => Math.round(mm * scale);

  return new ImageResponse(
    (
      <div style={{ width: "100%", height: "100%", display: "flex", flexDirection: "column", background: C.bg, color: C.paper, padding: "44px 56px", fontFamily: "Public Sans" }}>
        <div style={{ display: "flex", alignItems: "center", justifyContent: "space-between", fontSize: 22, color: C.muted }}>
          <div style={{ display: "flex", alignItems: "center", gap: 14 }}>
            <div style={{ display: "flex", width: 34, height: 12, background: C.brass, borderRadius: 3 }} />
            <div style={{ display: "flex", fontWeight: 600, color: C.paper, letterSpacing: 1 }}>TRAINYARD</div>
          </div>
          {build.endorsedAt ? <div style={{ display: "flex", color: C.brass, border: `2px solid ${C.brass}`, borderRadius: 999, padding: "4px 18px", fontWeight: 600 }}>Reference build</div> : null}
        </div>
        <div style={{ display: "flex", fontSize: 54, fontWeight: 600, lineHeight: 1.1, marginTop: 26, maxHeight: 124, overflow: "hidden" }}>{ogSafe(build.title)}</div>
        <div style={{ display: "flex", fontSize: 24, color: C.muted, marginTop: 12 }}>{subtitle}</div>

        <div style={{ display: "flex", alignItems: "center", marginTop: "auto", height: 150 }}>
          {head.map((i) => (
            <div key={i.key} style={{ display: "flex", width: i.role === "telescope" ? 150 : 92, height: BOX[i.role].h, background: BOX[i.role].bg, border: `3px solid ${BOX[i.role].border}`, borderRadius: BOX[i.role].radius }} />
          ))}
          {behind.map((i) => (
            <div key={i.key} style={{ display: "flex", alignItems: "center" }}>
              <div style={{ display: "flex", width: 5, height: 40, background: C.brass }} />
              <div style={{ display: "flex", alignItems: "center", justifyContent: "center", width: Math.max(6, tx(i.lengthMm) - 5), height: BOX[i.role].h, background: BOX[i.role].bg, border: `3px solid ${BOX[i.role].border}`, borderRadius: BOX[i.role].radius, color: C.paper, fontSize: 20 }}>
                {tx(i.lengthMm) >= 44 ? String(Number(i.lengthMm.toFixed(1))) : ""}
              </div>
            </div>
          ))}
          <div style={{ display: "flex", width: 5, height: 150, background: inside ? C.ok : C.bad, marginLeft: -2 }} />
        </div>

        <div style={{ display: "flex", position: "relative", height: 26, marginTop: 14, marginLeft: headWidth, width: trainWidth + 40 }}>
          <div style={{ display: "flex", position: "absolute", left: 0, top: 12, width: tx(extent), height: 2, background: C.line }} />
          {result.targetMm !== null && result.toleranceMm !== null ? (
            <div style={{ display: "flex", position: "absolute", left: tx(result.targetMm - result.toleranceMm), top: 2, width: Math.max(4, tx(2 * result.toleranceMm)), height: 22, background: "rgba(92,196,135,0.35)" }} />
          ) : null}
          <div style={{ display: "flex", position: "absolute", left: tx(chain.sensorDistanceMm) - 2, top: 0, width: 5, height: 26, background: inside ? C.ok : C.bad }} />
        </div>

        <div style={{ display: "flex", alignItems: "flex-end", gap: 44, marginTop: 20 }}>
          <Stat label="Sensor lands at" value={`${chain.sensorDistanceMm.toFixed(2)} mm`} color={inside ? C.ok : C.bad} big />
          {result.targetMm !== null ? <Stat label="Target" value={`${result.targetMm.toFixed(2)} ± ${(result.toleranceMm ?? 0).toFixed(2)} mm`} /> : null}
          <Stat label="Connecting parts" value={String(chain.partCount)} />
          <div style={{ display: "flex", marginLeft: "auto", fontSize: 26, fontWeight: 600, color: inside ? C.ok : C.bad, border: `2px solid ${inside ? C.ok : C.bad}`, borderRadius: 999, padding: "6px 22px" }}>{verdict}</div>
        </div>
      </div>
    ),
    {
      ...size,
      fonts: [
        { name: "Public Sans", data: regular, weight: 400, style: "normal" },
        { name: "Public Sans", data: semibold, weight: 600, style: "normal" },
      ],
      headers: { "cache-control": "public, max-age=60, must-revalidate" },
    },
  );
}
