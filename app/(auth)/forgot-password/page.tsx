import { AuthCard } from "@/components/auth/auth-card";
import { ForgotPasswordForm } from "@/components/auth/password-forms";

export const metadata = { title: "Reset your password" };

export default function ForgotPasswordPage() {
  return (
    <AuthCard title="Reset your password" lead="We will e-mail you a link to choose a new one.">
      <ForgotPasswordForm />
    </AuthCard>
  );
}
