// POST /api/v1/builds/:slug/hide { reason } — hide a build from everyone but its owner and moderators; DELETE — show it again
import { getBuildOrThrow, setBuildHidden } from "@/db/queries/builds";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { toBuildViewer } from "@/lib/builds/access";
import { notifyBuildOwner } from "@/lib/builds/moderation-mail";
import { hideBuildSchema } from "@/lib/validation/builds";

export const dynamic = "force-dynamic";
type Params = { slug: string };

export const POST = withSession<Params>(async (request, { user, params }) => {
  const { build } = await getBuildOrThrow({ slug: params.slug, viewer: toBuildViewer(user) });
  const { reason } = await parseJsonBody(request, hideBuildSchema, 10_000);
  await setBuildHidden({ buildId: build.id, actorId: user.id, reason });
  if (!build.hiddenAt) await notifyBuildOwner({ build, actorId: user.id, event: { kind: "hidden", reason } });
  return Response.json({ slug: build.slug, hidden: true, hiddenReason: reason });
}, { permission: { build: "moderate" } });

export const DELETE = withSession<Params>(async (_request, { user, params }) => {
  const { build } = await getBuildOrThrow({ slug: params.slug, viewer: toBuildViewer(user) });
  await setBuildHidden({ buildId: build.id, actorId: user.id, reason: null });
  return Response.json({ slug: build.slug, hidden: false, hiddenReason: null });
}, { permission: { build: "moderate" } });
