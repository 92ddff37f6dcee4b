import { redirect } from "next/navigation";
import { GearEditor } from "@/components/account/gear-editor";
import { ButtonLink } from "@/components/ui/button";
import { PageTitle } from "@/components/ui/card";
import { getSessionUser } from "@/lib/auth/session";

export const metadata = { title: "My gear" };
export const dynamic = "force-dynamic";

export default async function GearPage() {
  if (!(await getSessionUser())) redirect("/sign-in?next=/account/gear");
  return (
    <div>
      <PageTitle title="My gear" lead="Parts on your bench. With “What I own, then the catalog” the planner uses these first, counts them as free, and lists only what is still to buy.">
        <ButtonLink href="/plan?source=owned" variant="secondary">Plan with my gear</ButtonLink>
      </PageTitle>
      <GearEditor />
    </div>
  );
}
