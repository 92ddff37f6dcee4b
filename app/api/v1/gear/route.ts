// GET /api/v1/gear — the parts the signed-in user owns
// PUT /api/v1/gear — set how many of a part they own (0 removes it)
import { listOwnedParts, setOwnedQuantity } from "@/db/queries/gear";
import { getPartOrThrow } from "@/db/queries/parts";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { setGearSchema } from "@/lib/validation/gear";
import { rowToApiPart } from "@/lib/catalog/part-json";

export const dynamic = "force-dynamic";

export const GET = withSession(async (_request, { user }) => {
  const rows = await listOwnedParts({ userId: user.id });
  return Response.json({ items: rows.map((r) => ({ part: rowToApiPart(r.part), quantity: r.quantity })) });
});

export const PUT = withSession(async (request, { user }) => {
  const { partId, quantity } = await parseJsonBody(request, setGearSchema);
  const part = await getPartOrThrow({ ref: partId, viewer: null });
  await setOwnedQuantity({ userId: user.id, partId: part.id, quantity });
  return Response.json({ part: rowToApiPart(part), quantity });
});
