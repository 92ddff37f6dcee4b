import { CardBones, LoadingRegion, TitleBones } from "@/components/ui/skeleton";

export default function ReviewLoading() {
  return (
    <LoadingRegion label="Loading the review queue…" className="max-w-5xl">
      <TitleBones />
      <CardBones count={3} className="space-y-4" />
    </LoadingRegion>
  );
}
