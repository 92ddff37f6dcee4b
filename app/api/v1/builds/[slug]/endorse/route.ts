// POST /api/v1/builds/:slug/endorse — mark as a reference build (moderators); DELETE — withdraw the endorsement
import { getBuildOrThrow, setBuildEndorsed } from "@/db/queries/builds";
import { withSession } from "@/lib/auth/session";
import { toBuildViewer } from "@/lib/builds/access";

export const dynamic = "force-dynamic";

function endorse(endorsed: boolean) {
  return withSession<{ slug: string }>(async (_request, { user, params }) => {
    const { build } = await getBuildOrThrow({ slug: params.slug, viewer: toBuildViewer(user) });
    const endorsedAt = await setBuildEndorsed({ buildId: build.id, actorId: user.id, endorsed });
    return Response.json({ slug: build.slug, endorsed: !!endorsedAt, endorsedAt });
  }, { permission: { build: "moderate" } });
}

export const POST = endorse(true);
export const DELETE = endorse(false);
