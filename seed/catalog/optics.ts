// Telescopes, correctors and astrographs. Written by hand: these are the hero parts.
// Optics add no length to a train (back focus is measured from their rear joint plane),
// so every optic has lengthMm 0 except correctors, whose lengthMm is their body length.
import type { PartInput } from "@/lib/validation/parts";
import { F, M, part, type Code, type Port, type DemoMakerName } from "./makers";

type Scope = {
  maker: DemoMakerName; model: string; apertureMm: number; focalLengthMm: number; rear: Code;
  rearGender: "male" | "female"; maxLoadG: number; weightG: number; price: number; description: string;
};

function telescope(s: Scope): PartInput {
  return part(s.maker, {
    kind: "optics", model: s.model, description: s.description,
    front: null, rear: s.rearGender === "male" ? M(s.rear) : F(s.rear), lengthMm: 0,
    weightG: s.weightG, listPriceCents: s.price,
    specs: { opticsRole: "telescope", apertureMm: s.apertureMm, focalLengthMm: s.focalLengthMm, maxLoadG: s.maxLoadG },
  });
}

type Corr = {
  maker: DemoMakerName; model: string; front: Port; rear: Code; backFocusMm: number;
  tol: number; reduction: number; imageCircleMm: number; lengthMm: number; clear: number;
  weightG: number; price: number; description: string;
};

function corrector(c: Corr): PartInput {
  return part(c.maker, {
    kind: "optics", model: c.model, description: c.description,
    front: c.front, rear: M(c.rear), lengthMm: c.lengthMm,
    clearApertureMm: c.clear, weightG: c.weightG, listPriceCents: c.price,
    specs: { opticsRole: "corrector", backFocusMm: c.backFocusMm, backFocusToleranceMm: c.tol,
      reduction: c.reduction, imageCircleMm: c.imageCircleMm },
  });
}

type Astro = {
  maker: DemoMakerName; model: string; apertureMm: number; focalLengthMm: number; rear: Code;
  backFocusMm: number; tol: number; imageCircleMm: number; maxLoadG: number; weightG: number;
  price: number; description: string; clear: number;
};

function astrograph(a: Astro): PartInput {
  return part(a.maker, {
    kind: "optics", model: a.model, description: a.description,
    front: null, rear: M(a.rear), lengthMm: 0, clearApertureMm: a.clear, weightG: a.weightG, listPriceCents: a.price,
    specs: { opticsRole: "astrograph", apertureMm: a.apertureMm, focalLengthMm: a.focalLengthMm,
      backFocusMm: a.backFocusMm, backFocusToleranceMm: a.tol, imageCircleMm: a.imageCircleMm, maxLoadG: a.maxLoadG },
  });
}

const C = "Corvane Optical" as const;
const A = "Ashdown Glassworks" as const;
const H = "Harrowgate & Pell" as const;

export const telescopes: PartInput[] = [
  telescope({ maker: C, model: "Meridian 60 ED", apertureMm: 60, focalLengthMm: 360, rear: "barrel-2in", rearGender: "female",
    maxLoadG: 1800, weightG: 1900, price: 54900, description: "Travel doublet; 2-inch holder on a rack-and-pinion focuser." }),
  telescope({ maker: C, model: "Meridian 72 ED", apertureMm: 72, focalLengthMm: 430, rear: "barrel-2in", rearGender: "female",
    maxLoadG: 2500, weightG: 2400, price: 69900, description: "Doublet refractor with a 2-inch holder." }),
  telescope({ maker: C, model: "Meridian 80 ED", apertureMm: 80, focalLengthMm: 480, rear: "barrel-2in", rearGender: "female",
    maxLoadG: 3000, weightG: 3100, price: 89900, description: "f/6 doublet; 2-inch compression-ring holder." }),
  telescope({ maker: C, model: "Meridian 90 Triplet", apertureMm: 90, focalLengthMm: 540, rear: "M63x1", rearGender: "female",
    maxLoadG: 3500, weightG: 4200, price: 149900, description: "Triplet; the 2-inch holder unscrews to leave a female M63×1 face." }),
  telescope({ maker: C, model: "Meridian 102 ED", apertureMm: 102, focalLengthMm: 714, rear: "barrel-2in", rearGender: "female",
    maxLoadG: 4000, weightG: 4800, price: 159900, description: "f/7 doublet with a 2-inch holder." }),
  telescope({ maker: C, model: "Meridian 115 Triplet", apertureMm: 115, focalLengthMm: 805, rear: "M68x1", rearGender: "female",
    maxLoadG: 5000, weightG: 6300, price: 279900, description: "Triplet; 3-inch focuser ending in a female M68×1 thread." }),
  telescope({ maker: C, model: "Meridian 130 Triplet", apertureMm: 130, focalLengthMm: 910, rear: "M68x1", rearGender: "female",
    maxLoadG: 6000, weightG: 8900, price: 449900, description: "Triplet; 3-inch focuser ending in a female M68×1 thread." }),
  // Plain Newtonians (no corrector built in) for the coma correctors to sit in.
  telescope({ maker: A, model: "Spar 200 f/5 Newtonian", apertureMm: 200, focalLengthMm: 1000, rear: "barrel-2in", rearGender: "female",
    maxLoadG: 2500, weightG: 9200, price: 59900, description: "f/5 Newtonian on a 2-inch dual-speed focuser; needs a coma corrector for imaging." }),
  telescope({ maker: A, model: "Spar 250 f/4 Newtonian", apertureMm: 250, focalLengthMm: 1000, rear: "barrel-2in", rearGender: "female",
    maxLoadG: 3000, weightG: 12800, price: 89900, description: "Fast f/4 Newtonian with a 2-inch focuser; coma grows quickly off axis without a corrector." }),
  telescope({ maker: H, model: "Ridgeway 8 SCT", apertureMm: 203, focalLengthMm: 2032, rear: "2in-24tpi", rearGender: "male",
    maxLoadG: 5000, weightG: 5700, price: 139900, description: "f/10 Schmidt–Cassegrain; male 2\"-24 thread on the rear cell." }),
  telescope({ maker: H, model: "Ridgeway 9.25 SCT", apertureMm: 235, focalLengthMm: 2350, rear: "2in-24tpi", rearGender: "male",
    maxLoadG: 5500, weightG: 9100, price: 189900, description: "f/10 Schmidt–Cassegrain; male 2\"-24 rear cell thread." }),
  telescope({ maker: H, model: "Ridgeway 11 SCT", apertureMm: 280, focalLengthMm: 2800, rear: "3.25in-24tpi", rearGender: "male",
    maxLoadG: 7000, weightG: 12700, price: 299900, description: "f/10 Schmidt–Cassegrain; large male 3.25\"-24 rear cell thread." }),
  telescope({ maker: H, model: "Ridgeway 14 SCT", apertureMm: 356, focalLengthMm: 3910, rear: "3.25in-24tpi", rearGender: "male",
    maxLoadG: 9000, weightG: 20900, price: 629900, description: "f/11 Schmidt–Cassegrain; male 3.25\"-24 rear cell thread." }),
];

export const correctors: PartInput[] = [
  corrector({ maker: C, model: "Plano 1.0× Flattener", front: M("barrel-2in"), rear: "M48x0.75", backFocusMm: 55, tol: 0.5,
    reduction: 1, imageCircleMm: 34, lengthMm: 48, clear: 44, weightG: 420, price: 29900,
    description: "Two-element field flattener for f/6–f/7 doublets. 2-inch barrel front, male M48 rear, 55 mm back focus; a 34 mm circle lit to the edge." }),
  corrector({ maker: C, model: "Plano 0.8× Reducer", front: M("barrel-2in"), rear: "M48x0.75", backFocusMm: 55, tol: 0.5,
    reduction: 0.8, imageCircleMm: 32, lengthMm: 52, clear: 44, weightG: 460, price: 34900,
    description: "Reducer-flattener for f/6–f/7 doublets; 55 mm back focus from the male M48 rear." }),
  corrector({ maker: C, model: "Plano-T 1.0× Flattener", front: M("barrel-2in"), rear: "M42x0.75", backFocusMm: 55, tol: 0.5,
    reduction: 1, imageCircleMm: 28, lengthMm: 45, clear: 38, weightG: 360, price: 22900,
    description: "Flattener for smaller sensors on f/6–f/7 doublets; male T-thread (M42×0.75) rear, 55 mm back focus." }),
  corrector({ maker: C, model: "Brevis 0.72× Compact Reducer", front: M("barrel-2in"), rear: "M48x0.75", backFocusMm: 40, tol: 0.3,
    reduction: 0.72, imageCircleMm: 32, lengthMm: 38, clear: 42, weightG: 380, price: 31900,
    description: "Short reducer for f/6 doublets: only 40 mm back focus, so deep cameras with a filter wheel cannot reach it." }),
  corrector({ maker: C, model: "Plano 0.75× M63 Reducer", front: M("M63x1"), rear: "M48x0.75", backFocusMm: 63.5, tol: 0.5,
    reduction: 0.75, imageCircleMm: 29, lengthMm: 40, clear: 44, weightG: 540, price: 42900,
    description: "Screws onto the Meridian 90's M63×1 face; 63.5 mm back focus." }),
  corrector({ maker: C, model: "Plano 1.0× M68 Flattener", front: M("M68x1"), rear: "M54x0.75", backFocusMm: 56, tol: 0.5,
    reduction: 1, imageCircleMm: 42, lengthMm: 44, clear: 50, weightG: 610, price: 44900,
    description: "For f/7 triplets (the 115 and 130); male M54 rear, 56 mm back focus." }),
  corrector({ maker: A, model: "Keel CC-1 Coma Corrector", front: M("barrel-2in"), rear: "M48x0.75", backFocusMm: 55, tol: 0.3,
    reduction: 1, imageCircleMm: 30, lengthMm: 60, clear: 44, weightG: 350, price: 24900,
    description: "Four-element coma corrector for f/4 Newtonians; tight ±0.3 mm tolerance." }),
  corrector({ maker: A, model: "Keel CR-0.73 Coma Reducer", front: M("barrel-2in"), rear: "M54x0.75", backFocusMm: 72, tol: 0.3,
    reduction: 0.73, imageCircleMm: 23, lengthMm: 58, clear: 48, weightG: 410, price: 36900,
    description: "Reducing coma corrector for f/4–f/5 Newtonians; male M54 rear, a long 72 mm back focus." }),
  corrector({ maker: A, model: "Lintel R-0.79 Reducer", front: M("M68x1"), rear: "M48x0.75", backFocusMm: 58, tol: 0.5,
    reduction: 0.79, imageCircleMm: 33, lengthMm: 42, clear: 44, weightG: 520, price: 39900,
    description: "Reducer-flattener for f/7 triplets: male M68×1 front for their female M68×1 focusers; 58 mm back focus." }),
  corrector({ maker: A, model: "Lintel R-0.85 Wide Reducer", front: M("M68x1"), rear: "M68x1", backFocusMm: 85, tol: 0.5,
    reduction: 0.85, imageCircleMm: 46, lengthMm: 36, clear: 62, weightG: 680, price: 54900,
    description: "Large-field reducer for f/7 triplets with an 85 mm back focus; male M68×1 rear so a full-frame sensor is lit to the corners." }),
  corrector({ maker: H, model: "Ridgeway 0.63× SCT Reducer", front: F("2in-24tpi"), rear: "2in-24tpi", backFocusMm: 105, tol: 1,
    reduction: 0.63, imageCircleMm: 28, lengthMm: 30, clear: 46, weightG: 250, price: 17900,
    description: "Reducer-corrector for f/10 SCTs: female 2\"-24 front, male 2\"-24 rear, 105 mm back focus." }),
  corrector({ maker: H, model: "Ridgeway 0.7× SCT Reducer-Flattener", front: F("2in-24tpi"), rear: "M48x0.75", backFocusMm: 105, tol: 0.5,
    reduction: 0.7, imageCircleMm: 29, lengthMm: 34, clear: 44, weightG: 390, price: 44900,
    description: "Flat-field reducer for 8- and 9.25-inch SCTs; male M48 rear, 105 mm back focus." }),
  corrector({ maker: H, model: "Ridgeway 0.7× XL SCT Reducer-Flattener", front: F("3.25in-24tpi"), rear: "M68x1", backFocusMm: 146,
    tol: 0.5, reduction: 0.7, imageCircleMm: 40, lengthMm: 40, clear: 62, weightG: 620, price: 54900,
    description: "For the 11- and 14-inch SCTs' 3.25\"-24 thread; male M68×1 rear, 146 mm back focus." }),
];

export const astrographs: PartInput[] = [
  astrograph({ maker: A, model: "Pennant 61", apertureMm: 61, focalLengthMm: 360, rear: "M48x0.75", backFocusMm: 55, tol: 0.5,
    imageCircleMm: 34, clear: 44, maxLoadG: 1500, weightG: 2100, price: 79900, description: "Quintuplet astrograph; male M48 rear, 55 mm back focus." }),
  astrograph({ maker: A, model: "Pennant 76", apertureMm: 76, focalLengthMm: 380, rear: "M48x0.75", backFocusMm: 55, tol: 0.5,
    imageCircleMm: 33, clear: 44, maxLoadG: 2500, weightG: 2900, price: 109900, description: "f/5 Petzval astrograph; male M48 rear." }),
  astrograph({ maker: A, model: "Pennant 108", apertureMm: 108, focalLengthMm: 540, rear: "M68x1", backFocusMm: 55, tol: 0.5,
    imageCircleMm: 50, clear: 62, maxLoadG: 4000, weightG: 5400, price: 199900, description: "Full-frame Petzval; male M68×1 rear." }),
  astrograph({ maker: A, model: "Pennant 140", apertureMm: 140, focalLengthMm: 700, rear: "M82x1", backFocusMm: 65, tol: 0.5,
    imageCircleMm: 60, clear: 76, maxLoadG: 6000, weightG: 9800, price: 389900, description: "Medium-format Petzval; male M82×1 rear, 65 mm back focus." }),
  astrograph({ maker: A, model: "Keel 200 f/3.8 Imaging Newtonian", apertureMm: 200, focalLengthMm: 760, rear: "M54x0.75",
    backFocusMm: 55, tol: 0.3, imageCircleMm: 35, clear: 50, maxLoadG: 3000, weightG: 8200, price: 119900,
    description: "Newtonian with an integral coma corrector; fast, so ±0.3 mm." }),
  astrograph({ maker: A, model: "Keel 250 f/4 Imaging Newtonian", apertureMm: 250, focalLengthMm: 1000, rear: "M68x1",
    backFocusMm: 75, tol: 0.3, imageCircleMm: 43, clear: 62, maxLoadG: 4500, weightG: 12500, price: 179900,
    description: "Integral corrector with a 75 mm back focus from the male M68×1 rear." }),
];

export const optics: PartInput[] = [...telescopes, ...correctors, ...astrographs];
