// The public JSON shape of a catalog part, from its table row: queries return rows, the
// route handlers and pages shape them here.
import type { Gender } from "@/lib/solver/types";
import { sensorDiagonalMm } from "@/lib/validation/parts";
import type { PartRowLike } from "./rows";

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

/** A page of parts as GET /api/v1/parts answers it; a search's rows carry their match score. */
export function partsPageJson(page: { items: { row: PartRowLike; matchScore: number | null }[]; nextCursor: string | null }) {
  return {
    items: page.items.map(({ row, matchScore }) => matchScore === null ? rowToApiPart(row) : { ...rowToApiPart(row), matchScore: Math.round(matchScore * 1000) / 1000 }),
    nextCursor: page.nextCursor,
  };
}
