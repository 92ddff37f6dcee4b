import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { SignInForm } from "@/components/auth/sign-in-form";
import { safeNextPath } from "@/lib/auth/safe-next";

export const metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; verified?: string }> }) {
  const { next, verified } = await searchParams;
  return (
    <AuthCard title="Sign in" lead={verified ? "Your e-mail is confirmed. Sign in to continue." : "Save builds, keep a list of your gear, and submit parts."}
      footer={<div className="flex justify-between"><Link className="underline decoration-brass underline-offset-4" href="/sign-up">Create an account</Link><Link className="underline decoration-line underline-offset-4" href="/forgot-password">Forgot your password?</Link></div>}>
      <SignInForm next={safeNextPath(next)} />
    </AuthCard>
  );
}
