// The planner's state as a URL, so a link reproduces a plan. Pure: no framework imports.
//
//   /plan?optics=<slug>&corrector=<slug>&camera=<slug>&stations=<slug>,<slug>
//        &filter=2&n=1.5168&glass=1&gn=1.458&tol=0.3&source=owned&unit=in&alt=2
//        (or &source=shop&shop=<shop slug>[&own=1] for one shop's stock, after what I own)
//
// `filter`/`n`: the filter in the slot (thickness mm, refractive index); `glass`/`gn`: any
// extra plate in the beam; `tol`: back focus tolerance override (mm); `alt`: the chosen
// alternative, counted from 1. Values that do not parse are dropped, never thrown.

import type { LengthUnit } from "@/lib/units";

export type { LengthUnit };

export type Glass = { thicknessMm: number; refractiveIndex: number };
export type SourceKind = "catalog" | "owned" | "shop";

export type PlanState = {
  optics: string | null;
  /** Only meaningful when `optics` is a telescope. */
  corrector: string | null;
  camera: string | null;
  /** Devices that must be in the train, sky to sensor. */
  stations: string[];
  filter: Glass | null;
  extraGlass: Glass | null;
  toleranceMm: number | null;
  source: SourceKind;
  /** With source "shop": the shop's slug, and whether what I own counts first. */
  shop: string | null;
  shopOwned: boolean;
  unit: LengthUnit;
  /** Index of the chosen alternative, from 0 (the URL counts from 1). */
  alt: number;
};

/** The JSON body of POST /api/v1/solve with catalog references. */
export type SolveApiRequest = {
  optics: { partId: string };
  corrector?: { partId: string };
  camera: { partId: string };
  stations: { partId: string }[];
  filters: { thicknessMm: number; refractiveIndex: number }[];
  backFocusToleranceMm?: number;
  source: { kind: SourceKind; shop?: string; owned?: boolean };
  maxSolutions: number;
};

export const EMPTY_PLAN: PlanState = {
  optics: null, corrector: null, camera: null, stations: [], filter: null, extraGlass: null,
  toleranceMm: null, source: "catalog", shop: null, shopOwned: false, unit: "mm", alt: 0,
};

export const DEFAULT_INDEX = 1.5;
export const MAX_STATIONS = 8;
export const MAX_SOLUTIONS = 8;
const MAX_THICKNESS_MM = 10;
const INDEX_RANGE = [1, 2.5] as const;
const TOLERANCE_RANGE = [0.01, 10] as const;

const SLUG = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

function slug(value: string | null): string | null {
  const v = value?.trim().toLowerCase() ?? "";
  return v.length > 0 && v.length <= 140 && SLUG.test(v) ? v : null;
}

function number(value: string | null, min: number, max: number, { exclusiveMin = false } = {}): number | null {
  if (value === null || value.trim() === "") return null;
  const n = Number(value);
  if (!Number.isFinite(n) || n > max || n < min || (exclusiveMin && n === min)) return null;
  return n;
}

function glass(params: URLSearchParams, thicknessKey: string, indexKey: string): Glass | null {
  const t = number(params.get(thicknessKey), 0, MAX_THICKNESS_MM, { exclusiveMin: true });
  if (t === null) return null;
  const n = number(params.get(indexKey), INDEX_RANGE[0], INDEX_RANGE[1]) ?? DEFAULT_INDEX;
  return { thicknessMm: t, refractiveIndex: n };
}

export function parsePlanParams(params: URLSearchParams): PlanState {
  const stations = (params.get("stations") ?? "")
    .split(",").map((s) => slug(s)).filter((s): s is string => s !== null).slice(0, MAX_STATIONS);
  const alt = number(params.get("alt"), 1, MAX_SOLUTIONS);
  const source = params.get("source");
  const unit = params.get("unit");
  const optics = slug(params.get("optics"));
  return {
    optics,
    corrector: optics ? slug(params.get("corrector")) : null,
    camera: slug(params.get("camera")),
    stations,
    filter: glass(params, "filter", "n"),
    extraGlass: glass(params, "glass", "gn"),
    toleranceMm: number(params.get("tol"), TOLERANCE_RANGE[0], TOLERANCE_RANGE[1]),
    source: source === "owned" ? "owned" : source === "shop" && slug(params.get("shop")) ? "shop" : "catalog",
    shop: source === "shop" ? slug(params.get("shop")) : null,
    shopOwned: source === "shop" && params.get("own") === "1",
    unit: unit === "in" ? "in" : "mm",
    alt: alt !== null && Number.isInteger(alt) ? alt - 1 : 0,
  };
}

/** A short, stable number for a URL: no float noise such as 0.30000000000000004. */
function short(n: number): string {
  return String(Number(n.toFixed(4)));
}

export function planStateToParams(state: PlanState): URLSearchParams {
  const p = new URLSearchParams();
  if (state.optics) p.set("optics", state.optics);
  if (state.optics && state.corrector) p.set("corrector", state.corrector);
  if (state.camera) p.set("camera", state.camera);
  if (state.stations.length) p.set("stations", state.stations.join(","));
  if (state.filter) { p.set("filter", short(state.filter.thicknessMm)); p.set("n", short(state.filter.refractiveIndex)); }
  if (state.extraGlass) { p.set("glass", short(state.extraGlass.thicknessMm)); p.set("gn", short(state.extraGlass.refractiveIndex)); }
  if (state.toleranceMm !== null) p.set("tol", short(state.toleranceMm));
  if (state.source === "owned") p.set("source", "owned");
  if (state.source === "shop" && state.shop) {
    p.set("source", "shop"); p.set("shop", state.shop);
    if (state.shopOwned) p.set("own", "1");
  }
  if (state.unit === "in") p.set("unit", "in");
  if (state.alt > 0) p.set("alt", String(state.alt + 1));
  return p;
}

/** The body for POST /api/v1/solve, or null while optics or camera is missing. */
export function planStateToSolveRequest(state: PlanState): SolveApiRequest | null {
  if (!state.optics || !state.camera) return null;
  const filters = [state.filter, state.extraGlass]
    .filter((g): g is Glass => g !== null)
    .map((g) => ({ thicknessMm: g.thicknessMm, refractiveIndex: g.refractiveIndex }));
  return {
    optics: { partId: state.optics },
    ...(state.corrector ? { corrector: { partId: state.corrector } } : {}),
    camera: { partId: state.camera },
    stations: state.stations.map((partId) => ({ partId })),
    filters,
    ...(state.toleranceMm !== null ? { backFocusToleranceMm: state.toleranceMm } : {}),
    source: state.source === "shop" && state.shop ? { kind: "shop", shop: state.shop, ...(state.shopOwned ? { owned: true } : {}) }
      : { kind: state.source === "shop" ? "catalog" : state.source },
    maxSolutions: MAX_SOLUTIONS,
  };
}

/** Whether two states ask the solver the same question (unit and alt do not). */
export function sameQuestion(a: PlanState, b: PlanState): boolean {
  return JSON.stringify(planStateToSolveRequest(a)) === JSON.stringify(planStateToSolveRequest(b));
}
