import "server-only";
import { listOwnedParts } from "@/db/queries/gear";
import { getApprovedPartsByRefs, getCatalogVersion, listAllApprovedParts } from "@/db/queries/parts";
import type { PartRow } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session";
import {
  CONNECTOR_KINDS, buildCamera, buildOptics, derivedNumbers, rowToPlanItem, rowToSolverPart,
} from "@/lib/catalog/to-solver";
import { AppError } from "@/lib/errors";
import { solveTrain, type Camera, type Optics, type Part, type SolveRequest, type SolveResult } from "@/lib/solver";
import { shopStockSource } from "@/lib/shops/stock-source";
import type { PlanItem, PlanResponse } from "./api-types";
import { isPartRef, type PartRef } from "./part-ref";
import { joinPlan } from "./join-plan";
import { linkEnds, solveLink } from "./telescope-link";
import { nearestChain } from "./nearest-chain";
import { whatToChange } from "./what-to-change";


export type PlanInput = {
  optics: PartRef | Optics;
  camera: PartRef | Camera;
  corrector?: PartRef;
  stations?: (PartRef | Part)[];
  filters?: SolveRequest["filters"];
  parts?: Part[];
  source?: { kind: "catalog" | "owned" | "shop" | "shops"; shop?: string; owned?: boolean };
  backFocusToleranceMm?: number;
  maxParts?: number;
  maxSolutions?: number;
};

// The approved connectors, rebuilt only when the catalog version changes, so the solver's
// graph cache (keyed by this array) is reused across requests.
let catalogCache: { version: number; rows: Map<string, PartRow>; connectors: Part[] } | null = null;

export async function catalogConnectors() {
  const version = await getCatalogVersion();
  if (!catalogCache || catalogCache.version !== version) {
    const rows = await listAllApprovedParts();
    catalogCache = {
      version,
      rows: new Map(rows.map((r) => [r.slug, r])),
      connectors: rows.filter((r) => CONNECTOR_KINDS.has(r.kind)).map((r) => rowToSolverPart(r)),
    };
  }
  return catalogCache;
}

async function resolveRefs(input: PlanInput) {
  const refs = [input.optics, input.camera, input.corrector, ...(input.stations ?? [])].filter(isPartRef).map((r) => r.partId);
  const rows = await getApprovedPartsByRefs({ refs });
  const byRef = new Map<string, PartRow>();
  for (const r of rows) { byRef.set(r.slug, r); byRef.set(r.id, r); }
  const get = (ref: PartRef, field: string, kinds: string[] | null, what: string): PartRow => {
    const row = byRef.get(ref.partId);
    if (!row) throw new AppError("not_found:part", `No approved part "${ref.partId}" in the catalog.`, { [field]: [`No approved part "${ref.partId}"`] });
    if (kinds && !kinds.includes(row.kind)) throw new AppError("bad_request:validation", `${row.maker} ${row.model} is not ${what}.`, { [field]: [`Not ${what}`] });
    return row;
  };
  return { get };
}

function collectIds(result: SolveResult | null, into: Set<string>) {
  if (!result) return;
  const variants = result.solutions.flatMap((c) => c.variants ?? []);
  for (const chain of [result.shortest, ...result.solutions, ...variants]) for (const s of chain?.steps ?? []) into.add(s.partId);
}

/** Solve a plan whose items may be catalog references; inline-only requests are solved as they are. */
export async function runPlan({ input, viewer }: { input: PlanInput; viewer: SessionUser | null }): Promise<SolveResult | PlanResponse> {
  const allInline = !isPartRef(input.optics) && !isPartRef(input.camera) && !input.corrector && !(input.stations ?? []).some(isPartRef) && input.parts;
  const base = { filters: input.filters, maxParts: input.maxParts, maxSolutions: input.maxSolutions };
  if (allInline) {
    const optics = input.backFocusToleranceMm !== undefined ? { ...(input.optics as Optics), backFocusToleranceMm: input.backFocusToleranceMm } : input.optics as Optics;
    return solveTrain({ ...base, optics, camera: input.camera as Camera, stations: input.stations as Part[] | undefined, parts: input.parts! });
  }

  const catalog = await catalogConnectors();
  const { get } = await resolveRefs(input);
  const items: Record<string, PlanItem> = {};

  // Parts to draw from.
  let parts: Part[];
  let shopStock: Awaited<ReturnType<typeof shopStockSource>> | null = null;
  if (input.parts) parts = input.parts;
  else if (!input.source || input.source.kind === "catalog") parts = catalog.connectors;
  else if (input.source.kind === "owned") {
    if (!viewer) throw new AppError("unauthorized", "Sign in to plan with the parts you own.");
    const owned = (await listOwnedParts({ userId: viewer.id })).filter((o) => CONNECTOR_KINDS.has(o.part.kind));
    for (const o of owned) items[`${o.part.slug}~owned`] = rowToPlanItem(o.part, { owned: true });
    parts = [...owned.map((o) => rowToSolverPart(o.part, { owned: true, quantity: o.quantity })), ...catalog.connectors];
  } else if (input.source.kind === "shop") {
    shopStock = await shopStockSource({ source: input.source, viewer, items, catalog });
    parts = shopStock.parts;
  } else {
    throw new AppError("bad_request:source", "Ask every shop at once through POST /api/v1/solve, not inside a plan.", { "source.kind": ["Not here"] });
  }

  // The optics (and an optional separate corrector).
  let telescopeRow: PartRow | null = null;
  let correctorRow: PartRow | null = null;
  let optics: Optics;
  let focalLengthMm: number | null = null, apertureMm: number | null = null, focalRatio: number | null = null;
  let mainRow: PartRow | null = null;
  if (isPartRef(input.optics)) {
    mainRow = get(input.optics, "optics.partId", ["optics"], "a telescope, an astrograph or a corrector");
    if (input.corrector) {
      correctorRow = get(input.corrector, "corrector.partId", ["optics"], "a corrector");
      if (correctorRow.specs.opticsRole !== "corrector") throw new AppError("bad_request:validation", `${correctorRow.maker} ${correctorRow.model} is not a corrector.`, { "corrector.partId": ["Not a corrector"] });
      if (mainRow.specs.opticsRole !== "telescope") throw new AppError("bad_request:validation", "A separate corrector goes behind a telescope, not behind another corrector or an astrograph.", { "optics.partId": ["Choose a telescope to put the corrector behind"] });
      telescopeRow = mainRow;
    }
    ({ optics, focalLengthMm, apertureMm, focalRatio } = buildOptics(mainRow, correctorRow, input.backFocusToleranceMm));
    items[optics.id] = rowToPlanItem(correctorRow ?? mainRow);
    if (telescopeRow) items[telescopeRow.slug] = rowToPlanItem(telescopeRow);
  } else {
    optics = input.backFocusToleranceMm !== undefined ? { ...input.optics, backFocusToleranceMm: input.backFocusToleranceMm } : input.optics;
    focalRatio = optics.focalRatio ?? null;
  }

  const cameraRow = isPartRef(input.camera) ? get(input.camera, "camera.partId", ["camera"], "a camera") : null;
  const camera = cameraRow ? buildCamera(cameraRow) : (input.camera as Camera);
  if (cameraRow) items[camera.id] = rowToPlanItem(cameraRow);

  const stations = (input.stations ?? []).map((s, i) => {
    if (!isPartRef(s)) return s;
    const row = get(s, `stations.${i}.partId`, null, "a device");
    if (row.kind === "optics" || row.kind === "camera") throw new AppError("bad_request:validation", `${row.maker} ${row.model} cannot be a device in the middle of the train.`, { [`stations.${i}.partId`]: ["Optics and cameras go at the ends"] });
    items[row.slug] = rowToPlanItem(row);
    return rowToSolverPart(row);
  });

  const request: SolveRequest = { ...base, optics, camera, stations, parts };
  // The solver ranks as an expert would (contract v2) and lists other makers' copies of each
  // chain as its variants, so the plan shows its solutions as they come.
  const result: SolveResult = solveTrain(request);
  await shopStock?.record(result, (more) => solveTrain({ ...request, parts: more }));
  const nearest = nearestChain(request, result);
  if (telescopeRow && correctorRow && telescopeRow.specs.maxLoadG !== undefined) {
    // Say it in the focuser's terms: the corrector's weight counts against the same rating.
    const rating = telescopeRow.specs.maxLoadG;
    const corrG = correctorRow.weightG ?? 0;
    let weightOf: Map<string, number> | undefined; // built only when a load warning needs it

    for (const chain of [result.shortest, ...result.solutions, ...result.solutions.flatMap((c) => c.variants ?? []), nearest]) {
      for (const w of chain?.warnings ?? []) {
        if (w.code !== "load") continue;
        weightOf ??= new Map([...parts, ...stations, camera].map((p) => [p.id, p.weightG ?? 0]));
        const train = chain!.steps.reduce((sum, st) => sum + (weightOf!.get(st.partId) ?? 0), 0);
        w.message = `With the ${correctorRow.maker} ${correctorRow.model} (${Math.round(corrG)} g), the focuser of the ${telescopeRow.maker} ${telescopeRow.model} carries about ${Math.round(train + corrG)} g, more than the ${Math.round(rating)} g it is rated for.`;
      }
    }
  }
  let telescopeLink: SolveResult | null = null;
  let catalogLink: SolveResult | null = null;
  let scopePart: Part | null = null, correctorPart: Part | null = null;
  if (telescopeRow && correctorRow) {
    // Telescope → corrector: any mating chain will do (no back focus on this side).
    ({ scope: scopePart, end: correctorPart } = linkEnds(telescopeRow, correctorRow));
    const link = (from: Part[]) => solveLink(telescopeRow!, correctorRow!, from, 3);
    telescopeLink = link(parts);
    // Not joined with the plan's own parts: would the catalog join it? (Said in the reason.)
    if (telescopeLink.status !== "ok") catalogLink = parts === catalog.connectors ? telescopeLink : link(catalog.connectors);
  }
  const joined = joinPlan({
    rear: result, link: telescopeLink, catalogLink,
    telescope: scopePart && telescopeRow ? { ...scopePart, name: `${telescopeRow.maker} ${telescopeRow.model}` } : null,
    corrector: correctorPart && correctorRow ? { ...correctorPart, name: `${correctorRow.maker} ${correctorRow.model}` } : null,
    nameOf: (id) => { const r = catalog.rows.get(id); return r ? `${r.maker} ${r.model}` : id; },
  });

  const remedies = joined.status === "too-long" || joined.status === "out-of-reach"
    ? whatToChange({ request, ...remedyCandidates({ catalog, camera, telescopeRow, correctorRow, parts, tolerance: input.backFocusToleranceMm }) })
    : [];

  const used = new Set<string>();
  collectIds(joined, used);
  for (const s of nearest?.steps ?? []) used.add(s.partId);
  for (const r of remedies) for (const c of r.changes) used.add(c.id);
  collectIds(telescopeLink, used);
  for (const id of joined.missingJoint?.adapterIds ?? []) used.add(id);
  for (const id of used) {
    if (items[id]) continue;
    const row = catalog.rows.get(id.replace(/~owned$/, ""));
    if (row) items[id] = rowToPlanItem(row, { owned: id.endsWith("~owned") });
  }

  shopStock?.priceItems(items);
  return {
    ...joined,
    remedies,
    nearestChain: joined.status === "out-of-reach" ? nearest : null,
    telescopeLink,
    context: {
      items,
      opticsId: optics.id,
      telescopeId: telescopeRow?.slug ?? null,
      cameraId: camera.id,
      stationIds: stations.map((s) => s.id),
      focalLengthMm, apertureMm, focalRatio,
      imageCircleMm: optics.imageCircleMm ?? null,
      maxLoadG: (telescopeRow ? telescopeRow.specs.maxLoadG : optics.maxLoadG) ?? null,
      ...(cameraRow ? derivedNumbers(cameraRow, focalLengthMm, focalRatio) : {
        sensorWidthMm: null, sensorHeightMm: null, sensorDiagonalMm: camera.sensorDiagonalMm ?? null, pixelSizeUm: null,
        plateScaleArcsecPerPx: null, fieldOfViewDeg: null, criticalFocusZoneUm: null,
      }),
      source: input.source?.kind === "shops" ? "catalog" : input.source?.kind ?? "catalog",
      shop: shopStock?.shop ?? null,
      catalogVersion: catalog.version,
    },
  };
}

type Catalog = Awaited<ReturnType<typeof catalogConnectors>>;

/**
 * What "what to change" may swap in: catalog cameras with about the same sensor or larger
 * (one per front face and depth), and — behind a telescope only — catalog correctors that
 * join it. An astrograph's corrector is built in, so nothing replaces it.
 */
function remedyCandidates({ catalog, camera, telescopeRow, correctorRow, parts, tolerance }: {
  catalog: Catalog; camera: Camera; telescopeRow: PartRow | null; correctorRow: PartRow | null; parts: Part[]; tolerance?: number;
}): { cameras: Camera[]; correctors: Optics[] } {
  const diag = camera.sensorDiagonalMm ?? 0;
  const byFace = new Map<string, Camera>();
  for (const row of catalog.rows.values()) {
    if (row.kind !== "camera") continue;
    const cam = buildCamera(row);
    if (!cam.front || (cam.sensorDiagonalMm ?? 0) < 0.8 * diag) continue;
    const key = `${cam.front.interface}|${cam.front.gender}|${cam.lengthMm}`;
    const prev = byFace.get(key);
    if (!prev || Math.abs((cam.sensorDiagonalMm ?? 0) - diag) < Math.abs((prev.sensorDiagonalMm ?? 0) - diag)) byFace.set(key, cam);
  }
  const correctors: Optics[] = [];
  if (telescopeRow && correctorRow) {
    for (const row of catalog.rows.values()) {
      if (row.kind !== "optics" || row.specs.opticsRole !== "corrector" || row.slug === correctorRow.slug) continue;
      if (solveLink(telescopeRow, row, parts).status !== "ok") continue;
      correctors.push(buildOptics(telescopeRow, row, tolerance).optics);
    }
  }
  return { cameras: [...byFace.values()], correctors };
}
