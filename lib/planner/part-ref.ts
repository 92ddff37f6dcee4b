// A part named by its catalog id or slug (`{ partId }`) instead of carried inline.
export type PartRef = { partId: string };

export const isPartRef = (v: unknown): v is PartRef => typeof v === "object" && v !== null && "partId" in v;
