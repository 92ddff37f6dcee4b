import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { isMailFake } from "@/lib/mail";

export const metadata = { title: "Create an account" };
// isMailFake() reads SMTP_URL when the server runs, not when it was built.
export const dynamic = "force-dynamic";

export default function SignUpPage() {
  return (
    <AuthCard title="Create an account" lead="Free for imagers. We will send a link to confirm your e-mail."
      footer={<>Already have one? <Link className="underline decoration-brass underline-offset-4" href="/sign-in">Sign in</Link></>}>
      <SignUpForm outbox={isMailFake()} />
    </AuthCard>
  );
}
