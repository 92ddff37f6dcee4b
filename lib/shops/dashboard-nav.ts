// The shop dashboard's menu. Add a page by adding one entry (e.g. Orders: { href: "/shop/orders", label: "Orders" }).
import { canInShop, type ShopPermission } from "@/lib/auth/roles";

export type ShopNavEntry = { href: string; label: string; needs?: ShopPermission };

export const SHOP_NAV: ShopNavEntry[] = [
  { href: "/shop", label: "Overview" },
  { href: "/shop/inventory", label: "Inventory" },
  { href: "/shop/import", label: "Import CSV" },
  { href: "/shop/stock-next", label: "What to stock next" },
  { href: "/shop/staff", label: "Staff" },
  { href: "/shop/keys", label: "API keys", needs: { apiKey: "manage" } },
];

/** The entries this member's shop role (better-auth's `member.role`) may open. */
export function shopNavFor(grants: string): ShopNavEntry[] {
  return SHOP_NAV.filter((e) => !e.needs || canInShop(grants, e.needs));
}
