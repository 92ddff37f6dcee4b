import { Bone, LoadingRegion, TableBones, TitleBones } from "@/components/ui/skeleton";

export default function PartsLoading() {
  return (
    <LoadingRegion label="Loading the parts catalog…">
      <TitleBones />
      <div className="mb-4 grid gap-3 sm:grid-cols-[2fr_1fr_1fr]"><Bone className="h-10" /><Bone className="h-10" /><Bone className="h-10" /></div>
      <TableBones rows={10} />
    </LoadingRegion>
  );
}
