import { z } from "zod";

const email = z.string().trim().toLowerCase().email("Enter an e-mail address like name@example.org");
const password = z.string().min(8, "At least 8 characters").max(128, "At most 128 characters");

export const signInSchema = z.object({ email, password: z.string().min(1, "Enter your password") });
export const signUpSchema = z.object({ name: z.string().trim().min(2, "At least 2 characters").max(60), email, password });
export const forgotPasswordSchema = z.object({ email });
export const resetPasswordSchema = z.object({ password, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" });

export type SignInInput = z.infer<typeof signInSchema>;
export type SignUpInput = z.infer<typeof signUpSchema>;
export type ForgotPasswordInput = z.infer<typeof forgotPasswordSchema>;
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;
