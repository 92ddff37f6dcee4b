// The connection standards a part's face can carry. Codes are stable identifiers used in
// the database, the API and URLs; names are what people read.
//
// Sources: thread sizes and pitches — C. Hoffman, "Useful Optomechanical Shop Data";
// Wikipedia "T-mount", "M42 lens mount"; ISO 724 for metric thread geometry.
// Bayonet flange focal distances — Wikipedia, "Flange focal distance" (from memory of that
// list; Micro Four Thirds 19.25 mm also in Wikipedia, "Micro Four Thirds system").

export type InterfaceKind = "thread" | "barrel" | "bayonet";

export type InterfaceSpec = {
  code: string;
  name: string;
  kind: InterfaceKind;
  /** Nominal major diameter (threads), outside diameter (barrels) or throat (bayonets), mm. */
  diameterMm: number;
  /** Thread pitch in mm; null for barrels and bayonets. */
  pitchMm: number | null;
  /** Bayonets and camera screw mounts: published flange focal distance, mm. */
  flangeFocalMm?: number;
  note?: string;
  /** What people call it where the code is not what they would write ("SCT 2\"-24"). */
  short?: string;
};

const INCH_MM = 25.4;

export const INTERFACES: readonly InterfaceSpec[] = [
  { code: "M42x0.75", name: "T-thread (M42 × 0.75)", kind: "thread", diameterMm: 42, pitchMm: 0.75, flangeFocalMm: 55,
    note: "The T-mount: 55 mm from its flange to the focal plane." },
  { code: "M42x1", name: "M42 × 1 screw mount", kind: "thread", diameterMm: 42, pitchMm: 1, flangeFocalMm: 45.46,
    note: "Looks like T-thread but does not mate with it: the pitch differs." },
  { code: "M48x0.75", name: "M48 × 0.75", kind: "thread", diameterMm: 48, pitchMm: 0.75 },
  { code: "M54x0.75", name: "M54 × 0.75", kind: "thread", diameterMm: 54, pitchMm: 0.75 },
  { code: "M56x1", name: "M56 × 1", kind: "thread", diameterMm: 56, pitchMm: 1 },
  { code: "M63x1", name: "M63 × 1", kind: "thread", diameterMm: 63, pitchMm: 1 },
  { code: "M68x1", name: "M68 × 1", kind: "thread", diameterMm: 68, pitchMm: 1 },
  { code: "M82x1", name: "M82 × 1", kind: "thread", diameterMm: 82, pitchMm: 1 },
  { code: "2in-24tpi", name: "2\"-24 Schmidt–Cassegrain thread", kind: "thread", diameterMm: 2 * INCH_MM, pitchMm: INCH_MM / 24, short: "SCT 2\"-24",
    note: "2\"-24 UNS: pitch 25.4/24 = 1.0583 mm." },
  { code: "3.25in-24tpi", name: "3.25\"-24 large Schmidt–Cassegrain thread", kind: "thread", diameterMm: 3.25 * INCH_MM, pitchMm: INCH_MM / 24, short: "SCT 3.25\"-24" },
  { code: "barrel-1.25in", name: "1.25-inch barrel", kind: "barrel", diameterMm: 1.25 * INCH_MM, pitchMm: null,
    note: "Male: the nosepiece; female: the holder that clamps it." },
  { code: "barrel-2in", name: "2-inch barrel", kind: "barrel", diameterMm: 2 * INCH_MM, pitchMm: null,
    note: "Male: the nosepiece; female: the holder that clamps it." },
  { code: "bayonet-ef", name: "EF bayonet", kind: "bayonet", diameterMm: 54, pitchMm: null, flangeFocalMm: 44.0 },
  { code: "bayonet-f", name: "F bayonet", kind: "bayonet", diameterMm: 44, pitchMm: null, flangeFocalMm: 46.5 },
  { code: "bayonet-e", name: "E bayonet", kind: "bayonet", diameterMm: 46.1, pitchMm: null, flangeFocalMm: 18.0 },
  { code: "bayonet-rf", name: "RF bayonet", kind: "bayonet", diameterMm: 54, pitchMm: null, flangeFocalMm: 20.0 },
  { code: "bayonet-z", name: "Z bayonet", kind: "bayonet", diameterMm: 55, pitchMm: null, flangeFocalMm: 16.0 },
  { code: "bayonet-x", name: "X bayonet", kind: "bayonet", diameterMm: 44, pitchMm: null, flangeFocalMm: 17.7 },
  { code: "bayonet-mft", name: "Micro Four Thirds bayonet", kind: "bayonet", diameterMm: 38, pitchMm: null, flangeFocalMm: 19.25 },
];

const BY_CODE = new Map(INTERFACES.map((i) => [i.code, i]));

export const INTERFACE_CODES = INTERFACES.map((i) => i.code) as readonly string[];

export function getInterface(code: string): InterfaceSpec | undefined {
  return BY_CODE.get(code);
}

export function isKnownInterface(code: string): boolean {
  return BY_CODE.has(code);
}

/** A short label for a joint: "M48x0.75", "SCT 2\"-24", "2-inch barrel". */
export function interfaceLabel(code: string): string {
  const spec = BY_CODE.get(code);
  if (!spec) return code;
  return spec.short ?? (spec.kind === "thread" ? code : spec.name);
}

/**
 * Our own colour rule: every interface has its own hue on a wheel that skips the reds and
 * ambers (kept for warnings). Look-alikes that do not mate sit far apart on the wheel
 * (M42×0.75 vs M42×1; 2-inch barrel vs M48 vs SCT 2"-24). The label is always written beside
 * the colour; colour alone never carries the meaning (and night mode paints them all red).
 */
const HUES: Record<string, number> = {
  "2in-24tpi": 60, "M82x1": 108, "M56x1": 84, "M48x0.75": 132, "bayonet-ef": 148, "M54x0.75": 164,
  "bayonet-f": 180, "M42x0.75": 196, "bayonet-e": 204, "barrel-1.25in": 214, "barrel-2in": 228,
  "bayonet-rf": 238, "M63x1": 252, "bayonet-z": 264, "M68x1": 276, "bayonet-x": 288,
  "3.25in-24tpi": 298, "bayonet-mft": 308, "M42x1": 320,
};
export function interfaceHue(code: string): number {
  return HUES[code] ?? 200;
}

/** Pairs that look alike or share a size but do not mate: their colours must differ most. */
export const LOOK_ALIKES: readonly (readonly string[])[] = [
  ["M42x0.75", "M42x1"], ["barrel-2in", "M48x0.75", "2in-24tpi"], ["bayonet-ef", "bayonet-rf"], ["bayonet-f", "bayonet-x"],
];
