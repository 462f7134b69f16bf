import { z } from "zod";

// E-mail sent from a case: the request to send the owner page, and the record the case shows.

export const sendOwnerEmailSchema = z.object({
  to: z.string().trim().email("Enter the owner's e-mail address.").max(254),
  expiresInDays: z.number().int().min(1).max(90).default(30),
});
export type SendOwnerEmailInput = z.input<typeof sendOwnerEmailSchema>;

export const emailParamsSchema = z.object({
  id: z.coerce.number({ message: "A case id is a number." }).int().positive("A case id is positive."),
  emailId: z.coerce
    .number({ message: "An e-mail id is a number." })
    .int()
    .positive("An e-mail id is positive."),
});

export const EMAIL_STATUSES = ["queued", "sent", "failed"] as const;
export type EmailStatus = (typeof EMAIL_STATUSES)[number];

export interface OutboundEmailView {
  id: number;
  to: string;
  subject: string;
  status: EmailStatus;
  attempts: number;
  lastError: string | null;
  createdAt: string;
  sentAt: string | null;
  shareLinkId: number | null;
}
