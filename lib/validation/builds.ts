import { z } from "zod";
import { unpackCursor } from "./cursor";
import { UUID } from "./ids";
import { noNul } from "./nul";

export const BUILD_VISIBILITIES = ["private", "unlisted", "public"] as const;
export type BuildVisibility = (typeof BUILD_VISIBILITIES)[number];

/** Most forum threads attached to one build. */
export const MAX_THREADS_PER_BUILD = 20;

const title = z.string().trim().min(1, "Give the build a title").max(120, "At most 120 characters");
const notes = z.string().trim().max(4000, "At most 4,000 characters");
const visibility = z.enum(BUILD_VISIBILITIES, { message: "One of: private, unlisted, public" });

/**
 * POST /api/v1/builds. `request` is the body of POST /api/v1/solve; it is validated by
 * `parseBuildPlanRequest` (lib/builds/parse-request.ts) with the solve route's own schemas.
 */
export const createBuildSchema = z.object({
  title,
  notes: notes.optional(),
  visibility: visibility.default("unlisted"),
  request: z.unknown().refine((v) => typeof v === "object" && v !== null && !Array.isArray(v), "The plan to save (the solve request)"),
  solutionIndex: z.number({ message: "Which solution to save: 0 is the best" }).int("A whole number").min(0, "0 or more").max(100, "At most 100").default(0),
}).strict();
export type CreateBuildInput = z.infer<typeof createBuildSchema>;

/** PATCH /api/v1/builds/[slug] — the owner may change only these. */
export const updateBuildSchema = z.object({
  title: title.optional(),
  notes: notes.nullable().optional(),
  visibility: visibility.optional(),
}).strict().refine((v) => Object.keys(v).length > 0, "Send at least one of title, notes, visibility");
export type UpdateBuildInput = z.infer<typeof updateBuildSchema>;

export const hideBuildSchema = z.object({
  reason: z.string().trim().min(3, "Say why, in a few words").max(500, "At most 500 characters"),
}).strict();
export type HideBuildInput = z.infer<typeof hideBuildSchema>;

export const threadUrlSchema = z.object({
  url: z.string().trim().max(2000, "At most 2,000 characters").refine((s) => {
    try {
      const u = new URL(s);
      return (u.protocol === "http:" || u.protocol === "https:") && !!u.hostname;
    } catch {
      return false;
    }
  }, "A full http:// or https:// address"),
}).strict();
export type ThreadUrlInput = z.infer<typeof threadUrlSchema>;

const flag = z.enum(["1", "true", "0", "false", ""]).optional().transform((v) => v === "1" || v === "true");

/** GET /api/v1/builds and the /builds page. */
export const listBuildsQuerySchema = z.object({
  q: noNul(z.string().trim().max(100, "At most 100 characters")).optional(),
  reference: flag,
  mine: flag,
  limit: z.coerce.number({ message: "A whole number from 1 to 100" }).int("A whole number from 1 to 100")
    .min(1, "A whole number from 1 to 100").max(100, "A whole number from 1 to 100").default(24),
  cursor: z.string().max(300).regex(/^[A-Za-z0-9_-]*$/, "Not a cursor from this API")
    .refine((c) => c === "" || decodeBuildCursor(c) !== null, "Not a cursor from this API").optional(),
});

/** A builds-list cursor is "endorsed,createdAt,id" in base64url; null when it is not one of ours. */
export function decodeBuildCursor(cursor: string): { endorsed: 0 | 1; at: string; id: string } | null {
  const [e, at, id, extra] = unpackCursor(cursor);
  if (extra !== undefined || !/^[01]$/.test(e ?? "") || !UUID.test(id ?? "") || !/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d(\.\d{1,6})?Z$/.test(at ?? "") || Number.isNaN(Date.parse(at))) return null;
  return { endorsed: Number(e) as 0 | 1, at, id };
}
export type ListBuildsQuery = z.infer<typeof listBuildsQuerySchema>;

/** Build slugs: base-58 style, no look-alike characters. */
export const buildSlugSchema = z.string().regex(/^[1-9A-HJ-NP-Za-km-z]{6,16}$/, "Not a build link");
