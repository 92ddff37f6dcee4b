// Warnings on a finished chain. Each needs its inputs; without them it is simply not checked.

import { requiredClearApertureMm } from "../optics";
import { grams, mm, nameOf } from "./format";
import type { Problem } from "./problem";
import type { Chain, ChainWarning, Part } from "./types";

const positive = (x: number | undefined | null): x is number => typeof x === "number" && Number.isFinite(x) && x > 0;

/** The focal ratio and sensor diagonal vignetting is judged with, or null when it is not judged. */
export function vignettingInputs(p: Problem): { N: number; s: number } | null {
  const N = p.req.optics.focalRatio, s = p.req.camera.sensorDiagonalMm;
  return positive(N) && typeof s === "number" && s >= 0 ? { N, s } : null;
}

/** The most the optics may carry (g), or null when the load is not judged. */
export function loadLimitG(p: Problem): number | null {
  const max = p.req.optics.maxLoadG;
  return typeof max === "number" && Number.isFinite(max) ? max : null;
}

export function chainWarnings(p: Problem, chain: Chain, parts: readonly Part[]): ChainWarning[] {
  const { optics } = p.req;
  const out: ChainWarning[] = [];
  const D = chain.sensorDistanceMm;
  const vig = vignettingInputs(p);

  if (vig) {
    const { N, s } = vig;
    // The optics' own rear opening (a corrector's last lens cell) is the first stop the cone
    // passes, D from the sensor; N is the system's focal ratio (telescope × corrector factor).
    if (typeof optics.clearApertureMm === "number") {
      const need = requiredClearApertureMm(s, D, N);
      if (optics.clearApertureMm < need - 1e-9) {
        out.push({
          code: "vignetting",
          partId: optics.id,
          message: `The rear of ${nameOf(optics)} clears ${mm(optics.clearApertureMm)} but needs ${mm(need)} at ${mm(D)} from the sensor ` +
            `(a ${mm(s)} diagonal plus ${mm(D)} / f/${Number(N.toFixed(2))}), so the corners will darken.`,
        });
      }
    }
    chain.steps.forEach((step, i) => {
      const ca = parts[i].clearApertureMm;
      if (typeof ca !== "number") return;
      const d = Math.max(0, D - step.startMm);
      const need = requiredClearApertureMm(s, d, N);
      if (ca < need - 1e-9) {
        out.push({
          code: "vignetting",
          partId: step.partId,
          message: `${nameOf(parts[i])} clears ${mm(ca)} but needs ${mm(need)} at ${mm(d)} from the sensor ` +
            `(a ${mm(s)} diagonal plus ${mm(d)} / f/${Number(N.toFixed(2))}), so the corners will darken.`,
        });
      }
    });
  }

  const s = p.req.camera.sensorDiagonalMm;
  if (positive(optics.imageCircleMm) && typeof s === "number" && s > optics.imageCircleMm + 1e-9) {
    out.push({
      code: "image-circle",
      partId: optics.id,
      message: `The sensor diagonal of ${mm(s)} is larger than the ${mm(optics.imageCircleMm)} image circle of ` +
        `${nameOf(optics)}, so the corners fall outside the corrected field.`,
    });
  }

  // The load is what hangs from the optics: every step after them. The optics' own weight
  // does not count — they are what carries it.
  const maxLoad = loadLimitG(p);
  if (maxLoad !== null) {
    let total = 0, unknown = 0;
    for (const part of parts) {
      if (typeof part.weightG === "number") total += part.weightG;
      else unknown++;
    }
    if (total > maxLoad + 1e-9) {
      out.push({
        code: "load",
        message: `The train hanging from ${nameOf(optics)} weighs ${unknown ? "at least " : ""}${grams(total)}, ` +
          `more than the ${grams(maxLoad)} it is rated to carry.`,
      });
    }
  }
  return out;
}
