"use client";
import { SaveBuildButton } from "@/components/builds/save-build-dialog";
import { Planner } from "@/components/planner/planner";
import type { PlanState } from "@/lib/planner/url-state";

/** The planner with "Save as link" plugged into its action slot. */
export function PlanWorkbench({ initial, signedIn, exampleHref }: { initial: PlanState; signedIn: boolean; exampleHref: string }) {
  return (
    <Planner initial={initial} signedIn={signedIn} exampleHref={exampleHref}
      renderActions={({ request, solutionIndex, result }) => {
        const items = result.context?.items ?? {};
        const optics = items[result.context?.opticsId ?? ""]?.name;
        const camera = items[result.context?.cameraId ?? ""]?.name;
        return <SaveBuildButton request={request} solutionIndex={solutionIndex} signedIn={signedIn}
          defaultTitle={optics && camera ? `${optics} to ${camera}` : ""} />;
      }} />
  );
}
