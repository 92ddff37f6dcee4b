import Link from "next/link";
import { Card } from "@/components/ui/card";
import { listShopsOfUser } from "@/db/queries/shops";

const ROLE_WORDS = { owner: "you run its stock, staff, API keys and quotes", staff: "you keep its stock and answer its quotes" } as const;

/** The account page's card: the shops this person belongs to, and their role in each. */
export async function YourShops({ userId }: { userId: string }) {
  const shops = await listShopsOfUser({ userId });
  if (!shops.length) return null;
  return (
    <Card className={shops.length > 1 ? "sm:col-span-2" : ""}>
      <h2 className="font-medium text-ink">Your shop{shops.length > 1 ? "s" : ""}</h2>
      <ul className="mt-2 divide-y divide-line/70">
        {shops.map((s) => (
          <li key={s.slug} className="space-y-1.5 py-2">
            <div>
              <p className="font-medium text-text">{s.name}</p>
              <p className="text-sm text-muted">Role: <span className="font-medium capitalize text-text">{s.role}</span> · {ROLE_WORDS[s.role]}</p>
            </div>
            <div className="flex flex-wrap gap-3 text-sm">
              <Link href={`/shop/switch?to=${s.slug}`} className="underline decoration-brass underline-offset-4">Open the dashboard</Link>
              <Link href={`/shops/${s.slug}`} className="text-muted underline underline-offset-4">Public page</Link>
            </div>
          </li>
        ))}
      </ul>
    </Card>
  );
}
