// What "what to change" may swap in: catalog cameras with about the same sensor or larger
// (one per front face and depth), and — behind a telescope only — catalog correctors that
// join it. An astrograph's corrector is built in, so nothing replaces it.
import type { PartRow } from "@/db/schema";
import { buildCamera, buildOptics } from "@/lib/catalog/to-solver";
import type { Camera, Optics, Part } from "@/lib/solver";
import { solveLink } from "./telescope-link";

export function remedyCandidates({ rows, camera, telescopeRow, correctorRow, parts, tolerance }: {
  /** The catalog's rows. */
  rows: Iterable<PartRow>; camera: Camera; telescopeRow: PartRow | null; correctorRow: PartRow | null; parts: Part[]; tolerance?: number;
}): { cameras: Camera[]; correctors: Optics[] } {
  const all = [...rows];
  const diag = camera.sensorDiagonalMm ?? 0;
  const byFace = new Map<string, Camera>();
  for (const row of all) {
    if (row.kind !== "camera") continue;
    const cam = buildCamera(row);
    if (!cam.front || (cam.sensorDiagonalMm ?? 0) < 0.8 * diag) continue;
    const key = `${cam.front.interface}|${cam.front.gender}|${cam.lengthMm}`;
    const prev = byFace.get(key);
    if (!prev || Math.abs((cam.sensorDiagonalMm ?? 0) - diag) < Math.abs((prev.sensorDiagonalMm ?? 0) - diag)) byFace.set(key, cam);
  }
  const correctors: Optics[] = [];
  if (telescopeRow && correctorRow) {
    for (const row of all) {
      if (row.kind !== "optics" || row.specs.opticsRole !== "corrector" || row.slug === correctorRow.slug) continue;
      if (solveLink(telescopeRow, row, parts).status !== "ok") continue;
      correctors.push(buildOptics(telescopeRow, row, tolerance).optics);
    }
  }
  return { cameras: [...byFace.values()], correctors };
}
