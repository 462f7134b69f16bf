import type { $ZodError } from "zod/v4/core";
import { answerSchemas, type InterviewAnswers } from "./answers";
import type { AnswerIssue } from "./issues";
import { answerSorting, type GroupCheck } from "./sort-answers";
import type { GroupId } from "./steps";

export type { AnswerIssue };
export type { GroupCheck, SortedAnswers } from "./sort-answers";

function toIssues(error: $ZodError): AnswerIssue[] {
  return error.issues.map((issue) => ({ field: issue.path.map(String).join("."), message: issue.message }));
}

/** One group through its zod schema: the server's judge (the phone runs group-checks.ts, validate-plain.ts). */
export function parseGroupValues(group: GroupId, values: unknown): GroupCheck {
  const result = answerSchemas[group].safeParse(values);
  return result.success
    ? { ok: true, value: result.data as NonNullable<InterviewAnswers[GroupId]> }
    : { ok: false, issues: toIssues(result.error) };
}

export const { validateGroup, sortSavedAnswers } = answerSorting(parseGroupValues);
