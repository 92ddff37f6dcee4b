"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { authClient } from "@/lib/auth/client";
import { signUpSchema, type SignUpInput } from "@/lib/validation/auth";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input } from "@/components/ui/field";

export function SignUpForm({ outbox }: { outbox: boolean }) {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState: { errors, isSubmitting } } = useForm<SignUpInput>({ resolver: zodResolver(signUpSchema) });

  async function onSubmit(values: SignUpInput) {
    setFailure(null);
    const { error } = await authClient.signUp.email({ ...values, callbackURL: "/sign-in?verified=1" });
    if (error) {
      setFailure(error.status === 422 || error.code === "USER_ALREADY_EXISTS" ? "An account with this e-mail already exists. Sign in, or reset the password." : error.message ?? "Sign-up failed.");
      return;
    }
    setSentTo(values.email);
  }

  if (sentTo) {
    return (
      <FormMessage tone="ok">
        We sent a confirmation link to <strong>{sentTo}</strong>. Open it to finish creating your account.
        {outbox ? <> On this machine mail is kept in the <a className="underline" href="/dev/outbox">local outbox</a>, which the site&apos;s admin can read.</> : null}
      </FormMessage>
    );
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-4">
      {failure ? <FormMessage>{failure}</FormMessage> : null}
      <Field label="Name" htmlFor="name" error={errors.name?.message} hint="Shown on builds you publish.">
        <Input id="name" autoComplete="name" invalid={!!errors.name} {...register("name")} />
      </Field>
      <Field label="E-mail" htmlFor="email" error={errors.email?.message}>
        <Input id="email" type="email" autoComplete="email" invalid={!!errors.email} {...register("email")} />
      </Field>
      <Field label="Password" htmlFor="password" error={errors.password?.message} hint="At least 8 characters.">
        <Input id="password" type="password" autoComplete="new-password" invalid={!!errors.password} {...register("password")} />
      </Field>
      <Button type="submit" disabled={isSubmitting} className="w-full">{isSubmitting ? "Creating…" : "Create account"}</Button>
    </form>
  );
}
