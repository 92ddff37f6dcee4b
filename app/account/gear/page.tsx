import { GearEditor } from "@/components/account/gear-editor";
import { ButtonLink } from "@/components/ui/button";
import { PageTitle } from "@/components/ui/card";
import { requireUser } from "@/lib/signed-in";

export const metadata = { title: "My gear" };

export default async function GearPage() {
  await requireUser("/account/gear");
  return (
    <div>
      <PageTitle title="My gear" lead="Parts on your bench. With “What I own, then the catalog” the planner uses these first, counts them as free, and lists only what is still to buy.">
        <ButtonLink href="/plan?source=owned" variant="secondary">Plan with my gear</ButtonLink>
      </PageTitle>
      <GearEditor />
    </div>
  );
}
