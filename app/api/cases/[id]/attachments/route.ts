import { caseIdParamsSchema } from "@/lib/contracts/owner-summary";
import { handler } from "@/lib/server/handler";
import { addCasePhoto, caseAttachments } from "@/lib/server/cases";

export const GET = handler(
  { permission: "cases:read", params: caseIdParamsSchema },
  async ({ user, params }) => caseAttachments({ user, caseId: params.id }),
);

/** A photo as multipart/form-data: `file`, and optional `kind`, `caption`, `shareable`. */
export const POST = handler(
  { permission: "cases:write", params: caseIdParamsSchema },
  async ({ user, params, req, responseHeaders }) => {
    const { attachment, timings } = await addCasePhoto({ user, caseId: params.id, req });
    responseHeaders.set(
      "Server-Timing",
      `resize;dur=${timings.checkAndResizeMs.toFixed(1)}, store;dur=${timings.storeMs.toFixed(1)}`,
    );
    return { attachment };
  },
);
