// Filter wheels (about 18–25 mm) and filter drawers (about 15–22 mm). Both kinds of faces are
// sold: female on both sides (joined to the next female face by a male–male coupler) and
// female front / male rear (screws straight into a camera). Common practice.
import type { PartInput } from "@/lib/validation/parts";
import { F, M, part, type Code, type DemoMakerName } from "./makers";

type FilterSize = "1.25in" | "31mm" | "36mm" | "2in" | "50mm-sq";

/** Clear aperture left by each filter size (invented, typical). */
const FILTER_CLEAR: Record<FilterSize, number> = { "1.25in": 27, "31mm": 29, "36mm": 34, "2in": 46, "50mm-sq": 48 };

type Holder = {
  maker: DemoMakerName; model: string; thread: Code; rearMale: boolean; lengthMm: number; size: FilterSize;
  slots: number; filterMm: number; weightG: number; price: number; description?: string;
};

function holder(kind: "filter-wheel" | "filter-drawer", h: Holder): PartInput {
  const faces = h.rearMale ? "female front, male rear" : "female on both faces";
  return part(h.maker, {
    kind, model: h.model,
    description: h.description ?? `${h.slots > 1 ? `${h.slots}-position wheel` : "Drawer"} for ${h.size} filters; ${faces}.`,
    front: F(h.thread), rear: h.rearMale ? M(h.thread) : F(h.thread), lengthMm: h.lengthMm,
    clearApertureMm: FILTER_CLEAR[h.size], weightG: h.weightG, listPriceCents: h.price,
    specs: { filterSize: h.size, slots: h.slots, filterThicknessMm: h.filterMm },
  });
}

const NB = "Nettlebeck Instruments" as const;
const MR = "Marrick Astro Gear" as const;

export const filterWheels: PartInput[] = [
  holder("filter-wheel", { maker: NB, model: "Carousel 8 × 1.25in", thread: "M42x0.75", rearMale: false, lengthMm: 20,
    size: "1.25in", slots: 8, filterMm: 2, weightG: 420, price: 32900 }),
  holder("filter-wheel", { maker: NB, model: "Carousel 5 × 1.25in", thread: "M42x0.75", rearMale: true, lengthMm: 18,
    size: "1.25in", slots: 5, filterMm: 2, weightG: 330, price: 24900 }),
  holder("filter-wheel", { maker: NB, model: "Carousel 7 × 36mm", thread: "M42x0.75", rearMale: false, lengthMm: 20,
    size: "36mm", slots: 7, filterMm: 2, weightG: 480, price: 38900 }),
  holder("filter-wheel", { maker: NB, model: "Carousel 7 × 2in", thread: "M48x0.75", rearMale: true, lengthMm: 20,
    size: "2in", slots: 7, filterMm: 2, weightG: 610, price: 44900,
    description: "7-position wheel for 2-inch mounted filters; female M48 front, male M48 rear, 20 mm." }),
  holder("filter-wheel", { maker: NB, model: "Carousel 5 × 2in Wide", thread: "M54x0.75", rearMale: false, lengthMm: 25,
    size: "2in", slots: 5, filterMm: 2, weightG: 650, price: 47900 }),
  holder("filter-wheel", { maker: MR, model: "Orbit 9 × 31mm", thread: "M42x0.75", rearMale: true, lengthMm: 19,
    size: "31mm", slots: 9, filterMm: 2, weightG: 450, price: 35900 }),
  holder("filter-wheel", { maker: MR, model: "Orbit 7 × 36mm", thread: "M48x0.75", rearMale: false, lengthMm: 21,
    size: "36mm", slots: 7, filterMm: 2, weightG: 520, price: 41900 }),
  holder("filter-wheel", { maker: MR, model: "Orbit 7 × 2in", thread: "M48x0.75", rearMale: false, lengthMm: 25,
    size: "2in", slots: 7, filterMm: 2, weightG: 720, price: 49900,
    description: "7-position wheel for 2-inch filters; female M48 on both faces, 25 mm." }),
  holder("filter-wheel", { maker: MR, model: "Orbit 5 × 50mm Square", thread: "M54x0.75", rearMale: false, lengthMm: 24,
    size: "50mm-sq", slots: 5, filterMm: 3, weightG: 780, price: 59900 }),
];

export const filterDrawers: PartInput[] = [
  holder("filter-drawer", { maker: NB, model: "Slide 1.25in Drawer", thread: "M42x0.75", rearMale: true, lengthMm: 17,
    size: "1.25in", slots: 1, filterMm: 2, weightG: 140, price: 12900 }),
  holder("filter-drawer", { maker: NB, model: "Slide 2in Drawer", thread: "M48x0.75", rearMale: true, lengthMm: 21,
    size: "2in", slots: 1, filterMm: 2, weightG: 190, price: 15900 }),
  holder("filter-drawer", { maker: NB, model: "Slide 50mm Square Drawer", thread: "M68x1", rearMale: true, lengthMm: 22,
    size: "50mm-sq", slots: 1, filterMm: 3, weightG: 310, price: 22900 }),
  holder("filter-drawer", { maker: MR, model: "Pocket 36mm Drawer", thread: "M48x0.75", rearMale: false, lengthMm: 18,
    size: "36mm", slots: 1, filterMm: 2, weightG: 160, price: 13900 }),
  holder("filter-drawer", { maker: MR, model: "Pocket 2in Drawer M54", thread: "M54x0.75", rearMale: true, lengthMm: 22,
    size: "2in", slots: 1, filterMm: 2, weightG: 230, price: 17900 }),
  holder("filter-drawer", { maker: MR, model: "Pocket 1.25in Slim Drawer", thread: "M42x0.75", rearMale: false, lengthMm: 15,
    size: "1.25in", slots: 1, filterMm: 1, weightG: 110, price: 10900 }),
];
