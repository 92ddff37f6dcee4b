// "What to change" when nothing lands in the window: try every single change and every pair
// of changes (removing a device, another camera from the catalog, another corrector from the
// catalog that joins the telescope) and report the smallest set that works. Only things the
// catalog holds are suggested, and a built-in corrector (an astrograph) is never "changed".
// Pure: the caller passes the catalog's cameras and correctors as solver shapes.
import { solveTrain, type Camera, type Optics, type SolveRequest } from "@/lib/solver";

export type Change =
  | { kind: "remove-station"; index: number; id: string }
  | { kind: "replace-camera"; id: string }
  | { kind: "replace-corrector"; id: string };

export type Remedy = { changes: Change[]; sensorDistanceMm: number; partCount: number };

export type RemedyInput = {
  request: SolveRequest;
  /** Catalog cameras that could take the current camera's place (already filtered by the caller). */
  cameras: Camera[];
  /** Catalog correctors that join the telescope, as the optics they would make; empty for an astrograph. */
  correctors: Optics[];
  /** Most remedies to report. */
  limit?: number;
};

type Option = { change: Change; apply: (r: SolveRequest) => SolveRequest; group: string };

function options({ request, cameras, correctors }: RemedyInput): Option[] {
  const out: Option[] = [];
  for (const [index, st] of (request.stations ?? []).entries()) {
    // Removals are applied by index in solveWith, all at once.
    out.push({ change: { kind: "remove-station", index, id: st.id }, group: `station-${index}`, apply: (r) => r });
  }
  for (const cam of cameras) {
    if (cam.id === request.camera.id) continue;
    out.push({ change: { kind: "replace-camera", id: cam.id }, group: "camera", apply: (r) => ({ ...r, camera: cam }) });
  }
  for (const corr of correctors) {
    if (corr.id === request.optics.id) continue;
    out.push({ change: { kind: "replace-corrector", id: corr.id }, group: "corrector", apply: (r) => ({ ...r, optics: corr }) });
  }
  return out;
}

/** The smallest sets of changes (one, else two) after which something lands in the window. */
export function whatToChange(input: RemedyInput): Remedy[] {
  const limit = input.limit ?? 5;
  const opts = options(input);
  const solveWith = (chosen: Option[]) => {
    // Remove stations by index from the original list, highest first, so indices stay true.
    let r: SolveRequest = { ...input.request, maxSolutions: 1 };
    const removals = chosen.filter((o) => o.change.kind === "remove-station").map((o) => (o.change as { index: number }).index).sort((a, b) => b - a);
    if (removals.length) r = { ...r, stations: (r.stations ?? []).filter((_, i) => !removals.includes(i)) };
    for (const o of chosen) if (o.change.kind !== "remove-station") r = o.apply(r);
    const res = solveTrain(r);
    return res.status === "ok" && res.solutions[0] ? res.solutions[0] : null;
  };
  const tryAll = (sets: Option[][]) => {
    const out: Remedy[] = [];
    for (const chosen of sets) {
      const chain = solveWith(chosen);
      if (chain) out.push({ changes: chosen.map((o) => o.change), sensorDistanceMm: chain.sensorDistanceMm, partCount: chain.partCount });
    }
    // Removing a device you chose costs nothing; then fewer connecting parts.
    const cost = (r: Remedy) => r.changes.filter((ch) => ch.kind !== "remove-station").length;
    return out.sort((x, y) => cost(x) - cost(y) || x.partCount - y.partCount);
  };
  const pairs = (keep: (a: Option, b: Option) => boolean) => {
    const out: Option[][] = [];
    for (let i = 0; i < opts.length; i++) for (let j = i + 1; j < opts.length; j++) if (opts[i].group !== opts[j].group && keep(opts[i], opts[j])) out.push([opts[i], opts[j]]);
    return out;
  };
  const isRemoval = (o: Option) => o.change.kind === "remove-station";
  const singles = tryAll(opts.map((o) => [o]));
  // Keeping the camera and corrector you chose: two removals, when no single removal works.
  const removals = singles.some((r) => r.changes.every((c) => c.kind === "remove-station")) ? [] : tryAll(pairs((x, y) => isRemoval(x) && isRemoval(y)));
  const mixed = singles.length || removals.length ? [] : tryAll(pairs((x, y) => !(isRemoval(x) && isRemoval(y))));
  const found = [...singles.slice(0, 3), ...removals.slice(0, 2), ...mixed.slice(0, 3)];
  return found.slice(0, limit);
}
