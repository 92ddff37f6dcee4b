// T-rings, nosepieces, focuser clamps, SCT visual backs and barrel reducers.
//
// A T-ring carries a female T-thread (or wide M48) in front and a male bayonet behind. Its
// length makes up the T-mount's 55 mm: length = 55 − the body's published flange focal
// distance (Wikipedia, "T-mount"; the distances come from lib/interfaces.ts).
//
// A nosepiece's front is the male barrel that slides into a holder (sky side); its rear is a
// thread facing the sensor. Barrels slide, so barrel parts carry adjustMm: lengthMm is the
// length fully inserted, and the barrel may be drawn out by adjustMm.
import { getInterface } from "@/lib/interfaces";
import type { PartInput } from "@/lib/validation/parts";
import { bore, F, flangeFocalMm, M, LABEL, part, round2, type Code, type DemoMakerName, type Port } from "./makers";

/** The T-mount's flange focal distance (Wikipedia, "T-mount"). */
export const T_MOUNT_FLANGE_MM = 55;

const W = "Wrenfold Adapters" as const;

function tRing(front: "M42x0.75" | "M48x0.75", mount: Code): PartInput {
  const len = round2(T_MOUNT_FLANGE_MM - flangeFocalMm(mount));
  const throat = getInterface(mount)!.diameterMm;
  const wide = front === "M48x0.75";
  return part(W, {
    kind: "adapter", model: `${wide ? "Wide M48 " : ""}T-Ring ${LABEL[mount]}`,
    description: `Female ${LABEL[front]} in front, male ${LABEL[mount]} behind; ${len} mm, so that ring plus body make 55 mm.`,
    front: F(front), rear: M(mount), lengthMm: len, clearApertureMm: Math.min(bore(front), throat - 4),
    weightG: Math.round(30 + len * 2), listPriceCents: wide ? 4900 : 2900,
  });
}

const BAYONETS: readonly Code[] = ["bayonet-ef", "bayonet-f", "bayonet-e", "bayonet-rf", "bayonet-z", "bayonet-x", "bayonet-mft"];

export const tRings: PartInput[] = [
  ...BAYONETS.map((b) => tRing("M42x0.75", b)),
  tRing("M42x0.75", "M42x1"),
  ...(["bayonet-ef", "bayonet-f", "bayonet-e", "bayonet-rf", "bayonet-z"] as const).map((b) => tRing("M48x0.75", b)),
];

type Barrel = {
  maker: DemoMakerName; model: string; front: Port; rear: Port; lengthMm: number;
  adjustMm?: number; clear: number; weightG: number; price: number; description: string;
};

const barrelPart = (b: Barrel): PartInput => part(b.maker, {
  kind: "adapter", model: b.model, description: b.description, front: b.front, rear: b.rear, lengthMm: b.lengthMm,
  ...(b.adjustMm === undefined ? {} : { adjustMm: b.adjustMm }),
  clearApertureMm: b.clear, weightG: b.weightG, listPriceCents: b.price,
});

export const nosepieces: PartInput[] = [
  barrelPart({ maker: W, model: "1.25in Nosepiece, T Male", front: M("barrel-1.25in"), rear: M("M42x0.75"), lengthMm: 5,
    adjustMm: 15, clear: 27, weightG: 45, price: 1900, description: "1.25-inch barrel; male T-thread behind, into a T-ring or camera." }),
  barrelPart({ maker: W, model: "1.25in Nosepiece, T Female", front: M("barrel-1.25in"), rear: F("M42x0.75"), lengthMm: 6,
    adjustMm: 15, clear: 27, weightG: 50, price: 2100, description: "1.25-inch barrel; female T-thread behind." }),
  barrelPart({ maker: W, model: "2in Nosepiece, T Male", front: M("barrel-2in"), rear: M("M42x0.75"), lengthMm: 6,
    adjustMm: 20, clear: 38, weightG: 90, price: 2900, description: "2-inch barrel; male T-thread behind." }),
  barrelPart({ maker: W, model: "2in Nosepiece, M48 Male", front: M("barrel-2in"), rear: M("M48x0.75"), lengthMm: 5,
    adjustMm: 20, clear: 44, weightG: 85, price: 3200, description: "2-inch barrel; male M48 behind." }),
  barrelPart({ maker: W, model: "2in Nosepiece, M48 Female", front: M("barrel-2in"), rear: F("M48x0.75"), lengthMm: 8,
    adjustMm: 20, clear: 44, weightG: 95, price: 3400, description: "2-inch barrel; female M48 behind." }),
  barrelPart({ maker: W, model: "2in Nosepiece, M54 Male", front: M("barrel-2in"), rear: M("M54x0.75"), lengthMm: 8,
    adjustMm: 20, clear: 46, weightG: 110, price: 3900, description: "2-inch barrel; male M54 behind." }),
  barrelPart({ maker: "Harrowgate & Pell", model: "2in Nosepiece, SCT Male", front: M("barrel-2in"), rear: M("2in-24tpi"),
    lengthMm: 10, adjustMm: 20, clear: 44, weightG: 120, price: 3900,
    description: "Carries SCT-thread accessories, such as a reducer, in a 2-inch holder." }),
  barrelPart({ maker: W, model: "2in to 1.25in Flush Reducer", front: M("barrel-2in"), rear: F("barrel-1.25in"), lengthMm: 2,
    adjustMm: 20, clear: 27, weightG: 70, price: 2400, description: "2-inch barrel with a flush 1.25-inch holder inside." }),
  barrelPart({ maker: "Corvane Optical", model: "2in to 1.25in Compression Reducer", front: M("barrel-2in"),
    rear: F("barrel-1.25in"), lengthMm: 8, adjustMm: 15, clear: 27, weightG: 95, price: 3900,
    description: "2-inch barrel with a brass compression ring for 1.25-inch barrels." }),
];

export const holders: PartInput[] = [
  barrelPart({ maker: "Corvane Optical", model: "M68 to 2in Clamp", front: M("M68x1"), rear: F("barrel-2in"), lengthMm: 18,
    clear: 46, weightG: 160, price: 5900, description: "Male M68×1 into the focuser, 2-inch compression clamp behind." }),
  barrelPart({ maker: "Corvane Optical", model: "M63 to 2in Clamp", front: M("M63x1"), rear: F("barrel-2in"), lengthMm: 16,
    clear: 46, weightG: 140, price: 5400, description: "Male M63×1 into the focuser, 2-inch compression clamp behind." }),
];

/** SCT rear cells carry a male 2"-24 thread, so these accessories start with a female one. */
export const sctAccessories: PartInput[] = [
  part("Harrowgate & Pell", { kind: "adapter", model: "SCT 2in Visual Back", front: F("2in-24tpi"), rear: F("barrel-2in"),
    lengthMm: 28, clearApertureMm: 44, weightG: 150, listPriceCents: 6900, description: "2-inch holder on a female 2\"-24 thread." }),
  part("Harrowgate & Pell", { kind: "adapter", model: "SCT 1.25in Visual Back", front: F("2in-24tpi"), rear: F("barrel-1.25in"),
    lengthMm: 22, clearApertureMm: 27, weightG: 90, listPriceCents: 2900, description: "1.25-inch holder on a female 2\"-24 thread." }),
  part("Harrowgate & Pell", { kind: "adapter", model: "SCT Prime-Focus Tube, M48", front: F("2in-24tpi"), rear: M("M48x0.75"),
    lengthMm: 50, clearApertureMm: 44, weightG: 140, listPriceCents: 4400,
    description: "50 mm tube: with a wide M48 T-ring (11 mm on EF) and an EF body (44 mm) it makes the reducer's 105 mm." }),
];

export const mounts: PartInput[] = [...tRings, ...nosepieces, ...holders, ...sctAccessories];
