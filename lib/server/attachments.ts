import "server-only";
import { randomUUID } from "node:crypto";
import type { User } from "lucia";
import {
  attachmentPatchSchema,
  attachmentUploadFieldsSchema,
  type AttachmentPatchInput,
  type AttachmentView,
} from "@/lib/contracts/attachments";
import { AppError } from "@/lib/errors";
import { prepareImage } from "@/lib/storage/images";
import { deleteObject, ensureBucket, getObject, putObject } from "@/lib/storage/s3";
import { getModels, type Attachment } from "@/models";
import { recordAudit } from "./audit";
import { loadCaseForOwner } from "./owner-case";
import { resolveShareToken } from "./share-links";

function toView(a: Attachment & { uploader?: { name: string } | null }): AttachmentView {
  return {
    id: a.id,
    kind: a.kind,
    caption: a.caption,
    shareable: Boolean(a.shareable),
    contentType: a.contentType,
    sizeBytes: a.sizeBytes,
    widthPx: a.widthPx,
    heightPx: a.heightPx,
    uploadedBy: a.uploader?.name ?? "",
    createdAt: new Date(a.createdAt).toISOString(),
  };
}

export interface UploadTimings {
  checkAndResizeMs: number;
  storeMs: number;
}

/** Checks, re-encodes and stores a photo on a case; returns its record and how long each part took. */
export async function uploadAttachment({
  user,
  caseId,
  bytes,
  fields,
}: {
  user: User;
  caseId: number;
  bytes: Buffer;
  fields: Record<string, unknown>;
}): Promise<{ attachment: AttachmentView; timings: UploadTimings }> {
  const parsed = attachmentUploadFieldsSchema.safeParse(fields);
  if (!parsed.success)
    throw new AppError("bad_request:photo", parsed.error.issues[0]?.message ?? "Some values need attention.");
  await loadCaseForOwner({ user, caseId, forChange: true });
  const started = performance.now();
  const image = await prepareImage(bytes);
  const prepared = performance.now();
  const base = `shop-${user.shopId}/case-${caseId}/${randomUUID()}`;
  const objectKey = `${base}.jpg`;
  const thumbKey = `${base}-thumb.jpg`;
  await ensureBucket();
  await putObject(objectKey, image.display.bytes, "image/jpeg");
  await putObject(thumbKey, image.thumb.bytes, "image/jpeg");
  const stored = performance.now();
  const { Attachment } = getModels();
  const row = await Attachment.create({
    shopId: user.shopId,
    caseId,
    kind: parsed.data.kind,
    caption: parsed.data.caption,
    shareable: parsed.data.shareable,
    objectKey,
    thumbKey,
    contentType: "image/jpeg",
    sizeBytes: image.display.bytes.length,
    widthPx: image.display.widthPx,
    heightPx: image.display.heightPx,
    uploadedBy: user.id,
  });
  await recordAudit({
    shopId: user.shopId,
    actorId: user.id,
    entity: "case",
    entityId: caseId,
    action: "photo_added",
    detail: { attachmentId: row.id, detectedType: image.detectedType, uploadBytes: bytes.length },
  });
  return {
    attachment: toView(Object.assign(row, { uploader: { name: user.name } })),
    timings: { checkAndResizeMs: prepared - started, storeMs: stored - prepared },
  };
}

export async function listAttachments({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<AttachmentView[]> {
  const { Attachment, User } = getModels();
  const rows = await Attachment.findAll({
    where: { shopId, caseId },
    include: [{ model: User, as: "uploader", attributes: ["name"] }],
    order: [["createdAt", "ASC"]],
  });
  return rows.map((row) => toView(row as Attachment & { uploader?: { name: string } }));
}

async function findAttachment({
  shopId,
  caseId,
  attachmentId,
}: {
  shopId: number;
  caseId: number;
  attachmentId: number;
}) {
  const row = await getModels().Attachment.findOne({ where: { id: attachmentId, caseId, shopId } });
  if (!row) throw new AppError("not_found:photo", "No such photo on a case in this shop.");
  return row;
}

/** The image bytes for a user of the case's shop; another shop's photo is a 404. */
export async function readAttachment({
  shopId,
  caseId,
  attachmentId,
  size,
}: {
  shopId: number;
  caseId: number;
  attachmentId: number;
  size: "display" | "thumb";
}): Promise<Buffer> {
  const row = await findAttachment({ shopId, caseId, attachmentId });
  return getObject(size === "thumb" ? row.thumbKey : row.objectKey);
}

export async function updateAttachment({
  user,
  caseId,
  attachmentId,
  input,
}: {
  user: User;
  caseId: number;
  attachmentId: number;
  input: AttachmentPatchInput;
}): Promise<AttachmentView> {
  const data = attachmentPatchSchema.parse(input);
  await loadCaseForOwner({ user, caseId, forChange: true });
  const row = await findAttachment({ shopId: user.shopId, caseId, attachmentId });
  await row.update(data);
  if (data.shareable !== undefined)
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "case",
      entityId: caseId,
      action: data.shareable ? "photo_shared" : "photo_unshared",
      detail: { attachmentId },
    });
  return toView(row);
}

export async function deleteAttachment({
  user,
  caseId,
  attachmentId,
}: {
  user: User;
  caseId: number;
  attachmentId: number;
}) {
  await loadCaseForOwner({ user, caseId, forChange: true });
  const row = await findAttachment({ shopId: user.shopId, caseId, attachmentId });
  await row.destroy();
  await Promise.allSettled([deleteObject(row.objectKey), deleteObject(row.thumbKey)]);
  await recordAudit({
    shopId: user.shopId,
    actorId: user.id,
    entity: "case",
    entityId: caseId,
    action: "photo_removed",
    detail: { attachmentId },
  });
  return { removed: true };
}

/** A shareable photo of the case a live link names; anything else is a 404. */
export async function readSharedPhoto({
  token,
  attachmentId,
  size,
}: {
  token: string;
  attachmentId: number;
  size: "display" | "thumb";
}): Promise<Buffer> {
  const link = await resolveShareToken(token);
  const row = await getModels().Attachment.findOne({
    where: { id: attachmentId, caseId: link.caseId, shopId: link.shopId, shareable: true },
  });
  if (!row) throw new AppError("not_found:photo", "No such photo on this page.");
  return getObject(size === "thumb" ? row.thumbKey : row.objectKey);
}
