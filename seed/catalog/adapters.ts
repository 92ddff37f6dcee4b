// Thread-to-thread adapters: a step-down adapter for every pair of registered threads
// (female larger thread in front, male smaller thread behind), step-ups where the two sizes are
// close enough for a short adapter, gender changers and couplers. Lengths invented, typical.
import { getInterface } from "@/lib/interfaces";
import type { PartInput } from "@/lib/validation/parts";
import { bore, F, M, LABEL, part, type Code } from "./makers";

/** Every registered thread (lib/interfaces.ts, kind "thread"). */
export const THREADS: readonly Code[] = [
  "M42x0.75", "M42x1", "M48x0.75", "2in-24tpi", "M54x0.75", "M56x1", "M63x1", "M68x1", "M82x1", "3.25in-24tpi",
];

const diameter = (code: Code) => getInterface(code)!.diameterMm;

/** Body length of a short step adapter, set by its larger thread (invented, typical). */
const STEP_LENGTH_MM: Partial<Record<Code, number>> = {
  "M48x0.75": 3, "2in-24tpi": 6, "M54x0.75": 4, "M56x1": 4, "M63x1": 5, "M68x1": 5, "M82x1": 6, "3.25in-24tpi": 7,
};

/** Step-ups are made only where the larger thread is at most this much wider (a longer flare otherwise). */
const STEP_UP_MAX_MM = 15;

function stepDown(big: Code, small: Code): PartInput {
  const len = STEP_LENGTH_MM[big]!;
  return part("Tarrant Machining", {
    kind: "adapter", model: `Step-Down ${LABEL[big]} F to ${LABEL[small]} M`,
    description: `Female ${LABEL[big]} in front, male ${LABEL[small]} behind; ${len} mm.`,
    // Not reversible: turned round, the narrow thread would face the sky and step the beam
    // down before wider glass — the trade uses a step-up for that (common practice).
    front: F(big), rear: M(small), lengthMm: len, clearApertureMm: bore(small),
    weightG: Math.round(15 + diameter(big) * 0.6), listPriceCents: 1900 + Math.round(diameter(big)) * 30,
  });
}

function stepUp(small: Code, big: Code): PartInput {
  const len = STEP_LENGTH_MM[big]! + 2;
  return part("Wrenfold Adapters", {
    kind: "adapter", model: `Step-Up ${LABEL[small]} F to ${LABEL[big]} M`,
    description: `Female ${LABEL[small]} in front, male ${LABEL[big]} behind; ${len} mm.`,
    front: F(small), rear: M(big), lengthMm: len, clearApertureMm: bore(small) - 2,
    weightG: Math.round(20 + diameter(big) * 0.7), listPriceCents: 2400 + Math.round(diameter(big)) * 30,
  });
}

function stepAdapters(): PartInput[] {
  const out: PartInput[] = [];
  for (let i = 0; i < THREADS.length; i++) {
    for (let j = i + 1; j < THREADS.length; j++) {
      const [small, big] = [THREADS[i], THREADS[j]];
      // Same diameter, different pitch: the M42×1 T-ring (mounts.ts) and its reverse (below) instead.
      if (diameter(small) === diameter(big)) continue;
      out.push(stepDown(big, small));
      if (diameter(big) - diameter(small) <= STEP_UP_MAX_MM) out.push(stepUp(small, big));
    }
  }
  return out;
}

const coupler = (thread: Code, gender: "male" | "female", len: number): PartInput => part("Tarrant Machining", {
  kind: "adapter", model: `${LABEL[thread]} ${gender === "male" ? "Male–Male" : "Female–Female"} Coupler ${len} mm`,
  description: gender === "male"
    ? "Joins two female faces, e.g. a filter wheel to a camera; either way round."
    : "Joins two male faces; either way round.",
  front: gender === "male" ? M(thread) : F(thread), rear: gender === "male" ? M(thread) : F(thread),
  lengthMm: len, reversible: true, clearApertureMm: bore(thread), weightG: Math.round(8 + len * 4),
  listPriceCents: 1500 + Math.round(len * 100),
});

const genderChanger = (front: Code, rear: Code, len: number): PartInput => part("Tarrant Machining", {
  kind: "adapter", model: `${LABEL[front]} M to ${LABEL[rear]} F Adapter`,
  description: `Male ${LABEL[front]} in front, female ${LABEL[rear]} behind; ${len} mm.`,
  front: M(front), rear: F(rear), lengthMm: len, clearApertureMm: Math.min(bore(front), bore(rear)),
  weightG: Math.round(12 + len * 5), listPriceCents: 2200,
});

export const threadAdapters: PartInput[] = [
  ...stepAdapters(),
  part("Tarrant Machining", {
    kind: "adapter", model: "M42×1 F to T (M42×0.75) M Adapter",
    description: "Lets a male M42×1 screw-mount face feed a T-thread train; the two pitches never mate directly.",
    front: F("M42x1"), rear: M("M42x0.75"), lengthMm: 5, clearApertureMm: 36, weightG: 30, listPriceCents: 2900,
  }),
  coupler("M42x0.75", "male", 1.5),
  coupler("M48x0.75", "male", 1.5),
  coupler("M54x0.75", "male", 2),
  coupler("M68x1", "male", 2),
  coupler("M42x0.75", "female", 5),
  coupler("M48x0.75", "female", 6),
  coupler("M54x0.75", "female", 6),
  genderChanger("M48x0.75", "M42x0.75", 2),
  genderChanger("M54x0.75", "M48x0.75", 2),
  genderChanger("M42x0.75", "M48x0.75", 3),
];
