import { ButtonLink } from "@/components/ui/button";

/** On a build's page: turn the parts still to buy into a quote request to a shop. */
export function QuoteRequestPanel({ slug, signedIn }: { slug: string; signedIn: boolean }) {
  const href = `/quotes/new?build=${encodeURIComponent(slug)}`;
  return (
    <section aria-labelledby="buy-heading" className="space-y-3 rounded-lg border border-line bg-surface p-4">
      <h2 id="buy-heading" className="font-semibold text-ink">Buy the parts</h2>
      <p className="text-sm text-muted">Ask a shop that stocks them for one quote on the connecting parts you still need; pay once for the lot.</p>
      <ButtonLink href={signedIn ? href : `/sign-in?next=${encodeURIComponent(href)}`} variant="secondary">Ask a shop for a quote</ButtonLink>
    </section>
  );
}
