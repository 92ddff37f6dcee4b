// The shop dashboard's menu. Add a page by adding one entry (e.g. Orders: { href: "/shop/orders", label: "Orders" }).
export type ShopNavEntry = { href: string; label: string; ownerOnly?: boolean };

export const SHOP_NAV: ShopNavEntry[] = [
  { href: "/shop", label: "Overview" },
  { href: "/shop/inventory", label: "Inventory" },
  { href: "/shop/import", label: "Import CSV" },
  { href: "/shop/stock-next", label: "What to stock next" },
  { href: "/shop/staff", label: "Staff" },
  { href: "/shop/keys", label: "API keys", ownerOnly: true },
];

export function shopNavFor(role: "owner" | "staff"): ShopNavEntry[] {
  return SHOP_NAV.filter((e) => !e.ownerOnly || role === "owner");
}
