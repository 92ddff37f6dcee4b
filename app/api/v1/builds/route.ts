// POST /api/v1/builds — save a solved plan as a build; GET — list public builds (or your own with mine=1)
import { listBuilds } from "@/db/queries/builds";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody, parseWith } from "@/lib/http/body";
import { saveBuild } from "@/lib/builds/save";
import { buildUrl, siteOrigin } from "@/lib/builds/site-url";
import { buildSummary } from "@/lib/builds/to-json";
import { AppError } from "@/lib/errors";
import { createBuildSchema, listBuildsQuerySchema } from "@/lib/validation/builds";

export const dynamic = "force-dynamic";

export const POST = withSession(async (request, { user }) => {
  const input = await parseJsonBody(request, createBuildSchema, 2_000_000);
  const slug = await saveBuild({ input, user });
  return Response.json({ slug, url: buildUrl(siteOrigin(request.headers), slug) }, { status: 201 });
}, { permission: { build: "save" } });

export const GET = withSession(async (request, { user }) => {
  const query = parseWith(listBuildsQuerySchema, Object.fromEntries(new URL(request.url).searchParams));
  if (query.mine && !user) throw new AppError("unauthorized", "Sign in to list your own builds.");
  const { items, nextCursor } = await listBuilds({ query, ownerId: user?.id ?? null });
  const origin = siteOrigin(request.headers);
  return Response.json({ items: items.map((row) => buildSummary(row, origin)), nextCursor });
}, { anonymous: true });
