/** A ban holds until `banExpires` passes (better-auth's admin plugin lifts an expired ban at the next sign-in). */
export function isBanned(user: { banned?: boolean | null; banExpires?: Date | string | null } | null | undefined, now = Date.now()): boolean {
  if (!user?.banned) return false;
  return !user.banExpires || new Date(user.banExpires).getTime() > now;
}
