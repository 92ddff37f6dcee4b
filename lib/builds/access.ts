// Who may see and change a build. Pure rules; the queries apply the same ones in SQL.
import { can, roleOf, type SiteRole } from "@/lib/auth/roles";
import type { BuildVisibility } from "@/lib/validation/builds";

export type BuildViewer = { id: string; role: SiteRole } | null;
type BuildLike = { ownerId: string; visibility: string; hiddenAt: Date | null };

/** Moderators see every build, its audit log and its hidden state. */
export const isModeratorRole = (viewer: BuildViewer) => !!viewer && can(viewer.role, { build: "moderate" });
export const isOwner = (build: BuildLike, viewer: BuildViewer) => !!viewer && viewer.id === build.ownerId;

/** The owner edits and deletes; an admin may also delete. */
export function canDeleteBuild(build: BuildLike, viewer: BuildViewer): boolean {
  return isOwner(build, viewer) || (!!viewer && can(viewer.role, { build: "delete-any" }));
}

/** Preview images are for pasting in public places: never for private or hidden builds. */
export function hasPublicPreview(build: { visibility: string; hiddenAt: Date | null }): boolean {
  return (build.visibility as BuildVisibility) !== "private" && !build.hiddenAt;
}

/** The parts of a signed-in user the rules read. */
export function toBuildViewer(user: { id: string; role: string } | null): BuildViewer {
  if (!user) return null;
  return { id: user.id, role: roleOf(user.role) };
}
