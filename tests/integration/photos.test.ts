import { NextRequest } from "next/server";
import sharp from "sharp";
import { afterAll, describe, expect, it } from "vitest";
import { MAX_UPLOAD_BYTES } from "@/lib/contracts/attachments";
import { closeSequelize } from "@/lib/db/sequelize";
import { AppError } from "@/lib/errors";
import { listAttachments, readAttachment, readSharedPhoto, uploadAttachment } from "@/lib/server/attachments";
import { createShareLink } from "@/lib/server/share-links";
import { readPhotoUpload } from "@/lib/server/upload-body";
import { getModels } from "@/models";
import "./helpers";
import { cameraJpeg, createSharedCase, screenshotPng } from "./owner-fixtures";

afterAll(() => closeSequelize());

async function refusal(promise: Promise<unknown>): Promise<AppError> {
  const error = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
}

function multipart(file: Blob, name: string, fields: Record<string, string> = {}) {
  const form = new FormData();
  form.set("file", file, name);
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  return new NextRequest("http://127.0.0.1/api/cases/1/attachments", { method: "POST", body: form });
}

describe("photos on a case", () => {
  it("accepts a real camera JPEG: resized, re-encoded, with its GPS and camera data gone", async () => {
    const { user, serviceCase } = await createSharedCase(getModels());
    const original = await cameraJpeg();
    expect((await sharp(original).metadata()).exif).toBeDefined();
    const { bytes, fields } = await readPhotoUpload(
      multipart(new Blob([new Uint8Array(original)], { type: "image/jpeg" }), "IMG_0001.JPG", {
        kind: "gauges",
        caption: "High side at idle",
        shareable: "true",
      }),
    );
    const { attachment, timings } = await uploadAttachment({ user, caseId: serviceCase.id, bytes, fields });
    console.log(
      `upload of a ${(original.length / 1e6).toFixed(2)} MB 3000×2000 JPEG: check+resize ${timings.checkAndResizeMs.toFixed(0)} ms, store ${timings.storeMs.toFixed(0)} ms`,
    );
    expect(attachment).toMatchObject({
      kind: "gauges",
      caption: "High side at idle",
      shareable: true,
      widthPx: 1600,
      heightPx: 1067,
    });
    const stored = await readAttachment({
      shopId: user.shopId,
      caseId: serviceCase.id,
      attachmentId: attachment.id,
      size: "display",
    });
    const meta = await sharp(stored).metadata();
    expect(meta.format).toBe("jpeg");
    expect(meta.exif).toBeUndefined();
    expect(stored.includes(Buffer.from("FixturePhone"))).toBe(false);
    const thumb = await readAttachment({
      shopId: user.shopId,
      caseId: serviceCase.id,
      attachmentId: attachment.id,
      size: "thumb",
    });
    expect((await sharp(thumb).metadata()).width).toBe(400);
  });

  it("accepts a PNG and stores it as JPEG", async () => {
    const { user, serviceCase } = await createSharedCase(getModels());
    const { attachment } = await uploadAttachment({
      user,
      caseId: serviceCase.id,
      bytes: await screenshotPng(),
      fields: {},
    });
    expect(attachment).toMatchObject({
      contentType: "image/jpeg",
      widthPx: 800,
      heightPx: 600,
      shareable: false,
    });
    expect(await listAttachments({ shopId: user.shopId, caseId: serviceCase.id })).toHaveLength(1);
  });

  it("refuses a program renamed to .jpg, by its bytes", async () => {
    const { user, serviceCase } = await createSharedCase(getModels());
    // The first bytes of a Linux executable (ELF), whatever the file is called.
    const elf = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]), Buffer.alloc(4096, 0x90)]);
    const { bytes, fields } = await readPhotoUpload(
      multipart(new Blob([new Uint8Array(elf)], { type: "image/jpeg" }), "gauges.jpg"),
    );
    const error = await refusal(uploadAttachment({ user, caseId: serviceCase.id, bytes, fields }));
    expect(error.status).toBe(415);
    expect(error.message).toMatch(/not a photo we accept/);
  });

  it("refuses an SVG carrying a script", async () => {
    const { user, serviceCase } = await createSharedCase(getModels());
    const svg = Buffer.from(
      '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(document.cookie)</script><rect width="10" height="10"/></svg>',
    );
    const error = await refusal(uploadAttachment({ user, caseId: serviceCase.id, bytes: svg, fields: {} }));
    expect(error.status).toBe(415);
    expect(error.message).toMatch(/not a photo we accept/);
    expect(await listAttachments({ shopId: user.shopId, caseId: serviceCase.id })).toHaveLength(0);
  });

  it("refuses a file over 15 MB, at the upload and again at the check", async () => {
    const { user, serviceCase } = await createSharedCase(getModels());
    const big = Buffer.alloc(MAX_UPLOAD_BYTES + 1, 0xff);
    const atUpload = await refusal(readPhotoUpload(multipart(new Blob([new Uint8Array(big)]), "huge.jpg")));
    expect(atUpload.status).toBe(413);
    expect(atUpload.message).toMatch(/larger than 15 MB/);
    const atCheck = await refusal(uploadAttachment({ user, caseId: serviceCase.id, bytes: big, fields: {} }));
    expect(atCheck.status).toBe(413);
  });

  it("refuses another shop's photo, to its users and through its owner link", async () => {
    const models = getModels();
    const mine = await createSharedCase(models);
    const theirs = await createSharedCase(models);
    const { attachment } = await uploadAttachment({
      user: theirs.user,
      caseId: theirs.serviceCase.id,
      bytes: await screenshotPng(),
      fields: { shareable: "true" },
    });
    const asOtherShop = await refusal(
      readAttachment({
        shopId: mine.user.shopId,
        caseId: theirs.serviceCase.id,
        attachmentId: attachment.id,
        size: "display",
      }),
    );
    expect(asOtherShop.status).toBe(404);
    expect(asOtherShop.message).toBe("No such photo on a case in this shop.");
    const wrongCase = await refusal(
      readAttachment({
        shopId: mine.user.shopId,
        caseId: mine.serviceCase.id,
        attachmentId: attachment.id,
        size: "display",
      }),
    );
    expect(wrongCase.status).toBe(404);
    // Uploading onto another shop's case is refused too.
    const upload = await refusal(
      uploadAttachment({
        user: mine.user,
        caseId: theirs.serviceCase.id,
        bytes: await screenshotPng(),
        fields: {},
      }),
    );
    expect(upload.status).toBe(404);
    // Through my own case's owner link, their photo is not there.
    const link = await createShareLink({ user: mine.user, caseId: mine.serviceCase.id, expiresInDays: 1 });
    const viaLink = await refusal(
      readSharedPhoto({ token: link.token, attachmentId: attachment.id, size: "display" }),
    );
    expect(viaLink.status).toBe(404);
  });

  it("shows the owner only photos marked shareable", async () => {
    const { user, serviceCase } = await createSharedCase(getModels());
    const shared = await uploadAttachment({
      user,
      caseId: serviceCase.id,
      bytes: await screenshotPng(),
      fields: { shareable: "true" },
    });
    const internal = await uploadAttachment({
      user,
      caseId: serviceCase.id,
      bytes: await screenshotPng(),
      fields: {},
    });
    const link = await createShareLink({ user, caseId: serviceCase.id, expiresInDays: 1 });
    expect(
      (await readSharedPhoto({ token: link.token, attachmentId: shared.attachment.id, size: "thumb" }))
        .length,
    ).toBeGreaterThan(0);
    const hidden = await refusal(
      readSharedPhoto({ token: link.token, attachmentId: internal.attachment.id, size: "display" }),
    );
    expect(hidden.status).toBe(404);
  });
});
