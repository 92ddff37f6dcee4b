// Cameras. lengthMm is the optical distance from the front joint plane to the sensor:
// astronomy cameras are built to 6.5, 12.5 or 17.5 mm (common practice); a body on a bayonet
// sits at that bayonet's published flange focal distance, taken from lib/interfaces.ts.
import type { PartInput } from "@/lib/validation/parts";
import { F, flangeFocalMm, part, type Code, type DemoMakerName } from "./makers";

type Cam = {
  maker: DemoMakerName; model: string; front: Code; depthMm: number; w: number; h: number; pixelUm: number;
  windowMm?: number; weightG: number; price: number; description: string;
};

function camera(c: Cam): PartInput {
  return part(c.maker, {
    kind: "camera", model: c.model, description: c.description,
    front: F(c.front), rear: null, lengthMm: c.depthMm, weightG: c.weightG, listPriceCents: c.price,
    specs: { sensorWidthMm: c.w, sensorHeightMm: c.h, pixelSizeUm: c.pixelUm, flangeDepthMm: c.depthMm,
      ...(c.windowMm === undefined ? {} : { windowThicknessMm: c.windowMm }) },
  });
}

const Q = "Quillfield Imaging" as const;
const N = "Fennick Sensors" as const;
const S = "Sorrel Camera Co." as const;

/** Cooled cameras, 17.5 mm deep. */
const cooled: PartInput[] = [
  camera({ maker: Q, model: "Cinder 26M Cooled", front: "M48x0.75", depthMm: 17.5, w: 23.5, h: 15.7, pixelUm: 3.76, windowMm: 2,
    weightG: 700, price: 219900, description: "APS-C mono, female M48 front, 17.5 mm flange-to-sensor." }),
  camera({ maker: Q, model: "Cinder 26C Cooled", front: "M48x0.75", depthMm: 17.5, w: 23.5, h: 15.7, pixelUm: 3.76, windowMm: 2,
    weightG: 700, price: 169900, description: "APS-C colour, female M48 front, 17.5 mm deep." }),
  camera({ maker: Q, model: "Cinder 60M Cooled", front: "M54x0.75", depthMm: 17.5, w: 36, h: 24, pixelUm: 3.76, windowMm: 2,
    weightG: 870, price: 399900, description: "Full-frame mono with a female M54 front." }),
  camera({ maker: Q, model: "Cinder 60C Cooled", front: "M54x0.75", depthMm: 17.5, w: 36, h: 24, pixelUm: 3.76, windowMm: 2,
    weightG: 870, price: 329900, description: "Full-frame colour with a female M54 front." }),
  camera({ maker: Q, model: "Cinder 33M Pro", front: "M68x1", depthMm: 17.5, w: 44, h: 33, pixelUm: 3.76, windowMm: 3,
    weightG: 1350, price: 699900, description: "Medium-format mono with a female M68×1 front." }),
  camera({ maker: Q, model: "Cinder 19M Cooled", front: "M42x0.75", depthMm: 17.5, w: 19.1, h: 13, pixelUm: 4.63, windowMm: 2,
    weightG: 560, price: 119900, description: "Four-Thirds-class mono with a female T-thread front." }),
  camera({ maker: Q, model: "Cinder 11C Cooled", front: "M42x0.75", depthMm: 17.5, w: 11.3, h: 11.3, pixelUm: 3.76, windowMm: 2,
    weightG: 470, price: 79900, description: "Square-sensor colour camera, female T-thread front." }),
];

/** Uncooled, guiding and planetary cameras, 6.5 or 12.5 mm deep. */
const compact: PartInput[] = [
  camera({ maker: N, model: "Glint G2 Guide Camera", front: "M42x0.75", depthMm: 12.5, w: 5.6, h: 3.2, pixelUm: 2.9, windowMm: 1,
    weightG: 120, price: 24900, description: "Guide camera; female T-thread front, 12.5 mm deep." }),
  camera({ maker: N, model: "Glint G4 Guide Camera", front: "M42x0.75", depthMm: 12.5, w: 5.6, h: 3.2, pixelUm: 4.4, windowMm: 1,
    weightG: 110, price: 19900, description: "Large-pixel guide camera, 12.5 mm deep." }),
  camera({ maker: N, model: "Spark P7 Planetary", front: "M42x0.75", depthMm: 12.5, w: 7.7, h: 4.3, pixelUm: 2, windowMm: 1,
    weightG: 130, price: 29900, description: "High-frame-rate planetary camera, 12.5 mm deep." }),
  camera({ maker: N, model: "Spark P11 Planetary", front: "M42x0.75", depthMm: 12.5, w: 11.2, h: 6.3, pixelUm: 2.9, windowMm: 1,
    weightG: 140, price: 39900, description: "Planetary and small-nebula camera, 12.5 mm deep." }),
  camera({ maker: N, model: "Ember U19 Uncooled", front: "M42x0.75", depthMm: 6.5, w: 19.1, h: 13, pixelUm: 4.63, windowMm: 1,
    weightG: 300, price: 59900, description: "Uncooled Four-Thirds-class camera; only 6.5 mm deep." }),
  camera({ maker: N, model: "Ember U13 Uncooled", front: "M42x0.75", depthMm: 6.5, w: 13.2, h: 8.8, pixelUm: 2.4, windowMm: 1,
    weightG: 280, price: 44900, description: "Uncooled one-inch-class camera, 6.5 mm deep." }),
  camera({ maker: N, model: "Ember U11 Uncooled", front: "M42x0.75", depthMm: 6.5, w: 11.3, h: 11.3, pixelUm: 3.76, windowMm: 1,
    weightG: 260, price: 39900, description: "Uncooled square-sensor camera, 6.5 mm deep." }),
  camera({ maker: N, model: "Ember U26 Uncooled", front: "M48x0.75", depthMm: 12.5, w: 23.5, h: 15.7, pixelUm: 3.76, windowMm: 1,
    weightG: 420, price: 99900, description: "Uncooled APS-C camera; female M48 front, 12.5 mm deep." }),
];

type Body = { model: string; mount: Code; w: number; h: number; pixelUm: number; weightG: number; price: number };

function body(b: Body): PartInput {
  const ffd = flangeFocalMm(b.mount);
  return camera({ maker: S, model: b.model, front: b.mount, depthMm: ffd, w: b.w, h: b.h, pixelUm: b.pixelUm,
    weightG: b.weightG, price: b.price,
    description: `Camera body; sensor ${ffd} mm behind the flange (the mount's published flange focal distance).` });
}

/** Bodies on bayonets, plus one on the older M42×1 screw mount that does not take T-thread. */
const bodies: PartInput[] = [
  body({ model: "Larch 22 (EF bayonet)", mount: "bayonet-ef", w: 22.3, h: 14.9, pixelUm: 4.3, weightG: 540, price: 89900 }),
  body({ model: "Larch 24 (F bayonet)", mount: "bayonet-f", w: 23.5, h: 15.6, pixelUm: 3.9, weightG: 580, price: 84900 }),
  body({ model: "Alder 36 (E bayonet)", mount: "bayonet-e", w: 35.9, h: 24, pixelUm: 5.9, weightG: 650, price: 179900 }),
  body({ model: "Alder 36R (RF bayonet)", mount: "bayonet-rf", w: 36, h: 24, pixelUm: 5.36, weightG: 690, price: 199900 }),
  body({ model: "Alder 36Z (Z bayonet)", mount: "bayonet-z", w: 35.9, h: 23.9, pixelUm: 5.95, weightG: 675, price: 189900 }),
  body({ model: "Hazel 23 (X bayonet)", mount: "bayonet-x", w: 23.5, h: 15.6, pixelUm: 3.76, weightG: 450, price: 119900 }),
  body({ model: "Hazel 17 (Micro Four Thirds)", mount: "bayonet-mft", w: 17.3, h: 13, pixelUm: 3.3, weightG: 410, price: 79900 }),
  body({ model: "Birch 42 (M42×1 screw mount)", mount: "M42x1", w: 36, h: 24, pixelUm: 6, weightG: 720, price: 99900 }),
];

export const cameras: PartInput[] = [...cooled, ...compact, ...bodies];
