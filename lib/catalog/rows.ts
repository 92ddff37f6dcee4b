// Mapping between the catalog's validated shape and its table row, and to the solver's Part.
import type { PartParsed, PartSpecs } from "@/lib/validation/parts";
import { sensorDiagonalMm } from "@/lib/validation/parts";
import type { Gender } from "@/lib/solver/types";

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

export type PortOut = { interface: string; gender: Gender } | null;

function port(i: string | null, g: string | null): PortOut {
  return i && (g === "male" || g === "female") ? { interface: i, gender: g } : null;
}

/** The public JSON shape of a part: kind-specific numbers at top level. */
export function rowToApiPart(r: PartRowLike) {
  const specs = r.specs ?? {};
  const focalRatio = specs.focalLengthMm && specs.apertureMm ? specs.focalLengthMm / specs.apertureMm : undefined;
  return {
    id: r.id, slug: r.slug, kind: r.kind, name: `${r.maker} ${r.model}`, maker: r.maker, model: r.model,
    description: r.description, front: port(r.frontInterface, r.frontGender), rear: port(r.rearInterface, r.rearGender),
    lengthMm: r.lengthMm, adjustMm: r.adjustMm, reversible: r.reversible, clearApertureMm: r.clearApertureMm,
    weightG: r.weightG, listPriceCents: r.listPriceCents, status: r.status,
    ...specs,
    ...(focalRatio ? { focalRatio: Math.round(focalRatio * 100) / 100 } : {}),
    ...(sensorDiagonalMm(specs) !== undefined ? { sensorDiagonalMm: Math.round(sensorDiagonalMm(specs)! * 100) / 100 } : {}),
  };
}
export type ApiPart = ReturnType<typeof rowToApiPart>;
