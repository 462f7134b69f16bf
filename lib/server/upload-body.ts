import "server-only";
import type { NextRequest } from "next/server";
import { MAX_UPLOAD_BYTES } from "@/lib/contracts/attachments";
import { AppError } from "@/lib/errors";

// Room for the multipart framing and the form fields around a file at the limit.
const FRAMING_BYTES = 64 * 1024;
const TOO_LARGE = "That photo is larger than 15 MB. Take it again at a lower size.";

/**
 * Reads a multipart upload without trusting Content-Length: the stream is cut off past the limit.
 * Returns the one file (field `file`) and the other fields as strings.
 */
export async function readPhotoUpload(
  req: NextRequest,
): Promise<{ bytes: Buffer; fields: Record<string, string> }> {
  const type = req.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data"))
    throw new AppError(
      "unsupported_media_type:photo",
      "Send the photo as a form upload (multipart/form-data).",
    );
  const declared = Number(req.headers.get("content-length") ?? 0);
  if (declared > MAX_UPLOAD_BYTES + FRAMING_BYTES) throw new AppError("payload_too_large:photo", TOO_LARGE);
  if (!req.body) throw new AppError("bad_request:photo", "The upload is empty.");
  const chunks: Uint8Array[] = [];
  let total = 0;
  const reader = req.body.getReader();
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > MAX_UPLOAD_BYTES + FRAMING_BYTES) {
      await reader.cancel();
      throw new AppError("payload_too_large:photo", TOO_LARGE);
    }
    chunks.push(value);
  }
  let form: FormData;
  try {
    form = await new Response(Buffer.concat(chunks), { headers: { "content-type": type } }).formData();
  } catch {
    throw new AppError("bad_request:photo", "The upload could not be read. Try again.");
  }
  const file = form.get("file");
  if (!file || typeof file === "string") throw new AppError("bad_request:photo", "Choose a photo to upload.");
  const bytes = Buffer.from(await file.arrayBuffer());
  if (bytes.length > MAX_UPLOAD_BYTES) throw new AppError("payload_too_large:photo", TOO_LARGE);
  const fields: Record<string, string> = {};
  for (const [key, value] of form.entries())
    if (key !== "file" && typeof value === "string") fields[key] = value;
  return { bytes, fields };
}
