import { LoadingRegion, TableBones, TitleBones } from "@/components/ui/skeleton";

export default function OrdersLoading() {
  return (
    <LoadingRegion label="Loading your quotes and orders…">
      <TitleBones />
      <TableBones rows={5} />
    </LoadingRegion>
  );
}
