import { CardBones, LoadingRegion, TitleBones } from "@/components/ui/skeleton";

export default function AccountLoading() {
  return (
    <LoadingRegion label="Loading your account…" className="max-w-3xl">
      <TitleBones />
      <CardBones count={6} />
    </LoadingRegion>
  );
}
