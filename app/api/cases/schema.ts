import { z } from "zod";

export const CASE_STATUSES = ["draft", "awaiting_signoff", "signed_off", "sent_back", "closed"] as const;

export const caseListQuerySchema = z.object({
  status: z.enum(CASE_STATUSES, { message: "Unknown case status." }).optional(),
});

export const caseParamsSchema = z.object({
  id: z.coerce.number({ message: "A case id is a number." }).int("A case id is a whole number.").positive("A case id is positive."),
});
