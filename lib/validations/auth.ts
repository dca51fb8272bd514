import { z } from "zod";
import { text } from "./text";

export const emailSchema = z
  .string()
  .trim()
  .min(1, "Enter your e-mail address")
  .email("Enter a valid e-mail address, like name@example.com")
  .transform((v) => v.toLowerCase());

export const staffSignInSchema = z.object({
  email: emailSchema,
  password: text().min(1, "Enter your password"),
});

export const riderLinkSchema = z.object({ email: emailSchema });

/** Only same-site paths may be a post-sign-in destination (no open redirects). */
export function safeNextPath(value: string | null | undefined, fallback: string): string {
  if (!value || !value.startsWith("/") || value.startsWith("//") || value.includes("\\")) {
    return fallback;
  }
  return value;
}
