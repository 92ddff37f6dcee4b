// POST /api/v1/builds/:slug/threads { url } — attach a forum thread where the build was linked (moderators); DELETE { url } — detach it
import { addBuildThread, getBuildOrThrow, listBuildThreads, removeBuildThread } from "@/db/queries/builds";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { toBuildViewer } from "@/lib/builds/access";
import { threadUrlSchema } from "@/lib/validation/builds";

export const dynamic = "force-dynamic";
type Params = { slug: string };

export const POST = withSession<Params>(async (request, { user, params }) => {
  const { build } = await getBuildOrThrow({ slug: params.slug, viewer: toBuildViewer(user) });
  const { url } = await parseJsonBody(request, threadUrlSchema, 10_000);
  await addBuildThread({ buildId: build.id, actorId: user.id, url });
  return Response.json({ slug: build.slug, threads: await listBuildThreads({ buildId: build.id }) }, { status: 201 });
}, { permission: { build: "moderate" } });

export const DELETE = withSession<Params>(async (request, { user, params }) => {
  const { build } = await getBuildOrThrow({ slug: params.slug, viewer: toBuildViewer(user) });
  const { url } = await parseJsonBody(request, threadUrlSchema, 10_000);
  await removeBuildThread({ buildId: build.id, actorId: user.id, url });
  return Response.json({ slug: build.slug, threads: await listBuildThreads({ buildId: build.id }) });
}, { permission: { build: "moderate" } });
