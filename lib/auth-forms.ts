import { z } from "zod";
import { hasNul } from "./fields";

/** Sign-in and sign-up checks, run on the form before anything is sent. */
export const emailField = z.string().trim().toLowerCase().email("Enter an e-mail address like name@example.com");
/** The server also refuses the most common passwords (server/auth/password-rules.ts). */
export const PASSWORD_MIN = 10;
export const passwordField = z
  .string()
  .refine((s) => !hasNul(s), "A password cannot hold a NUL character")
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters for the password`)
  .max(128, "Use at most 128 characters");

export const signInForm = z.object({ email: emailField, password: z.string().min(1, "Enter your password") });

export const signUpForm = z.object({
  name: z.string().trim().min(1, "Enter your name").max(80),
  email: emailField,
  password: passwordField,
  shopName: z.string().trim().min(2, "Name your shop (at least 2 characters)").max(80),
});

export function slugFor(shopName: string): string {
  const base =
    shopName
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-|-$/g, "")
      .slice(0, 40) || "shop";
  return `${base}-${Math.random().toString(36).slice(2, 8)}`;
}

/** One message for any failed sign-in, so the form never says whether an e-mail is registered. */
export const SIGN_IN_FAILED = "That e-mail and password do not match an account.";
