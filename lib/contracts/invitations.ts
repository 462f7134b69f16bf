import { z } from "zod";
import { singleLineText } from "./text";
import { ROLES, type Role } from "@/lib/auth/roles";

// Adding a person to a shop: the owner invites an e-mail address; the person sets a password.

export const INVITATION_LIFETIME_DAYS = 7;
export const PASSWORD_MIN_LENGTH = 12;

export const inviteUserSchema = z.object({
  email: z
    .string({ message: "The e-mail address is missing." })
    .trim()
    .toLowerCase()
    .min(1, "The e-mail address is missing.")
    .email("That is not an e-mail address.")
    .max(255, "The e-mail address is at most 255 characters."),
  name: singleLineText({ message: "The name is missing." })
    .trim()
    .min(1, "The name is missing.")
    .max(120, "The name is at most 120 characters."),
  role: z.enum(ROLES, { message: "Choose one of: owner, senior, technician, apprentice." }),
});
export type InviteUserInput = z.infer<typeof inviteUserSchema>;

export const invitationParamsSchema = z.object({
  id: z.coerce
    .number({ message: "An invitation id is a number." })
    .int("An invitation id is a whole number.")
    .positive("An invitation id is positive."),
});

/** 32 random bytes, base64url without padding: the part of the link that proves it was mailed. */
export const invitationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, "This link is not complete.");

export const acceptInvitationSchema = z.object({
  token: invitationTokenSchema,
  name: singleLineText({ message: "Your name is missing." })
    .trim()
    .min(1, "Your name is missing.")
    .max(120, "Your name is at most 120 characters."),
  password: z
    .string()
    .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
    .max(200, "That password is too long."),
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

/** The form asks for the password twice; the server needs it once. */
export const acceptInvitationFormSchema = acceptInvitationSchema
  .extend({ passwordAgain: z.string() })
  .refine((v) => v.password === v.passwordAgain, {
    message: "The two passwords differ.",
    path: ["passwordAgain"],
  });
export type AcceptInvitationForm = z.infer<typeof acceptInvitationFormSchema>;

export interface PendingInvitationDto {
  id: number;
  email: string;
  name: string;
  role: Role;
  expiresAt: string;
  expired: boolean;
}

/** The same answer whether or not the address is known anywhere else. */
export interface InvitationSentDto {
  invitation: PendingInvitationDto;
  /** False when the mail server did not take the message; inviting again sends a new link. */
  mailed: boolean;
  message: string;
}
