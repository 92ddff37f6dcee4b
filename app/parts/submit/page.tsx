import { SubmitPartForm } from "@/components/parts/submit-part-form";
import { PageTitle } from "@/components/ui/card";
import { requireUser } from "@/lib/signed-in";

export const metadata = { title: "Submit a part" };

export default async function SubmitPartPage() {
  // No loading.tsx above this page (the parts list's skeleton sits in app/parts/(list)), so the redirect is still a 307.
  await requireUser("/parts/submit");
  return (
    <div className="max-w-4xl">
      <PageTitle title="Submit a missing part" lead="Give its two faces, its optical length and the maker's spec sheet. A moderator compares your numbers with the sheet before the planner uses the part." />
      <div className="rounded-lg border border-line bg-surface p-5"><SubmitPartForm /></div>
    </div>
  );
}
