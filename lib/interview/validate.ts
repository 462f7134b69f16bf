import type { $ZodError } from "zod/v4/core";
import { answerSchemas, type InterviewAnswers } from "./answers";
import type { ShopSettings } from "./branches";
import { crossCheck } from "./cross-checks";
import type { AnswerIssue } from "./issues";
import { groupIds, type GroupId } from "./steps";

export type { AnswerIssue };

export type GroupCheck =
  { ok: true; value: NonNullable<InterviewAnswers[GroupId]> } | { ok: false; issues: AnswerIssue[] };

function toIssues(error: $ZodError): AnswerIssue[] {
  return error.issues.map((issue) => ({ field: issue.path.map(String).join("."), message: issue.message }));
}

/** Validates one group, and checks it against the other answers where a check needs both. */
export function validateGroup(
  group: GroupId,
  values: unknown,
  others: InterviewAnswers = {},
  shop?: ShopSettings,
): GroupCheck {
  const result = answerSchemas[group].safeParse(values);
  if (!result.success) return { ok: false, issues: toIssues(result.error) };
  const issues = crossCheck({ ...others, [group]: result.data }, shop)[group] ?? [];
  return issues.length === 0
    ? { ok: true, value: result.data as NonNullable<InterviewAnswers[GroupId]> }
    : { ok: false, issues };
}

export interface SortedAnswers {
  answers: InterviewAnswers;
  drafts: Partial<Record<GroupId, unknown>>;
  errors: Partial<Record<GroupId, AnswerIssue[]>>;
}

/** Splits saved answers group by group: valid groups are answers, the rest are kept as drafts with their issues. */
export function sortSavedAnswers(saved: unknown, shop?: ShopSettings): SortedAnswers {
  const sorted: SortedAnswers = { answers: {}, drafts: {}, errors: {} };
  if (typeof saved !== "object" || saved === null) return sorted;
  const record = saved as Record<string, unknown>;
  for (const group of groupIds) {
    if (record[group] === undefined) continue;
    const check = validateGroup(group, record[group], sorted.answers, shop);
    if (check.ok) {
      (sorted.answers as Record<GroupId, unknown>)[group] = check.value;
    } else {
      sorted.drafts[group] = record[group];
      sorted.errors[group] = check.issues;
    }
  }
  return sorted;
}
