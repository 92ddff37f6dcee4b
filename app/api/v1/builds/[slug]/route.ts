// GET /api/v1/builds/:slug — one build as its viewer may see it; PATCH (owner) — title, notes, visibility; DELETE (owner or admin)
import { ANY_OWNER, deleteBuild, getBuildOrThrow, listBuildAudit, listBuildThreads, recordOwnerEdit, updateOwnBuild } from "@/db/queries/builds";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { canDeleteBuild, isModeratorRole, isOwner, toBuildViewer } from "@/lib/builds/access";
import { siteOrigin } from "@/lib/builds/site-url";
import { buildToJson } from "@/lib/builds/to-json";
import { AppError } from "@/lib/errors";
import { updateBuildSchema } from "@/lib/validation/builds";

export const dynamic = "force-dynamic";
type Params = { slug: string };

export const GET = withSession<Params>(async (request, { user, params }) => {
  const viewer = toBuildViewer(user);
  const { build, ownerName, endorserName } = await getBuildOrThrow({ slug: params.slug, viewer });
  const [threads, audit] = await Promise.all([
    listBuildThreads({ buildId: build.id }),
    isModeratorRole(viewer) ? listBuildAudit({ buildId: build.id }) : Promise.resolve(undefined),
  ]);
  return Response.json(buildToJson({ build, ownerName, endorserName, threads, audit, origin: siteOrigin(request.headers) }));
}, { anonymous: true });

export const PATCH = withSession<Params>(async (request, { user, params }) => {
  const viewer = toBuildViewer(user);
  const { build } = await getBuildOrThrow({ slug: params.slug, viewer });
  if (!isOwner(build, viewer)) throw new AppError("forbidden:build", "Only the owner can edit this build.");
  const patch = await parseJsonBody(request, updateBuildSchema, 20_000);
  const row = await updateOwnBuild({ buildId: build.id, ownerId: user.id, patch });
  if (build.endorsedAt) await recordOwnerEdit({ buildId: build.id, actorId: user.id, fields: Object.keys(patch) });
  return Response.json({ slug: row.slug, title: row.title, notes: row.notes, visibility: row.visibility, updatedAt: row.updatedAt });
});

export const DELETE = withSession<Params>(async (_request, { user, params }) => {
  const viewer = toBuildViewer(user);
  const { build } = await getBuildOrThrow({ slug: params.slug, viewer });
  if (!canDeleteBuild(build, viewer)) throw new AppError("forbidden:build", "Only the owner (or an admin) can delete this build.");
  await deleteBuild({ buildId: build.id, ownerId: isOwner(build, viewer) ? user.id : ANY_OWNER });
  return new Response(null, { status: 204 });
});
