import { z } from "zod";

export const MIN_PASSWORD = 10;

const email = z.string().trim().min(1, "Enter your e-mail address.").email("That does not look like an e-mail address (name@example.com).");
const password = z
  .string()
  .min(MIN_PASSWORD, `Use at least ${MIN_PASSWORD} characters.`)
  .max(128, "Use at most 128 characters.");

export const signUpSchema = z.object({
  name: z.string().trim().min(1, "Enter your name, as your shop should see it.").max(80, "Keep the name under 80 characters."),
  email,
  password,
});
export type SignUpValues = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({ email, password: z.string().min(1, "Enter your password.") });
export type SignInValues = z.infer<typeof signInSchema>;

export const forgotSchema = z.object({ email });
export type ForgotValues = z.infer<typeof forgotSchema>;

export const resetSchema = z
  .object({ password, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ." });
export type ResetValues = z.infer<typeof resetSchema>;

/** Only same-site paths may be used as a place to go after signing in. */
export function safeNext(next: string | null | undefined, fallback = "/home"): string {
  return next && next.startsWith("/") && !next.startsWith("//") ? next : fallback;
}
