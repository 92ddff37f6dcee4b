"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { authClient } from "@/lib/auth/client";
import { forgotPasswordSchema, resetPasswordSchema, type ForgotPasswordInput, type ResetPasswordInput } from "@/lib/validation/auth";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input } from "@/components/ui/field";

export function ForgotPasswordForm() {
  const [done, setDone] = useState(false);
  const { register, handleSubmit, formState: { errors, isSubmitting } } = useForm<ForgotPasswordInput>({ resolver: zodResolver(forgotPasswordSchema) });
  async function onSubmit(values: ForgotPasswordInput) {
    await authClient.requestPasswordReset({ email: values.email, redirectTo: "/reset-password" });
    setDone(true); // same answer whether or not the account exists
  }
  if (done) return <FormMessage tone="ok">If an account uses that address, a reset link is on its way. It works for one hour.</FormMessage>;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-4">
      <Field label="E-mail" htmlFor="email" error={errors.email?.message}>
        <Input id="email" type="email" autoComplete="email" invalid={!!errors.email} {...register("email")} />
      </Field>
      <Button type="submit" disabled={isSubmitting} className="w-full">Send me a reset link</Button>
    </form>
  );
}

export function ResetPasswordForm({ token }: { token: string | null }) {
  const [state, setState] = useState<"idle" | "done" | string>("idle");
  const { register, handleSubmit, formState: { errors, isSubmitting } } = useForm<ResetPasswordInput>({ resolver: zodResolver(resetPasswordSchema) });
  if (!token) return <FormMessage>This reset link is incomplete. Ask for a <Link className="underline" href="/forgot-password">new one</Link>.</FormMessage>;
  async function onSubmit(values: ResetPasswordInput) {
    const { error } = await authClient.resetPassword({ newPassword: values.password, token: token! });
    setState(error ? (error.message ?? "This link has expired or was already used.") : "done");
  }
  if (state === "done") return <FormMessage tone="ok">Your password is changed. <Link className="underline" href="/sign-in">Sign in</Link> with it now.</FormMessage>;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-4">
      {state !== "idle" ? <FormMessage>{state} <Link className="underline" href="/forgot-password">Ask for a new link</Link>.</FormMessage> : null}
      <Field label="New password" htmlFor="password" error={errors.password?.message}>
        <Input id="password" type="password" autoComplete="new-password" invalid={!!errors.password} {...register("password")} />
      </Field>
      <Field label="Repeat it" htmlFor="confirm" error={errors.confirm?.message}>
        <Input id="confirm" type="password" autoComplete="new-password" invalid={!!errors.confirm} {...register("confirm")} />
      </Field>
      <Button type="submit" disabled={isSubmitting} className="w-full">Change password</Button>
    </form>
  );
}
