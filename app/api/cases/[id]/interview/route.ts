import { handler } from "@/lib/server/handler";
import { saveInterview } from "@/lib/server/cases";
import { caseParamsSchema } from "@/lib/contracts/cases";
import { interviewSaveSchema } from "@/lib/contracts/interview";

/** Autosave: the whole interview record, guarded by the version the client last saw. */
export const PUT = handler(
  { permission: "cases:write", params: caseParamsSchema, body: interviewSaveSchema },
  async ({ user, params, body }) => saveInterview({ user, caseId: params.id, input: body }),
);
