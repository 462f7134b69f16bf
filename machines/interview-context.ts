import type { ShopSettings } from "@/lib/interview/branches";
import { furthestStep, availableSteps, type InterviewRecord } from "@/lib/interview/route";
import { isGroupId, isStepId, type GroupId, type StepId } from "@/lib/interview/steps";
import { sortSavedAnswers, validateGroup } from "@/lib/interview/validate";

export interface InterviewContext extends InterviewRecord {
  skipped: GroupId[];
  /**
   * What was typed but is not (or not yet) the answer: invalid values, values still being typed, or a
   * skipped group's values. A draft beside an answer is newer than it.
   */
  drafts: Partial<Record<GroupId, unknown>>;
  visited: StepId[];
  /** The step on screen; kept equal to the machine's state by each step's entry action. */
  step: StepId;
  /** Where a resumed interview opens: the saved step if it may still be opened, else the furthest one. */
  resumeStep: StepId;
}

export type InterviewEvent =
  | { type: "ANSWER"; group: GroupId; values: unknown }
  /** Values still being typed: kept as the draft, never as the answer. */
  | { type: "TYPE"; group: GroupId; values: unknown }
  | { type: "NEXT" }
  | { type: "BACK" }
  | { type: "SKIP" }
  | { type: "GOTO"; step: StepId };

/** A saved interview (from the case's autosave) or nothing for a new one. */
export interface InterviewInput {
  answers?: unknown;
  drafts?: Partial<Record<string, unknown>>;
  skipped?: readonly string[];
  visited?: readonly string[];
  step?: string;
  shop?: ShopSettings;
}

export function createInterviewContext(input: InterviewInput = {}): InterviewContext {
  const shop = input.shop ?? {};
  const { answers, drafts, errors } = sortSavedAnswers(input.answers, shop);
  const skipped = (input.skipped ?? []).filter(isGroupId).filter((group) => answers[group] === undefined);
  for (const [group, values] of Object.entries(input.drafts ?? {})) {
    if (!isGroupId(group) || drafts[group] !== undefined) continue;
    drafts[group] = values;
    if (skipped.includes(group)) continue;
    const check = validateGroup(group, values, answers, shop);
    if (!check.ok) errors[group] = check.issues;
  }
  const record = { answers, skipped, errors, shop };
  const available = availableSteps(record);
  const resumeStep =
    isStepId(input.step) && available.includes(input.step) ? input.step : furthestStep(record);
  const savedVisited = (input.visited ?? []).filter(isStepId);
  const visited = savedVisited.length > 0 ? savedVisited : available.slice(0, available.indexOf(resumeStep));
  return { ...record, drafts, visited, step: resumeStep, resumeStep };
}
