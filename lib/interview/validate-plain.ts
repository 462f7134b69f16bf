import { checkGroupValues } from "./group-checks";
import { answerSorting } from "./sort-answers";

export type { AnswerIssue } from "./issues";
export type { GroupCheck, SortedAnswers } from "./sort-answers";

/**
 * validateGroup and sortSavedAnswers for the phone: the same verdicts and messages as validate.ts
 * (group-checks.test.ts holds them equal) without the schema library. The server keeps validate.ts.
 */
export const { validateGroup, sortSavedAnswers } = answerSorting(checkGroupValues);
