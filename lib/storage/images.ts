import "server-only";
import sharp from "sharp";
import { fileTypeFromBuffer } from "file-type";
import { ACCEPTED_IMAGE_TYPES, MAX_UPLOAD_BYTES } from "@/lib/contracts/attachments";
import { AppError } from "@/lib/errors";

// Long edge of the copy shown on screens and the owner page, and of the thumbnail (px).
const DISPLAY_EDGE_PX = 1600;
const THUMB_EDGE_PX = 400;

export interface PreparedImage {
  display: { bytes: Buffer; widthPx: number; heightPx: number };
  thumb: { bytes: Buffer };
  detectedType: string;
}

/**
 * Checks an upload by its bytes (never its name or declared type), then re-encodes it as JPEG:
 * turned upright from its EXIF orientation, resized, with every metadata block (EXIF, GPS, XMP)
 * left out. The original is never stored.
 */
export async function prepareImage(bytes: Buffer): Promise<PreparedImage> {
  if (bytes.length === 0) throw new AppError("bad_request:photo", "The file is empty.");
  if (bytes.length > MAX_UPLOAD_BYTES)
    throw new AppError(
      "payload_too_large:photo",
      "That photo is larger than 15 MB. Take it again at a lower size.",
    );
  const detected = await fileTypeFromBuffer(bytes);
  if (!detected || !(ACCEPTED_IMAGE_TYPES as readonly string[]).includes(detected.mime)) {
    throw new AppError(
      "unsupported_media_type:photo",
      `That file is not a photo we accept${detected ? ` (it is ${detected.mime})` : ""}. Send a JPEG, PNG, WebP or HEIC picture.`,
    );
  }
  try {
    const base = sharp(bytes, { failOn: "error", limitInputPixels: 80_000_000 }).rotate();
    const { data: displayBytes, info: displaySize } = await base
      .clone()
      .resize({ width: DISPLAY_EDGE_PX, height: DISPLAY_EDGE_PX, fit: "inside", withoutEnlargement: true })
      .jpeg({ quality: 82, mozjpeg: true })
      .toBuffer({ resolveWithObject: true });
    const thumb = await base
      .clone()
      .resize({ width: THUMB_EDGE_PX, height: THUMB_EDGE_PX, fit: "inside", withoutEnlargement: true })
      .jpeg({ quality: 75 })
      .toBuffer();
    return {
      display: { bytes: displayBytes, widthPx: displaySize.width, heightPx: displaySize.height },
      thumb: { bytes: thumb },
      detectedType: detected.mime,
    };
  } catch {
    throw new AppError(
      "unsupported_media_type:photo",
      "That picture could not be read. It may be damaged; try another.",
    );
  }
}
