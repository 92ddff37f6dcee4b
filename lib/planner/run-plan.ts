import "server-only";
// A plan, step by step: the parts to draw from, the fixed items (optics, camera, devices), the
// solve, the load warning in the focuser's terms, the telescope → corrector link, the joined
// status, what to change, and the items the answer names. Each step is its own module.
import type { PartRow } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session";
import { derivedNumbers } from "@/lib/catalog/to-solver";
import { solveTrain, type Camera, type Chain, type Optics, type Part, type SolveRequest, type SolveResult } from "@/lib/solver";
import type { PlanContext, PlanItem, PlanResponse } from "./api-types";
import { catalogConnectors, type Catalog } from "./catalog-cache";
import { joinPlan } from "./join-plan";
import { sayLoadWithCorrector } from "./load-warning";
import { nearestChain } from "./nearest-chain";
import { isPartRef, type PartRef } from "./part-ref";
import { planCamera, planOptics, planStations, resolveRefs, withTolerance, type PlanOptics } from "./plan-ends";
import { addUsedItems } from "./plan-items";
import { partsToDrawFrom, type ShopStock } from "./plan-source";
import { remedyCandidates } from "./remedy-candidates";
import { planTelescopeLink } from "./telescope-link";
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

/** No catalog reference anywhere and the parts given: the solver answers it as it is. */
function isInlineOnly(input: PlanInput): boolean {
  return !isPartRef(input.optics) && !isPartRef(input.camera) && !input.corrector && !(input.stations ?? []).some(isPartRef) && !!input.parts;
}

function solveInline(input: PlanInput): SolveResult {
  return solveTrain({
    filters: input.filters, maxParts: input.maxParts, maxSolutions: input.maxSolutions,
    optics: withTolerance(input.optics as Optics, input.backFocusToleranceMm),
    camera: input.camera as Camera, stations: input.stations as Part[] | undefined, parts: input.parts!,
  });
}

/** Solve a plan whose items may be catalog references; inline-only requests are solved as they are. */
export async function runPlan({ input, viewer }: { input: PlanInput; viewer: SessionUser | null }): Promise<SolveResult | PlanResponse> {
  if (isInlineOnly(input)) return solveInline(input);

  const catalog = await catalogConnectors();
  const { get } = await resolveRefs(input);
  const items: Record<string, PlanItem> = {};
  const { parts, shopStock } = await partsToDrawFrom({ input, viewer, catalog, items });
  const front = planOptics({ input, get, items });
  const { camera, cameraRow } = planCamera({ input, get, items });
  const stations = planStations({ input, get, items });

  // The solver ranks as an expert would (contract v2) and lists other makers' copies of each
  // chain as its variants, so the plan shows its solutions as they come.
  const request: SolveRequest = { filters: input.filters, maxParts: input.maxParts, maxSolutions: input.maxSolutions, optics: front.optics, camera, stations, parts };
  const result = solveTrain(request);
  await shopStock?.record(result, (more) => solveTrain({ ...request, parts: more }));
  const nearest = nearestChain(request, result);
  sayLoadWithCorrector({ chains: allChains(result, nearest), telescopeRow: front.telescopeRow, correctorRow: front.correctorRow, weighed: [...parts, ...stations, camera] });

  const link = planTelescopeLink({ telescopeRow: front.telescopeRow, correctorRow: front.correctorRow, parts, catalogConnectors: catalog.connectors });
  const joined = joinPlan({
    rear: result, link: link.link, catalogLink: link.catalogLink, telescope: link.telescope, corrector: link.corrector,
    nameOf: (id) => { const r = catalog.rows.get(id); return r ? `${r.maker} ${r.model}` : id; },
  });
  const remedies = joined.status === "too-long" || joined.status === "out-of-reach"
    ? whatToChange({ request, ...remedyCandidates({ rows: catalog.rows.values(), camera, telescopeRow: front.telescopeRow, correctorRow: front.correctorRow, parts, tolerance: input.backFocusToleranceMm }) })
    : [];

  addUsedItems({ items, rows: catalog.rows, joined, nearest, remedies, telescopeLink: link.link });
  shopStock?.priceItems(items);
  return {
    ...joined,
    remedies,
    nearestChain: joined.status === "out-of-reach" ? nearest : null,
    telescopeLink: link.link,
    context: planContext({ input, items, front, camera, cameraRow, stations, shopStock, catalog }),
  };
}

/** Every chain of the answer: the shortest, the solutions, their variants, the nearest. */
function allChains(result: SolveResult, nearest: Chain | null): (Chain | null)[] {
  return [result.shortest, ...result.solutions, ...result.solutions.flatMap((c) => c.variants ?? []), nearest];
}

/** What the client needs beside the chains: the items, which is which, and the numbers. */
function planContext({ input, items, front, camera, cameraRow, stations, shopStock, catalog }: {
  input: PlanInput; items: Record<string, PlanItem>; front: PlanOptics; camera: Camera; cameraRow: PartRow | null;
  stations: Part[]; shopStock: ShopStock | null; catalog: Catalog;
}): PlanContext {
  const { optics, telescopeRow, focalLengthMm, apertureMm, focalRatio } = front;
  return {
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
  };
}
