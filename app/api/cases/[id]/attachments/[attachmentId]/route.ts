import { attachmentParamsSchema, attachmentPatchSchema, photoQuerySchema } from "@/lib/contracts/attachments";
import { handler } from "@/lib/server/handler";
import { deleteAttachment, readAttachment, updateAttachment } from "@/lib/server/attachments";

/** The re-encoded image, for users of the case's shop only. */
export const GET = handler(
  { permission: "cases:read", params: attachmentParamsSchema, query: photoQuerySchema },
  async ({ user, params, query }) => {
    const bytes = await readAttachment({
      shopId: user.shopId,
      caseId: params.id,
      attachmentId: params.attachmentId,
      size: query.size,
    });
    return new Response(new Uint8Array(bytes), {
      headers: {
        "content-type": "image/jpeg",
        "cache-control": "private, max-age=300",
        "x-content-type-options": "nosniff",
      },
    });
  },
);

export const PATCH = handler(
  { permission: "cases:write", params: attachmentParamsSchema, body: attachmentPatchSchema },
  async ({ user, params, body }) => ({
    attachment: await updateAttachment({
      user,
      caseId: params.id,
      attachmentId: params.attachmentId,
      input: body,
    }),
  }),
);

export const DELETE = handler(
  { permission: "cases:write", params: attachmentParamsSchema },
  async ({ user, params }) =>
    deleteAttachment({ user, caseId: params.id, attachmentId: params.attachmentId }),
);
