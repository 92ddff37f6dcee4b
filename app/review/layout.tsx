import { requireUser } from "@/lib/signed-in";

// Above the review pages' loading.tsx, so a stale or banned session is still a 307 to sign in.
export default async function ReviewLayout({ children }: { children: React.ReactNode }) {
  await requireUser("/review");
  return children;
}
