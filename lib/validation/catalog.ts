import { z } from "zod";
import { packCursor, unpackCursor } from "./cursor";
import { isKnownInterface } from "@/lib/interfaces";
import { noNul } from "./nul";
import { PART_KINDS } from "./parts";

/** Query of GET /api/v1/parts. Everything arrives as strings; bad values are a 400. */
export const listPartsQuerySchema = z.object({
  q: noNul(z.string().trim().max(100, "At most 100 characters")).optional(),
  kind: z.enum(PART_KINDS, { message: `One of: ${PART_KINDS.join(", ")}` }).optional(),
  interface: z.string().refine(isKnownInterface, "Unknown interface code").optional(),
  limit: z.coerce.number({ message: "A whole number from 1 to 200" }).int("A whole number from 1 to 200")
    .min(1, "A whole number from 1 to 200").max(200, "A whole number from 1 to 200").default(50),
  cursor: z.string().max(300).regex(/^[A-Za-z0-9_-]*$/, "Not a cursor from this API")
    .refine((c) => c === "" || decodeCursor(c) !== null, "Not a cursor from this API").optional(),
});
export type ListPartsQuery = z.infer<typeof listPartsQuerySchema>;

export const encodeCursor = (slug: string): string => packCursor(slug);
/**
 * What a cursor names — a slug (keyset paging) or `#<offset>` (paging ranked search results) —
 * or null when it names neither (slugs are lowercase letters, digits and dashes).
 */
export function decodeCursor(cursor: string): string | null {
  const [slug, extra] = unpackCursor(cursor);
  return extra === undefined && /^(#\d{1,6}|[a-z0-9][a-z0-9-]{0,199})$/.test(slug) ? slug : null;
}
