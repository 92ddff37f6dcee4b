import type { Metadata } from "next";
import { ButtonLink } from "@/components/ui/button";

export const metadata: Metadata = { title: "Not found", robots: { index: false } };

/** Our own 404: a missing page, a deleted build, or one that is private or hidden from you. */
export default function NotFound() {
  return (
    <div className="mx-auto max-w-xl py-10">
      <p className="text-[11px] font-medium uppercase tracking-[0.2em] text-brass-ink">404 · nothing at this address</p>
      <h1 className="mt-2 text-2xl font-semibold tracking-tight text-ink sm:text-3xl">This link leads nowhere</h1>
      <p className="mt-3 text-text">
        The page may never have existed, or it was a build that its owner deleted, made private, or a moderator hid.
        Private and hidden builds open only for their owner and for moderators — signing in may help.
      </p>
      <div className="mt-6 flex flex-wrap gap-2">
        <ButtonLink href="/plan">Open the planner</ButtonLink>
        <ButtonLink href="/builds" variant="secondary">Browse builds</ButtonLink>
        <ButtonLink href="/parts" variant="secondary">Search parts</ButtonLink>
      </div>
    </div>
  );
}
