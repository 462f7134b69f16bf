import type { InterviewAnswers } from "./answers";
import type { ShopSettings } from "./engine-input";
import { crossCheck } from "./cross-checks";
import type { AnswerIssue } from "./issues";
import { groupIds, type GroupId } from "./steps";

/** One question group checked on its own: the zod schemas on the server, their plain twin on the phone. */
export type GroupCheck =
  { ok: true; value: NonNullable<InterviewAnswers[GroupId]> } | { ok: false; issues: AnswerIssue[] };
export type CheckGroupValues = (group: GroupId, values: unknown) => GroupCheck;

export interface SortedAnswers {
  answers: InterviewAnswers;
  drafts: Partial<Record<GroupId, unknown>>;
  errors: Partial<Record<GroupId, AnswerIssue[]>>;
}

/** validateGroup and sortSavedAnswers (validate.ts, validate-plain.ts) around one way to check a group. */
export function answerSorting(checkGroup: CheckGroupValues) {
  /** Validates one group, and checks it against the other answers where a check needs both. */
  function validateGroup(
    group: GroupId,
    values: unknown,
    others: InterviewAnswers = {},
    shop?: ShopSettings,
  ): GroupCheck {
    const result = checkGroup(group, values);
    if (!result.ok) return result;
    const issues = crossCheck({ ...others, [group]: result.value }, shop)[group] ?? [];
    return issues.length === 0 ? result : { ok: false, issues };
  }

  /** Splits saved answers group by group: valid groups are answers, the rest are kept as drafts with their issues. */
  function sortSavedAnswers(saved: unknown, shop?: ShopSettings): SortedAnswers {
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

  return { validateGroup, sortSavedAnswers };
}
