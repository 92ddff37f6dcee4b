import "server-only";
// Step 2 of a plan: the train's fixed items from the request — the optics (with an optional
// separate corrector behind a telescope), the camera and the devices in between — each a
// catalog reference (looked up in one query, checked for its kind) or an inline solver shape.
import { getApprovedPartsByRefs } from "@/db/queries/parts";
import type { PartRow } from "@/db/schema";
import { buildCamera, buildOptics, rowToPlanItem, rowToSolverPart } from "@/lib/catalog/to-solver";
import { AppError } from "@/lib/errors";
import type { Camera, Optics, Part } from "@/lib/solver";
import type { PlanItem } from "./api-types";
import { isPartRef, type PartRef } from "./part-ref";
import type { PlanInput } from "./run-plan";

type GetRow = (ref: PartRef, field: string, kinds: string[] | null, what: string) => PartRow;

/** Every catalog reference of the request in one query; `get` throws the field's error. */
export async function resolveRefs(input: PlanInput): Promise<{ get: GetRow }> {
  const refs = [input.optics, input.camera, input.corrector, ...(input.stations ?? [])].filter(isPartRef).map((r) => r.partId);
  const rows = await getApprovedPartsByRefs({ refs });
  const byRef = new Map<string, PartRow>();
  for (const r of rows) { byRef.set(r.slug, r); byRef.set(r.id, r); }
  const get: GetRow = (ref, field, kinds, what) => {
    const row = byRef.get(ref.partId);
    if (!row) throw new AppError("not_found:part", `No approved part "${ref.partId}" in the catalog.`, { [field]: [`No approved part "${ref.partId}"`] });
    if (kinds && !kinds.includes(row.kind)) throw new AppError("bad_request:validation", `${row.maker} ${row.model} is not ${what}.`, { [field]: [`Not ${what}`] });
    return row;
  };
  return { get };
}

export type PlanOptics = {
  optics: Optics;
  /** Set only with a separate corrector: the telescope in front of it. */
  telescopeRow: PartRow | null;
  correctorRow: PartRow | null;
  focalLengthMm: number | null;
  apertureMm: number | null;
  focalRatio: number | null;
};

/** With the tolerance the request asks for, when it asks. */
export function withTolerance(optics: Optics, toleranceMm: number | undefined): Optics {
  return toleranceMm !== undefined ? { ...optics, backFocusToleranceMm: toleranceMm } : optics;
}

export function planOptics({ input, get, items }: { input: PlanInput; get: GetRow; items: Record<string, PlanItem> }): PlanOptics {
  if (!isPartRef(input.optics)) {
    const optics = withTolerance(input.optics, input.backFocusToleranceMm);
    return { optics, telescopeRow: null, correctorRow: null, focalLengthMm: null, apertureMm: null, focalRatio: optics.focalRatio ?? null };
  }
  const mainRow = get(input.optics, "optics.partId", ["optics"], "a telescope, an astrograph or a corrector");
  let telescopeRow: PartRow | null = null;
  let correctorRow: PartRow | null = null;
  if (input.corrector) {
    correctorRow = get(input.corrector, "corrector.partId", ["optics"], "a corrector");
    if (correctorRow.specs.opticsRole !== "corrector") throw new AppError("bad_request:validation", `${correctorRow.maker} ${correctorRow.model} is not a corrector.`, { "corrector.partId": ["Not a corrector"] });
    if (mainRow.specs.opticsRole !== "telescope") throw new AppError("bad_request:validation", "A separate corrector goes behind a telescope, not behind another corrector or an astrograph.", { "optics.partId": ["Choose a telescope to put the corrector behind"] });
    telescopeRow = mainRow;
  }
  const built = buildOptics(mainRow, correctorRow, input.backFocusToleranceMm);
  items[built.optics.id] = rowToPlanItem(correctorRow ?? mainRow);
  if (telescopeRow) items[telescopeRow.slug] = rowToPlanItem(telescopeRow);
  return { ...built, telescopeRow, correctorRow };
}

export function planCamera({ input, get, items }: { input: PlanInput; get: GetRow; items: Record<string, PlanItem> }): { camera: Camera; cameraRow: PartRow | null } {
  if (!isPartRef(input.camera)) return { camera: input.camera, cameraRow: null };
  const cameraRow = get(input.camera, "camera.partId", ["camera"], "a camera");
  const camera = buildCamera(cameraRow);
  items[camera.id] = rowToPlanItem(cameraRow);
  return { camera, cameraRow };
}

export function planStations({ input, get, items }: { input: PlanInput; get: GetRow; items: Record<string, PlanItem> }): Part[] {
  return (input.stations ?? []).map((s, i) => {
    if (!isPartRef(s)) return s;
    const row = get(s, `stations.${i}.partId`, null, "a device");
    if (row.kind === "optics" || row.kind === "camera") throw new AppError("bad_request:validation", `${row.maker} ${row.model} cannot be a device in the middle of the train.`, { [`stations.${i}.partId`]: ["Optics and cameras go at the ends"] });
    items[row.slug] = rowToPlanItem(row);
    return rowToSolverPart(row);
  });
}
