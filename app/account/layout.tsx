import { requireUser } from "@/lib/signed-in";

// Above the account pages' loading.tsx, so a stale or banned session is still a 307 to sign in.
export default async function AccountLayout({ children }: { children: React.ReactNode }) {
  await requireUser("/account");
  return children;
}
