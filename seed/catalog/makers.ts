// The invented makers of the demo scenario, and the small helpers every family file uses.
// Every name, model and price here is invented; the dimensions follow the trade's customs.
import { getInterface } from "@/lib/interfaces";
import { slugify, type PartInput } from "@/lib/validation/parts";

export const DEMO_MAKERS = [
  { name: "Corvane Optical", blurb: "Doublet and triplet refractors with matching flatteners and reducers." },
  { name: "Ashdown Glassworks", blurb: "Astrographs with built-in correctors, coma correctors and long-back-focus reducers." },
  { name: "Harrowgate & Pell", blurb: "Schmidt–Cassegrain tubes, their reducers and visual backs." },
  { name: "Quillfield Imaging", blurb: "Cooled astronomy cameras, 17.5 mm flange depth, and their spacer sets." },
  { name: "Fennick Sensors", blurb: "Uncooled, guiding and planetary cameras with 6.5 and 12.5 mm depth." },
  { name: "Sorrel Camera Co.", blurb: "Interchangeable-lens camera bodies on the common bayonets." },
  { name: "Nettlebeck Instruments", blurb: "Filter wheels, filter drawers, off-axis guiders and tilt plates." },
  { name: "Marrick Astro Gear", blurb: "Filter wheels, drawers, guiders and rotators for larger sensors." },
  { name: "Tarrant Machining", blurb: "Spacer kits, step-down adapters, couplers and helical extensions." },
  { name: "Wrenfold Adapters", blurb: "T-rings, nosepieces, step-up adapters and barrel extensions." },
] as const;

export type DemoMakerName = (typeof DEMO_MAKERS)[number]["name"];

/** The registered interface codes (lib/interfaces.ts), spelled out so that a typo fails to compile. */
export type Code =
  | "M42x0.75" | "M42x1" | "M48x0.75" | "M54x0.75" | "M56x1" | "M63x1" | "M68x1" | "M82x1"
  | "2in-24tpi" | "3.25in-24tpi" | "barrel-1.25in" | "barrel-2in"
  | "bayonet-ef" | "bayonet-f" | "bayonet-e" | "bayonet-rf" | "bayonet-z" | "bayonet-x" | "bayonet-mft";

export const F = (code: Code) => ({ interface: code, gender: "female" as const });
export const M = (code: Code) => ({ interface: code, gender: "male" as const });
export type Port = ReturnType<typeof F> | ReturnType<typeof M>;

/** Short names used in model strings. */
export const LABEL: Record<Code, string> = {
  "M42x0.75": "T-thread", "M42x1": "M42×1", "M48x0.75": "M48", "M54x0.75": "M54", "M56x1": "M56",
  "M63x1": "M63", "M68x1": "M68", "M82x1": "M82", "2in-24tpi": "SCT 2\"-24", "3.25in-24tpi": "SCT 3.25\"-24",
  "barrel-1.25in": "1.25-inch", "barrel-2in": "2-inch",
  "bayonet-ef": "EF", "bayonet-f": "F", "bayonet-e": "E", "bayonet-rf": "RF", "bayonet-z": "Z",
  "bayonet-x": "X", "bayonet-mft": "Micro Four Thirds",
};

/**
 * Clear bore of a connecting part whose narrowest face is this thread or barrel (invented,
 * typical of the trade: a few millimetres of wall inside the nominal diameter).
 */
export const BORE_MM: Partial<Record<Code, number>> = {
  "M42x0.75": 38, "M42x1": 38, "M48x0.75": 44, "M54x0.75": 50, "M56x1": 52, "M63x1": 58, "M68x1": 63,
  "M82x1": 76, "2in-24tpi": 46, "3.25in-24tpi": 76, "barrel-1.25in": 27, "barrel-2in": 46,
};

export function bore(code: Code): number {
  const b = BORE_MM[code];
  if (b === undefined) throw new Error(`No bore for ${code}`);
  return b;
}

/** The published flange focal distance of a bayonet or screw mount, from the registry. */
export function flangeFocalMm(code: Code): number {
  const f = getInterface(code)?.flangeFocalMm;
  if (f === undefined) throw new Error(`${code} has no flange focal distance`);
  return f;
}

export const round2 = (x: number) => Math.round(x * 100) / 100;

type Draft = Omit<PartInput, "maker" | "slug">;

/** A part from one of the demo makers; the slug is maker + model. */
export function part(maker: DemoMakerName, draft: Draft): PartInput {
  return { maker, slug: slugify(maker, draft.model), ...draft };
}
