import { createAccessControl } from "better-auth/plugins/access";
import { defaultStatements as adminStatements, adminAc } from "better-auth/plugins/admin/access";
import { defaultStatements as orgStatements, ownerAc } from "better-auth/plugins/organization/access";

// Site roles: member (default), moderator, admin.
export const siteStatements = {
  ...adminStatements,
  build: ["save", "endorse", "hide", "attach-thread"],
  part: ["submit", "review"],
} as const;
export const siteAc = createAccessControl(siteStatements);

export const siteRoles = {
  member: siteAc.newRole({ user: [], session: [], build: ["save"], part: ["submit"] }),
  moderator: siteAc.newRole({ user: [], session: [], build: ["save", "endorse", "hide", "attach-thread"], part: ["submit", "review"] }),
  admin: siteAc.newRole({ ...adminAc.statements, build: ["save", "endorse", "hide", "attach-thread"], part: ["submit", "review"] }),
};
export type SiteRole = keyof typeof siteRoles;
export const SITE_ROLES = Object.keys(siteRoles) as SiteRole[];

/** Rank for "at least this role" checks. */
export const ROLE_RANK: Record<SiteRole, number> = { member: 0, moderator: 1, admin: 2 };

export function roleOf(value: string | null | undefined): SiteRole {
  return value === "admin" || value === "moderator" ? value : "member";
}

// Shop roles (better-auth organizations): owner and staff.
export const shopStatements = { ...orgStatements, inventory: ["read", "update"], quote: ["answer"] } as const;
export const shopAc = createAccessControl(shopStatements);
export const shopRoles = {
  owner: shopAc.newRole({ ...ownerAc.statements, inventory: ["read", "update"], quote: ["answer"] }),
  staff: shopAc.newRole({ inventory: ["read", "update"], quote: ["answer"] }),
};
