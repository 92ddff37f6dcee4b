import { Bone, CardBones, LoadingRegion, TitleBones } from "@/components/ui/skeleton";

export default function BuildsLoading() {
  return (
    <LoadingRegion label="Loading the builds…">
      <TitleBones />
      <Bone className="mb-6 h-16 rounded-lg" />
      <CardBones count={6} className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3" />
    </LoadingRegion>
  );
}
