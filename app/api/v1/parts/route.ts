// GET /api/v1/parts — search the approved catalog (q, kind, interface, limit, cursor)
import { listApprovedParts } from "@/db/queries/parts";
import { partsPageJson } from "@/lib/catalog/part-json";
import { withSession } from "@/lib/auth/session";
import { parseWith } from "@/lib/http/body";
import { listPartsQuerySchema } from "@/lib/validation/catalog";

export const dynamic = "force-dynamic";

export const GET = withSession(async (request) => {
  const params = Object.fromEntries(new URL(request.url).searchParams);
  const query = parseWith(listPartsQuerySchema, params);
  return Response.json(partsPageJson(await listApprovedParts({ query })));
}, { anonymous: true });
