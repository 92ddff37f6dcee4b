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
  { code: "2in-24tpi", name: "2\"-24 Schmidt–Cassegrain thread", kind: "thread", diameterMm: 2 * INCH_MM, pitchMm: INCH_MM / 24,
    note: "2\"-24 UNS: pitch 25.4/24 = 1.0583 mm." },
  { code: "3.25in-24tpi", name: "3.25\"-24 large Schmidt–Cassegrain thread", kind: "thread", diameterMm: 3.25 * INCH_MM, pitchMm: INCH_MM / 24 },
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

/** A short label for a joint: "M48x0.75", "2-inch barrel". */
export function interfaceLabel(code: string): string {
  const spec = BY_CODE.get(code);
  if (!spec) return code;
  return spec.kind === "thread" ? code : spec.name;
}

/**
 * Our own colour rule for interface families: the nominal diameter picks a stop on a wheel
 * that skips the reds and ambers (kept for warnings), so neighbouring sizes look related.
 * The code is always written beside the colour; colour alone never carries the meaning.
 */
const HUE_STOPS = [188, 205, 222, 240, 258, 276, 294, 312, 52, 72, 92, 112, 140, 165];
export function interfaceHue(code: string): number {
  const spec = BY_CODE.get(code);
  const d = spec?.diameterMm ?? 40;
  const t = Math.min(1, Math.max(0, (d - 30) / 55));
  return HUE_STOPS[Math.round(t * (HUE_STOPS.length - 1))];
}
