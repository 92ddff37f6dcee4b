import { redirect } from "next/navigation";
import { SubmitPartForm } from "@/components/parts/submit-part-form";
import { PageTitle } from "@/components/ui/card";
import { getSessionUser } from "@/lib/auth/session";

export const metadata = { title: "Submit a part" };

export default async function SubmitPartPage() {
  if (!(await getSessionUser())) redirect("/sign-in?next=/parts/submit");
  return (
    <div className="max-w-4xl">
      <PageTitle title="Submit a missing part" lead="Give its two faces, its optical length and the maker's spec sheet. A moderator compares your numbers with the sheet before the planner uses the part." />
      <div className="rounded-lg border border-line bg-surface p-5"><SubmitPartForm /></div>
    </div>
  );
}
