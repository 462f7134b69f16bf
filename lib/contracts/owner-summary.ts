import { z } from "zod";
import { multiLineText } from "./text";
import { REPAIR_IDS } from "@/lib/repairs/catalog";

// Contracts of the owner summary: the share links, the repair proposal and the owner's answer,
// and the summary's shape as the page, the e-mail and the PDF draw it.

const positiveId = (what: string) =>
  z.coerce
    .number({ message: `A ${what} id is a number.` })
    .int(`A ${what} id is a whole number.`)
    .positive(`A ${what} id is positive.`);

export const caseIdParamsSchema = z.object({ id: positiveId("case") });
export const shareLinkParamsSchema = z.object({ id: positiveId("case"), linkId: positiveId("link") });

/** A token is 32 random bytes in base64url (43 characters); anything else is not one of ours. */
export const shareTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, "This link is not valid.");
export const publicTokenParamsSchema = z.object({ token: shareTokenSchema });

export const DEFAULT_SHARE_DAYS = 30;
export const createShareLinkSchema = z.object({
  expiresInDays: z
    .number({ message: "Days must be a number." })
    .int("Days must be a whole number.")
    .min(1, "A link lasts at least one day.")
    .max(90, "A link lasts at most 90 days.")
    .default(DEFAULT_SHARE_DAYS),
});
export type CreateShareLinkInput = z.input<typeof createShareLinkSchema>;

export const NOTE_MAX_CHARS = 1000;
export const repairProposalSchema = z.object({
  repairIds: z
    .array(z.enum(REPAIR_IDS, { message: "Choose repairs from the list." }), {
      message: "Choose at least one repair.",
    })
    .min(1, "Choose at least one repair.")
    .max(REPAIR_IDS.length, "Choose each repair once.")
    .refine((ids) => new Set(ids).size === ids.length, "Choose each repair once."),
  /** In the currency's minor unit (cents). */
  priceMinor: z
    .number({ message: "The price must be a number." })
    .int("The price is in whole cents.")
    .min(0, "The price cannot be negative.")
    .max(10_000_000, "The price is above 100,000: check it.")
    .nullable()
    .default(null),
  currency: z
    .string()
    .regex(/^[A-Z]{3}$/, "Use a three-letter currency code such as USD or CAD.")
    .default("USD"),
  note: multiLineText()
    .trim()
    .max(NOTE_MAX_CHARS, `Keep the note under ${NOTE_MAX_CHARS} characters.`)
    .default(""),
});
export type RepairProposalInput = z.input<typeof repairProposalSchema>;

export const OWNER_ANSWERS = ["approved", "declined"] as const;
export type OwnerAnswer = (typeof OWNER_ANSWERS)[number];
export const ownerAnswerSchema = z.object({
  proposalId: z.number({ message: "The proposal is missing." }).int().positive(),
  answer: z.enum(OWNER_ANSWERS, { message: "Choose approve or decline." }),
  note: multiLineText()
    .trim()
    .max(NOTE_MAX_CHARS, `Keep the note under ${NOTE_MAX_CHARS} characters.`)
    .default(""),
});
export type OwnerAnswerInput = z.input<typeof ownerAnswerSchema>;

/** One fact with the number that matters, and what it means. */
export interface OwnerFactLine {
  fact: string;
  meaning: string;
}

export interface OwnerRepairLine {
  id: string;
  title: string;
  involves: string;
}

export interface OwnerProposalView {
  id: number;
  repairs: OwnerRepairLine[];
  /** Formatted, e.g. "$480.00"; null when the shop entered no price. */
  price: string | null;
  note: string | null;
  proposedAt: string;
  answer: { answer: OwnerAnswer; note: string | null; answeredAt: string } | null;
}

/** Everything the owner page, its e-mail and its PDF say, as plain text (never HTML). */
export interface OwnerSummary {
  shopName: string;
  vehicle: string | null;
  /** The one sentence that says what we found. */
  keySentence: string;
  reported: string;
  found: { title: string; sections: { heading: string; text: string }[] } | null;
  facts: OwnerFactLine[];
  done: OwnerRepairLine[];
  proposal: OwnerProposalView | null;
  nextCheck: { title: string; text: string } | null;
  watch: string[];
  safety: string[];
  glossary: { term: string; explanation: string }[];
}

/** The shop's view of its links, proposals and answers, for the case page. */
export interface ShareLinkView {
  id: number;
  createdAt: string;
  expiresAt: string;
  revokedAt: string | null;
  lastViewedAt: string | null;
  viewCount: number;
  createdBy: string;
  state: "active" | "expired" | "revoked";
}

export interface ShopProposalView extends OwnerProposalView {
  proposedBy: string;
  answeredViaLinkId: number | null;
}

/** Public routes take any token string; the server answers "no longer valid" for one not shaped like ours. */
export const rawTokenParamsSchema = z.object({ token: z.string() });
export const rawTokenPhotoParamsSchema = z.object({
  token: z.string(),
  photoId: z.coerce.number({ message: "A photo id is a number." }).int().positive("A photo id is positive."),
});

/** A photo the owner page shows (marked shareable by the shop). */
export interface SharedPhoto {
  id: number;
  caption: string;
  kind: string;
  widthPx: number;
  heightPx: number;
}
