import { caseIdParamsSchema } from "@/lib/contracts/owner-summary";
import { handler } from "@/lib/server/handler";
import { listAttachments, uploadAttachment } from "@/lib/server/attachments";
import { loadCaseForOwner } from "@/lib/server/owner-case";
import { readPhotoUpload } from "@/lib/server/upload-body";

export const GET = handler(
  { permission: "cases:read", params: caseIdParamsSchema },
  async ({ user, params }) => {
    await loadCaseForOwner({ user, caseId: params.id });
    return { attachments: await listAttachments({ shopId: user.shopId, caseId: params.id }) };
  },
);

/** A photo as multipart/form-data: `file`, and optional `kind`, `caption`, `shareable`. */
export const POST = handler(
  { permission: "cases:write", params: caseIdParamsSchema },
  async ({ user, params, req, responseHeaders }) => {
    await loadCaseForOwner({ user, caseId: params.id, forChange: true });
    const { bytes, fields } = await readPhotoUpload(req);
    const { attachment, timings } = await uploadAttachment({ user, caseId: params.id, bytes, fields });
    responseHeaders.set(
      "Server-Timing",
      `resize;dur=${timings.checkAndResizeMs.toFixed(1)}, store;dur=${timings.storeMs.toFixed(1)}`,
    );
    return { attachment };
  },
);
