// Spacer kits (female front, male rear of one thread, so they stack) and adjustable extensions.
// The thinnest spacers are shim rings that sit inside a joint; they are modelled like the
// others so the solver can stack them. Lengths are the trade's usual set; prices invented.
import type { PartInput } from "@/lib/validation/parts";
import { bore, F, M, LABEL, part, type Code, type Port, type DemoMakerName } from "./makers";

/** The trade's usual spacer lengths, mm (common practice). */
export const FULL_KIT_MM = [0.5, 1, 2, 3, 5, 7.5, 10, 15, 16.5, 20, 30, 40] as const;

function spacerKit(maker: DemoMakerName, thread: Code, lengths: readonly number[], basePrice: number): PartInput[] {
  const od = Number.parseFloat(thread.slice(1)); // M42x0.75 → 42
  return lengths.map((len) => part(maker, {
    kind: "spacer", model: `${LABEL[thread]} Spacer ${len} mm`,
    description: len < 2 ? `Shim ring, ${len} mm, for ${LABEL[thread]} joints.` : `Extension ring, ${len} mm; female front, male rear, and it screws in either way round.`,
    // A plain ring has no optical front or back: the trade mounts it either way (common practice).
    front: F(thread), rear: M(thread), lengthMm: len, reversible: true, clearApertureMm: bore(thread),
    weightG: Math.round(2 + len * od * 0.07), listPriceCents: basePrice + Math.round(len * 45) * 10,
  }));
}

export const spacers: PartInput[] = [
  ...spacerKit("Tarrant Machining", "M42x0.75", FULL_KIT_MM, 1200),
  ...spacerKit("Tarrant Machining", "M48x0.75", FULL_KIT_MM, 1500),
  ...spacerKit("Quillfield Imaging", "M42x0.75", [5, 10, 11, 16.5, 21], 1900),
  ...spacerKit("Quillfield Imaging", "M48x0.75", [1, 2, 5, 10, 16.5, 21], 2200),
  ...spacerKit("Nettlebeck Instruments", "M54x0.75", [2, 5, 10, 15, 20, 30], 2400),
  ...spacerKit("Ashdown Glassworks", "M68x1", [5, 10, 20, 40], 3900),
];

type Ext = {
  maker: DemoMakerName; model: string; front: Port; rear: Port; lengthMm: number;
  adjustMm: number; clear: number; weightG: number; price: number; description: string;
};

const ext = (e: Ext): PartInput => part(e.maker, {
  kind: "extension", model: e.model, description: e.description, front: e.front, rear: e.rear,
  lengthMm: e.lengthMm, adjustMm: e.adjustMm, clearApertureMm: e.clear, weightG: e.weightG, listPriceCents: e.price,
});

/** Adjustable extensions: real length anywhere in [lengthMm, lengthMm + adjustMm]. */
export const extensions: PartInput[] = [
  part("Tarrant Machining", { kind: "extension", model: "T Helical Extension 17–31 mm",
    description: "Helical focusing tube, 17 to 31 mm; female front, male rear.", front: F("M42x0.75"), rear: M("M42x0.75"),
    lengthMm: 17, adjustMm: 14, clearApertureMm: 36, weightG: 140, listPriceCents: 6900 }),
  part("Tarrant Machining", { kind: "extension", model: "M48 Helical Extension 20–35 mm",
    description: "Helical focusing tube, 20 to 35 mm; female front, male rear.", front: F("M48x0.75"), rear: M("M48x0.75"),
    lengthMm: 20, adjustMm: 15, clearApertureMm: 42, weightG: 190, listPriceCents: 8900 }),
  part("Wrenfold Adapters", { kind: "extension", model: "T Sliding Extension 25–45 mm",
    description: "Clamped sliding tube, 25 to 45 mm.", front: F("M42x0.75"), rear: M("M42x0.75"),
    lengthMm: 25, adjustMm: 20, clearApertureMm: 36, weightG: 160, listPriceCents: 5900 }),
  part("Wrenfold Adapters", { kind: "extension", model: "M54 Sliding Extension 30–45 mm",
    description: "Clamped sliding tube, 30 to 45 mm.", front: F("M54x0.75"), rear: M("M54x0.75"),
    lengthMm: 30, adjustMm: 15, clearApertureMm: 48, weightG: 230, listPriceCents: 7900 }),
  part("Ashdown Glassworks", { kind: "extension", model: "M68 Focusing Extension 40–60 mm",
    description: "Helical extension for the Pennant 140, 40 to 60 mm.", front: F("M68x1"), rear: M("M68x1"),
    lengthMm: 40, adjustMm: 20, clearApertureMm: 60, weightG: 420, listPriceCents: 19900 }),
  ext({ maker: "Wrenfold Adapters", model: "2in Sliding Extension 20–30 mm", front: M("barrel-2in"), rear: F("barrel-2in"),
    lengthMm: 20, adjustMm: 10, clear: 46, weightG: 180, price: 4900,
    description: "2-inch barrel in, 2-inch holder out; slides from 20 to 30 mm." }),
  ext({ maker: "Wrenfold Adapters", model: "2in Extension Tube 35 mm", front: M("barrel-2in"), rear: F("barrel-2in"),
    lengthMm: 35, adjustMm: 15, clear: 46, weightG: 210, price: 3900,
    description: "35 mm above the holder when fully inserted; the barrel may be drawn out 15 mm." }),
  ext({ maker: "Wrenfold Adapters", model: "1.25in Extension Tube 40 mm", front: M("barrel-1.25in"), rear: F("barrel-1.25in"),
    lengthMm: 40, adjustMm: 15, clear: 27, weightG: 90, price: 2900,
    description: "1.25-inch barrel in, 1.25-inch holder out." }),
];
