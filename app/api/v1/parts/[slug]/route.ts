// GET   /api/v1/parts/:slug — one part by slug or id
// PATCH /api/v1/parts/:slug — a moderator corrects a part; builds that use it re-check themselves
import { getPartOrThrow, updatePart } from "@/db/queries/parts";
import { allowed, withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { recheckBuildsForParts } from "@/lib/builds/recheck";
import { rowToApiPart } from "@/lib/catalog/part-json";
import { partPatchSchema } from "@/lib/validation/submissions";

export const dynamic = "force-dynamic";

export const GET = withSession<{ slug: string }>(async (_request, { user, params }) => {
  const row = await getPartOrThrow({ ref: params.slug, viewer: user ? { id: user.id, moderator: allowed(user, { part: "review" }) } : null });
  return Response.json(rowToApiPart(row));
}, { anonymous: true });

export const PATCH = withSession<{ slug: string }>(async (request, { params }) => {
  const patch = await parseJsonBody(request, partPatchSchema);
  let recheck = { queued: 0 };
  const updated = await updatePart({
    slug: params.slug, patch,
    inSameTransaction: async (tx, part) => { recheck = await recheckBuildsForParts({ slugs: [part.slug], tx }); },
  });
  return Response.json({ ...rowToApiPart(updated), recheck });
}, { permission: { part: "review" } });
