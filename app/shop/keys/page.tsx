import { headers } from "next/headers";
import { PageTitle } from "@/components/ui/card";
import { ApiKeysPanel } from "@/components/shops/api-keys-panel";
import { canInShop } from "@/lib/auth/roles";
import { listApiKeys } from "@/db/queries/shops-keys";
import { siteOrigin } from "@/lib/builds/site-url";
import { dashboardShopOrNull } from "@/lib/shops/dashboard";

export const metadata = { title: "API keys" };

export default async function KeysPage() {
  const ctx = await dashboardShopOrNull("/shop/keys");
  if (!ctx) return null;
  if (!canInShop(ctx.grants, { apiKey: "manage" })) return <PageTitle title="API keys" lead={`Only the owner of ${ctx.shop.name} makes and revokes API keys.`} />;
  const keys = await listApiKeys({ organizationId: ctx.shop.id });
  return (
    <>
      <PageTitle title="API keys" lead="Let your own stock system keep Trainyard's inventory in step. Each key reads and writes this shop's stock only." />
      <ApiKeysPanel shopSlug={ctx.shop.slug} keys={keys} origin={siteOrigin(await headers())} />
    </>
  );
}
