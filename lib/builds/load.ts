import "server-only";
import { cache } from "react";
import { getBuildOrThrow, listBuildAudit, listBuildThreads } from "@/db/queries/builds";
import { getSessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { isModeratorRole, toBuildViewer } from "./access";

/** A build as the current visitor may see it, or null (→ 404). Cached per request for metadata + page. */
export const loadBuildForPage = cache(async (slug: string) => {
  const user = await getSessionUser().catch(() => null);
  const viewer = toBuildViewer(user);
  try {
    const found = await getBuildOrThrow({ slug, viewer });
    const moderator = isModeratorRole(viewer);
    const [threads, audit] = await Promise.all([
      listBuildThreads({ buildId: found.build.id }),
      moderator ? listBuildAudit({ buildId: found.build.id }) : Promise.resolve([]),
    ]);
    return { ...found, threads, audit, user, viewer, moderator, owner: !!user && user.id === found.build.ownerId };
  } catch (err) {
    if (err instanceof AppError && err.status === 404) return null;
    throw err;
  }
});
export type LoadedBuild = NonNullable<Awaited<ReturnType<typeof loadBuildForPage>>>;
