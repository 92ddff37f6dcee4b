// Devices that sit in a train: off-axis guiders (about 9–17 mm), tilt plates, rotators,
// and star diagonals for visual use. Dimensions invented, typical of the trade.
import type { PartInput } from "@/lib/validation/parts";
import { F, M, part, type Code, type DemoMakerName } from "./makers";

type Dev = {
  maker: DemoMakerName; model: string; thread: Code; rearMale: boolean; lengthMm: number; clear: number;
  weightG: number; price: number; description: string; adjustMm?: number;
};

function device(kind: "oag" | "tilt-plate" | "other", d: Dev): PartInput {
  return part(d.maker, {
    kind, model: d.model, description: d.description,
    front: F(d.thread), rear: d.rearMale ? M(d.thread) : F(d.thread), lengthMm: d.lengthMm,
    ...(d.adjustMm === undefined ? {} : { adjustMm: d.adjustMm }),
    clearApertureMm: d.clear, weightG: d.weightG, listPriceCents: d.price,
  });
}

const NB = "Nettlebeck Instruments" as const;
const MR = "Marrick Astro Gear" as const;

export const oags: PartInput[] = [
  device("oag", { maker: NB, model: "Sidelook 9 Slim OAG", thread: "M42x0.75", rearMale: true, lengthMm: 9, clear: 34,
    weightG: 150, price: 12900, description: "Off-axis guider, 9 mm; female T-thread front, male rear; 8 mm prism." }),
  device("oag", { maker: NB, model: "Sidelook 10.5 OAG", thread: "M48x0.75", rearMale: true, lengthMm: 10.5, clear: 40,
    weightG: 190, price: 15900, description: "Off-axis guider, 10.5 mm; female M48 front, male M48 rear." }),
  device("oag", { maker: NB, model: "Sidelook 16.5 OAG", thread: "M48x0.75", rearMale: false, lengthMm: 16.5, clear: 42,
    weightG: 230, price: 17900, description: "Off-axis guider, 16.5 mm; female M48 on both faces." }),
  device("oag", { maker: MR, model: "Periscope 12 OAG", thread: "M54x0.75", rearMale: true, lengthMm: 12, clear: 46,
    weightG: 260, price: 21900, description: "Off-axis guider for full-frame trains; M54, 12 mm." }),
  device("oag", { maker: MR, model: "Periscope 17 OAG", thread: "M48x0.75", rearMale: false, lengthMm: 17, clear: 42,
    weightG: 240, price: 18900, description: "Off-axis guider with a large prism; female M48 both faces, 17 mm." }),
  device("oag", { maker: MR, model: "Periscope 14 T OAG", thread: "M42x0.75", rearMale: false, lengthMm: 14, clear: 34,
    weightG: 200, price: 14900, description: "Off-axis guider; female T-thread on both faces, 14 mm." }),
];

export const tiltPlates: PartInput[] = [
  device("tilt-plate", { maker: NB, model: "Level T Tilt Plate", thread: "M42x0.75", rearMale: true, lengthMm: 5, adjustMm: 1,
    clear: 36, weightG: 60, price: 6900, description: "Push-pull tilt adjuster, 5–6 mm; T-thread." }),
  device("tilt-plate", { maker: NB, model: "Level 48 Tilt Plate", thread: "M48x0.75", rearMale: true, lengthMm: 6.5, adjustMm: 1,
    clear: 42, weightG: 80, price: 7900, description: "Push-pull tilt adjuster, 6.5–7.5 mm; M48." }),
  device("tilt-plate", { maker: MR, model: "Trim 54 Tilt Plate", thread: "M54x0.75", rearMale: true, lengthMm: 8, adjustMm: 1.5,
    clear: 48, weightG: 110, price: 9900, description: "Three-point tilt adjuster, 8–9.5 mm; M54." }),
];

export const rotators: PartInput[] = [
  device("other", { maker: MR, model: "Turnstile 48 Camera Rotator", thread: "M48x0.75", rearMale: true, lengthMm: 17,
    clear: 44, weightG: 210, price: 11900, description: "Manual camera-angle rotator, 17 mm; M48." }),
  device("other", { maker: MR, model: "Turnstile 54 Camera Rotator", thread: "M54x0.75", rearMale: true, lengthMm: 18,
    clear: 48, weightG: 260, price: 13900, description: "Manual camera-angle rotator, 18 mm; M54." }),
];

/** Star diagonals: barrel in front (slides, hence adjustMm), holder behind; length is the folded light path. */
export const diagonals: PartInput[] = [
  part("Corvane Optical", {
    kind: "diagonal", model: "Prism 2in Dielectric Diagonal", description: "2-inch nosepiece in, 2-inch holder out.",
    front: M("barrel-2in"), rear: F("barrel-2in"), lengthMm: 100, adjustMm: 15, clearApertureMm: 44,
    weightG: 520, listPriceCents: 17900,
  }),
  part("Corvane Optical", {
    kind: "diagonal", model: "Prism 1.25in Diagonal", description: "1.25-inch nosepiece in, 1.25-inch holder out.",
    front: M("barrel-1.25in"), rear: F("barrel-1.25in"), lengthMm: 60, adjustMm: 10, clearApertureMm: 25,
    weightG: 180, listPriceCents: 6900,
  }),
];

export const devices: PartInput[] = [...oags, ...tiltPlates, ...rotators, ...diagonals];
