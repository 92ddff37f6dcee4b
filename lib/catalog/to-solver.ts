// Catalog rows → the solver's Part shapes (SOLVER.md). Pure: no database access here.
import { criticalFocusZoneUm, fieldOfViewDeg, plateScaleArcsecPerPixel, sensorDiagonal } from "@/lib/optics";
import type { Camera, Optics, Part } from "@/lib/solver";
import type { PlanContext, PlanItem } from "@/lib/planner/api-types";
import type { PartRowLike } from "./rows";

/** Kinds the solver may use to fill gaps; devices, optics and cameras are chosen by the user. */
export const CONNECTOR_KINDS = new Set(["adapter", "spacer", "extension"]);
export const STATION_KINDS = new Set(["filter-wheel", "filter-drawer", "oag", "tilt-plate", "diagonal", "other", "adapter", "extension", "spacer"]);

const port = (i: string | null, g: string | null) => (i && (g === "male" || g === "female") ? { interface: i, gender: g } as const : null);
const opt = <T,>(v: T | null | undefined) => (v === null || v === undefined ? undefined : v);

export function rowToSolverPart(r: PartRowLike, opts: { owned?: boolean; quantity?: number } = {}): Part {
  return {
    id: opts.owned ? `${r.slug}~owned` : r.slug,
    name: `${r.maker} ${r.model}`,
    front: port(r.frontInterface, r.frontGender),
    rear: port(r.rearInterface, r.rearGender),
    lengthMm: r.lengthMm,
    adjustMm: opt(r.adjustMm),
    reversible: r.reversible,
    quantity: opts.quantity,
    priceCents: opts.owned ? 0 : opt(r.listPriceCents),
    clearApertureMm: opt(r.clearApertureMm),
    weightG: opt(r.weightG),
  };
}

export function rowToPlanItem(r: PartRowLike, opts: { owned?: boolean } = {}): PlanItem {
  return {
    id: opts.owned ? `${r.slug}~owned` : r.slug, slug: r.slug, name: `${r.maker} ${r.model}`, maker: r.maker, model: r.model,
    kind: r.kind, front: port(r.frontInterface, r.frontGender), rear: port(r.rearInterface, r.rearGender),
    lengthMm: r.lengthMm, adjustMm: r.adjustMm, clearApertureMm: r.clearApertureMm, weightG: r.weightG,
    priceCents: opts.owned ? 0 : r.listPriceCents, owned: !!opts.owned,
    ...(typeof r.specs?.filterThicknessMm === "number" ? { filterThicknessMm: r.specs.filterThicknessMm } : {}),
  };
}

/**
 * The optics the back focus is measured from. With a separate corrector, its back focus and
 * image circle count, and the telescope gives focal length (times the corrector's factor),
 * aperture and the focuser's load limit.
 */
export function buildOptics(main: PartRowLike, corrector: PartRowLike | null, toleranceOverride?: number) {
  const scope = main.specs;
  const corr = corrector?.specs;
  const backFocusMm = corr ? corr.backFocusMm : scope.backFocusMm;
  const focalLengthMm = scope.focalLengthMm ? scope.focalLengthMm * (corr?.reduction ?? 1) : null;
  const apertureMm = scope.apertureMm ?? null;
  const focalRatio = focalLengthMm && apertureMm ? focalLengthMm / apertureMm : null;
  const source = corrector ?? main;
  const optics: Optics = {
    ...rowToSolverPart(source),
    front: corrector ? port(corrector.frontInterface, corrector.frontGender) : null,
    lengthMm: 0,
    backFocusMm: opt(backFocusMm),
    backFocusToleranceMm: toleranceOverride ?? opt(corr ? corr.backFocusToleranceMm : scope.backFocusToleranceMm),
    focalRatio: opt(focalRatio),
    imageCircleMm: opt(corr?.imageCircleMm ?? scope.imageCircleMm),
    // A separate corrector hangs from the focuser too: what is left for the rest is the rating
    // minus the corrector's weight.
    maxLoadG: scope.maxLoadG !== undefined && corrector ? scope.maxLoadG - (corrector.weightG ?? 0) : opt(scope.maxLoadG),
  };
  return { optics, focalLengthMm, apertureMm, focalRatio };
}

export function buildCamera(r: PartRowLike): Camera {
  const s = r.specs;
  const diag = s.sensorWidthMm && s.sensorHeightMm ? sensorDiagonal(s.sensorWidthMm, s.sensorHeightMm) : undefined;
  return { ...rowToSolverPart(r), rear: null, sensorDiagonalMm: diag };
}

/** Derived numbers for the chosen optics and camera. */
export function derivedNumbers(camera: PartRowLike, focalLengthMm: number | null, focalRatio: number | null):
  Pick<PlanContext, "plateScaleArcsecPerPx" | "fieldOfViewDeg" | "criticalFocusZoneUm" | "sensorWidthMm" | "sensorHeightMm" | "sensorDiagonalMm" | "pixelSizeUm"> {
  const s = camera.specs;
  const w = s.sensorWidthMm ?? null, h = s.sensorHeightMm ?? null;
  const diag = w && h ? sensorDiagonal(w, h) : null;
  return {
    sensorWidthMm: w, sensorHeightMm: h, sensorDiagonalMm: diag, pixelSizeUm: s.pixelSizeUm ?? null,
    plateScaleArcsecPerPx: s.pixelSizeUm && focalLengthMm ? plateScaleArcsecPerPixel(s.pixelSizeUm, focalLengthMm) : null,
    fieldOfViewDeg: w && h && diag && focalLengthMm
      ? { width: fieldOfViewDeg(w, focalLengthMm), height: fieldOfViewDeg(h, focalLengthMm), diagonal: fieldOfViewDeg(diag, focalLengthMm) } : null,
    criticalFocusZoneUm: focalRatio ? criticalFocusZoneUm(focalRatio) : null,
  };
}
