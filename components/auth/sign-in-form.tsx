"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { authClient } from "@/lib/auth/client";
import { safeNextPath } from "@/lib/auth/safe-next";
import { signInSchema, type SignInInput } from "@/lib/validation/auth";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input } from "@/components/ui/field";

export function SignInForm({ next }: { next?: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: "bad" | "info"; text: string } | null>(null);
  const { register, handleSubmit, formState: { errors, isSubmitting } } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  async function onSubmit(values: SignInInput) {
    setMessage(null);
    const { error } = await authClient.signIn.email({ email: values.email, password: values.password });
    if (error) {
      if (error.status === 403) setMessage({ tone: "info", text: "Confirm your e-mail first: we have sent you a fresh link." });
      else setMessage({ tone: "bad", text: error.status === 401 ? "That e-mail and password do not match an account." : error.message ?? "Sign-in failed." });
      return;
    }
    router.push(safeNextPath(next));
    router.refresh();
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-4">
      {message ? <FormMessage tone={message.tone}>{message.text}</FormMessage> : null}
      <Field label="E-mail" htmlFor="email" error={errors.email?.message}>
        <Input id="email" type="email" autoComplete="email" invalid={!!errors.email} {...register("email")} />
      </Field>
      <Field label="Password" htmlFor="password" error={errors.password?.message}>
        <Input id="password" type="password" autoComplete="current-password" invalid={!!errors.password} {...register("password")} />
      </Field>
      <Button type="submit" disabled={isSubmitting} className="w-full">{isSubmitting ? "Signing in…" : "Sign in"}</Button>
    </form>
  );
}
