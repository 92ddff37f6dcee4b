import { Suspense } from "react";
import { PartsBrowser } from "@/components/parts/parts-browser";
import { ButtonLink } from "@/components/ui/button";
import { PageTitle } from "@/components/ui/card";
import { LoadingRegion, TableBones } from "@/components/ui/skeleton";

export const metadata = { title: "Parts" };

export default function PartsPage() {
  return (
    <div>
      <PageTitle title="Parts catalog" lead="Every part with its sky-side and sensor-side faces, its optical length and its clear aperture. Moderators check each one before the planner uses it.">
        <ButtonLink href="/parts/submit" variant="secondary">Submit a missing part</ButtonLink>
      </PageTitle>
      {/* PartsBrowser reads the address (useSearchParams): the page around it renders first. */}
      <Suspense fallback={<LoadingRegion label="Loading the parts catalog…"><TableBones rows={10} /></LoadingRegion>}><PartsBrowser /></Suspense>
    </div>
  );
}
