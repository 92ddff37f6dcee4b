// Mapping between the catalog's validated shape and its table row (the API's JSON: part-json.ts).
import type { PartParsed, PartSpecs } from "@/lib/validation/parts";

export type PartRowLike = {
  id: string; slug: string; kind: string; maker: string; model: string; description: string | null;
  frontInterface: string | null; frontGender: string | null; rearInterface: string | null; rearGender: string | null;
  lengthMm: number; adjustMm: number | null; reversible: boolean; clearApertureMm: number | null; weightG: number | null;
  listPriceCents: number | null; specs: PartSpecs; status: string;
};

export function partToRow(p: PartParsed) {
  return {
    kind: p.kind, maker: p.maker, model: p.model, description: p.description ?? null,
    frontInterface: p.front?.interface ?? null, frontGender: p.front?.gender ?? null,
    rearInterface: p.rear?.interface ?? null, rearGender: p.rear?.gender ?? null,
    lengthMm: p.lengthMm, adjustMm: p.adjustMm ?? null, reversible: p.reversible,
    clearApertureMm: p.clearApertureMm ?? null, weightG: p.weightG ?? null,
    listPriceCents: p.listPriceCents ?? null, specs: p.specs,
  };
}
