import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { SignInForm } from "@/components/auth/sign-in-form";
import { safeNextPath } from "@/lib/auth/safe-next";
import { getSessionUser } from "@/lib/auth/session";

export const metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; verified?: string }> }) {
  const { next, verified } = await searchParams;
  // The e-mail link signs the new member in: say so rather than asking them to sign in.
  const user = await getSessionUser().catch(() => null);
  if (user) {
    return (
      <AuthCard title="You are signed in" lead={`${verified ? "Your e-mail is confirmed. " : ""}Signed in as ${user.name} (${user.email}).`}>
        <div className="flex flex-wrap gap-x-4 gap-y-2 text-sm">
          <Link className="underline decoration-brass underline-offset-4" href="/plan">Open the planner</Link>
          <Link className="underline decoration-brass underline-offset-4" href="/account">Your account</Link>
        </div>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Sign in" lead={verified ? "Your e-mail is confirmed. Sign in to continue." : "Save builds, keep a list of your gear, and submit parts."}
      footer={<div className="flex justify-between"><Link className="underline decoration-brass underline-offset-4" href="/sign-up">Create an account</Link><Link className="underline decoration-line underline-offset-4" href="/forgot-password">Forgot your password?</Link></div>}>
      <SignInForm next={safeNextPath(next)} />
    </AuthCard>
  );
}
