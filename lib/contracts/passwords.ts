import { z } from "zod";
import { PASSWORD_MIN_LENGTH } from "./invitations";
import type { ShopUser } from "./users";

/** How long a temporary password set by an owner keeps working before it is used (hours). */
export const TEMPORARY_PASSWORD_LIFETIME_HOURS = 72;

const newPassword = z
  .string({ message: "The new password is missing." })
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(200, "That password is too long: 200 characters at most.");

/** PUT /api/me/password: a person changes their own password. */
export const changePasswordSchema = z
  .object({
    currentPassword: z
      .string({ message: "Your current password is missing." })
      .min(1, "Your current password is missing.")
      .max(200, "That is not your current password."),
    newPassword,
  })
  .strict()
  .refine((v) => v.newPassword !== v.currentPassword, {
    message: "The new password is the same as the current one.",
    path: ["newPassword"],
  });
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

/** The form asks for the new password twice; the server needs it once. */
export const changePasswordFormSchema = z
  .object({
    currentPassword: z.string().min(1, "Your current password is missing."),
    newPassword,
    newPasswordAgain: z.string(),
  })
  .refine((v) => v.newPassword === v.newPasswordAgain, {
    message: "The two new passwords differ.",
    path: ["newPasswordAgain"],
  })
  .refine((v) => v.newPassword !== v.currentPassword, {
    message: "The new password is the same as the current one.",
    path: ["newPassword"],
  });
export type ChangePasswordForm = z.infer<typeof changePasswordFormSchema>;

/**
 * A password built from the person's own e-mail address is among the first anyone would try
 * (common practice). Null when the password is fine in that respect.
 */
export function passwordEmailProblem(password: string, email: string): string | null {
  const lower = password.toLowerCase();
  const address = email.trim().toLowerCase();
  const local = address.split("@")[0] ?? "";
  const parts = [address, local].filter((p) => p.length >= 4);
  return parts.some((p) => lower.includes(p))
    ? "Do not build the password from your e-mail address: it is among the first anyone would try."
    : null;
}

/** PUT /api/me/password. */
export interface PasswordChangedResponse {
  /** sessions of this person on other devices that were signed out; this one stays */
  otherSessionsEnded: number;
}

/** POST /api/users/[id]/password-reset: the temporary password, shown this once and never again. */
export interface PasswordResetResponse {
  user: ShopUser;
  temporaryPassword: string;
  expiresAt: string;
  sessionsEnded: number;
}
