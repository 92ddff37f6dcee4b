import Link from "next/link";
import { PageTitle } from "@/components/ui/card";
import { listShops } from "@/db/queries/shops";

// Reads only the database, no request data: without this the build would prerender a stale list.
export const dynamic = "force-dynamic";
export const metadata = { title: "Shops" };

export default async function ShopsPage() {
  const shops = await listShops();
  return (
    <>
      <PageTitle title="Shops" lead="Shops that keep their stock on Trainyard. Pick one in the planner (“Draw the parts from”) and the answer uses only what it has, at its prices." />
      <ul className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3">
        {shops.map((s) => (
          <li key={s.slug}>
            <Link href={`/shops/${s.slug}`} className="block h-full rounded-lg border border-line bg-surface p-5 transition-colors hover:border-brass">
              <p className="text-lg font-semibold text-ink">{s.name}</p>
              <p className="text-sm text-muted">{s.location}</p>
              <p className="mt-2 line-clamp-2 text-sm text-text">{s.about}</p>
              <p className="mt-3 text-xs text-muted"><span className="num font-semibold text-text">{s.inStock}</span> parts in stock · prices in <span className="code">{s.currency}</span></p>
            </Link>
          </li>
        ))}
      </ul>
    </>
  );
}
