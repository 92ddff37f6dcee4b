// POST /api/v1/shops/where-to-buy — which shops can supply these parts: totals per shop and what each lacks
import { getApprovedPartsByRefs } from "@/db/queries/parts";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { whereToBuyForParts } from "@/lib/shops/where-to-buy-query";
import { whereToBuySchema } from "@/lib/validation/shops";

export const dynamic = "force-dynamic";

export const POST = withSession(async (request) => {
  const input = await parseJsonBody(request, whereToBuySchema, 20_000);
  const rows = await getApprovedPartsByRefs({ refs: input.parts.map((p) => p.slug) });
  const names = new Map(rows.map((r) => [r.slug, `${r.maker} ${r.model}`]));
  return Response.json({ offers: await whereToBuyForParts({ input, names }) });
}, { anonymous: true });
