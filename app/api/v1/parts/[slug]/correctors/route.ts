// GET /api/v1/parts/:slug/correctors — for a telescope: which catalog correctors join it
// (directly or through catalog adapters), and with how many adapters.
import { withSession } from "@/lib/auth/session";
import { correctorJoins } from "@/lib/planner/corrector-joins";

export const dynamic = "force-dynamic";

export const GET = withSession<{ slug: string }>(async (_request, { params }) => {
  return Response.json(await correctorJoins({ telescope: params.slug }));
}, { anonymous: true });
