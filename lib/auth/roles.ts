// The one role vocabulary: what each site role and shop role may do, as better-auth access
// control statements. Every check in the app goes through `can` / `canInShop`; nothing compares
// role names or ranks. The same objects configure better-auth's admin and organization plugins.
import { createAccessControl } from "better-auth/plugins/access";
import { defaultStatements as adminStatements, adminAc } from "better-auth/plugins/admin/access";

// Site roles: member (default), moderator, admin. `user` and `session` are the admin plugin's
// own statements (ban, set-role, list…); better-auth checks them on its /admin endpoints.
export const siteStatements = {
  ...adminStatements,
  build: ["save", "moderate", "delete-any"],
  part: ["submit", "review"],
} as const;
export const siteAc = createAccessControl(siteStatements);

export const siteRoles = {
  member: siteAc.newRole({ build: ["save"], part: ["submit"] }),
  moderator: siteAc.newRole({ build: ["save", "moderate"], part: ["submit", "review"] }),
  admin: siteAc.newRole({ ...adminAc.statements, build: ["save", "moderate", "delete-any"], part: ["submit", "review"] }),
};
export type SiteRole = keyof typeof siteRoles;

/** One permission: a resource and one of its actions, e.g. `{ build: "moderate" }`. */
type OneOf<S> = { [K in keyof S]: { [P in K]: S[K] extends readonly (infer A)[] ? A : never } }[keyof S];
export type SitePermission = OneOf<typeof siteStatements>;

/** Unknown or missing roles read as member: a stray value never grants more. */
export function roleOf(value: string | null | undefined): SiteRole {
  return value !== undefined && value !== null && Object.hasOwn(siteRoles, value) ? (value as SiteRole) : "member";
}

function asRequest(permission: Record<string, string>): Record<string, string[]> {
  return Object.fromEntries(Object.entries(permission).map(([k, v]) => [k, [v]]));
}

/** May a holder of this site role do this? */
export function can(role: string | null | undefined, permission: SitePermission): boolean {
  return siteRoles[roleOf(role)].authorize(asRequest(permission) as never).success;
}

// Shop roles (better-auth organizations): owner and staff. Teams and dynamic access control are
// not enabled, so their statements are left out.
// `organization`, `member` and `invitation` are better-auth's own (it checks them on its
// /organization endpoints); the rest are the app's: `members` (see the staff list, invite and
// remove staff), `apiKey` (stock-sync keys), `inventory`, `quote` (answer or decline a request),
// `order` (see the shop's orders, ship, refund).
export const shopStatements = {
  organization: ["update", "delete"],
  member: ["create", "update", "delete"],
  invitation: ["create", "cancel"],
  members: ["read", "manage"],
  apiKey: ["manage"],
  inventory: ["read", "update"],
  quote: ["answer"],
  order: ["read", "ship", "refund"],
} as const;
export const shopAc = createAccessControl(shopStatements);
export const shopRoles = {
  owner: shopAc.newRole({ ...shopStatements }),
  staff: shopAc.newRole({ members: ["read"], inventory: ["read", "update"], quote: ["answer"], order: ["read", "ship", "refund"] }),
};
export type ShopRole = keyof typeof shopRoles;
export type ShopPermission = OneOf<typeof shopStatements>;

/**
 * May a member with this shop role do this? `role` is better-auth's `member.role` (it may list
 * several, comma-separated); null means not a member of the shop.
 */
export function canInShop(role: string | null | undefined, permission: ShopPermission): boolean {
  return (role ?? "").split(",").map((r) => r.trim()).some((r) =>
    Object.hasOwn(shopRoles, r) && shopRoles[r as ShopRole].authorize(asRequest(permission) as never).success);
}
