import { Suspense } from "react";
import { PartsBrowser } from "@/components/parts/parts-browser";
import { ButtonLink } from "@/components/ui/button";
import { PageTitle } from "@/components/ui/card";

export const metadata = { title: "Parts" };

export default function PartsPage() {
  return (
    <div>
      <PageTitle title="Parts catalog" lead="Every part with its sky-side and sensor-side faces, its optical length and its clear aperture. Moderators check each one before the planner uses it.">
        <ButtonLink href="/parts/submit" variant="secondary">Submit a missing part</ButtonLink>
      </PageTitle>
      <Suspense fallback={<p className="text-muted">Loading…</p>}><PartsBrowser /></Suspense>
    </div>
  );
}
