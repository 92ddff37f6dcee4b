// GET/POST /api/v1/shops/[slug]/api-keys — the owner's keys for the shop's own stock system (secret shown once)
import { insertApiKey, listApiKeys } from "@/db/queries/shops-keys";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { requireShopMember } from "@/lib/shops/access";
import { newApiKey } from "@/lib/shops/api-key";
import { createApiKeySchema } from "@/lib/validation/shops";

export const dynamic = "force-dynamic";
type P = { slug: string };

export const GET = withSession<P>(async (_request, { user, params }) => {
  const { shop } = await requireShopMember({ slug: params.slug, user, permission: { apiKey: "manage" } });
  return Response.json({ keys: await listApiKeys({ organizationId: shop.id }) });
});

export const POST = withSession<P>(async (request, { user, params }) => {
  const { shop } = await requireShopMember({ slug: params.slug, user, permission: { apiKey: "manage" } });
  const { name } = await parseJsonBody(request, createApiKeySchema, 10_000);
  const { key, start, hash } = newApiKey();
  const row = await insertApiKey({ organizationId: shop.id, name, start, keyHash: hash, createdBy: user.id });
  return Response.json({ key: { ...row, secret: key } }, { status: 201, headers: { "cache-control": "no-store" } });
});
