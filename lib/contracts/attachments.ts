import { z } from "zod";
import { singleLineText } from "./text";

// Photos attached to a case: what an upload may be, and what the shop's screens receive.

export const MAX_UPLOAD_BYTES = 15 * 1024 * 1024;
/** Content types we accept, decided from the file's bytes, never its name. */
export const ACCEPTED_IMAGE_TYPES = [
  "image/jpeg",
  "image/png",
  "image/webp",
  "image/heic",
  "image/avif",
] as const;

export const ATTACHMENT_KINDS = ["gauges", "label", "identifier", "leak", "damage", "other"] as const;
export type AttachmentKind = (typeof ATTACHMENT_KINDS)[number];
export const ATTACHMENT_KIND_LABELS: Record<AttachmentKind, string> = {
  gauges: "Gauge faces",
  label: "Under-hood label",
  identifier: "Identifier printout",
  leak: "Leak or dye trace",
  damage: "Damage",
  other: "Other",
};

export const CAPTION_MAX_CHARS = 200;
const caption = singleLineText()
  .trim()
  .max(CAPTION_MAX_CHARS, `Keep the caption under ${CAPTION_MAX_CHARS} characters.`);

/** The form fields sent with the file (multipart). */
export const attachmentUploadFieldsSchema = z.object({
  kind: z.enum(ATTACHMENT_KINDS, { message: "Choose what the photo shows." }).default("other"),
  caption: caption.default(""),
  shareable: z
    .enum(["true", "false"], { message: "Shareable is yes or no." })
    .default("false")
    .transform((v) => v === "true"),
});

export const attachmentPatchSchema = z
  .object({
    kind: z.enum(ATTACHMENT_KINDS, { message: "Choose what the photo shows." }).optional(),
    caption: caption.optional(),
    shareable: z.boolean({ message: "Shareable is yes or no." }).optional(),
  })
  .refine((v) => Object.keys(v).length > 0, "Nothing to change.");
export type AttachmentPatchInput = z.input<typeof attachmentPatchSchema>;

export const attachmentParamsSchema = z.object({
  id: z.coerce.number({ message: "A case id is a number." }).int().positive("A case id is positive."),
  attachmentId: z.coerce
    .number({ message: "A photo id is a number." })
    .int()
    .positive("A photo id is positive."),
});

export const PHOTO_SIZES = ["display", "thumb"] as const;
export const photoQuerySchema = z.object({
  size: z.enum(PHOTO_SIZES, { message: "Size is display or thumb." }).default("display"),
});

export interface AttachmentView {
  id: number;
  kind: AttachmentKind;
  caption: string;
  shareable: boolean;
  contentType: string;
  /** The re-encoded display image, bytes. */
  sizeBytes: number;
  widthPx: number;
  heightPx: number;
  uploadedBy: string;
  createdAt: string;
}
