import { CardBones, LoadingRegion, TitleBones } from "@/components/ui/skeleton";

export default function SubmissionsLoading() {
  return (
    <LoadingRegion label="Loading your submissions…" className="max-w-4xl">
      <TitleBones />
      <CardBones count={4} className="space-y-3" />
    </LoadingRegion>
  );
}
