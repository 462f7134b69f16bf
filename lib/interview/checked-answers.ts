import { z } from "zod/mini";
import { interviewAnswersObjectSchema } from "./answers";
import { crossCheck } from "./cross-checks";

/** The whole interview record: every group on its own, then the checks that need more than one group. */
export const interviewAnswersSchema = interviewAnswersObjectSchema.check(
  z.superRefine((answers, ctx) => {
    for (const [group, issues] of Object.entries(crossCheck(answers))) {
      for (const issue of issues)
        ctx.addIssue({ code: "custom", path: [group, issue.field], message: issue.message });
    }
  }),
);
