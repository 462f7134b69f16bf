import type { InterviewAnswers } from "@/lib/interview/answers";
import { crossCheck } from "@/lib/interview/cross-checks";
import { groupForStep, isGroupId, isOptionalGroup, type GroupId, type StepId } from "@/lib/interview/steps";
import { validateGroup } from "@/lib/interview/validate";
import type { InterviewContext } from "./interview-context";

/* Small pure reducers: each takes the context and returns the fields it changes. */

type Changes = Partial<InterviewContext>;

function without<T extends object>(record: T, key: PropertyKey): T {
  const copy = { ...record };
  delete (copy as Record<PropertyKey, unknown>)[key];
  return copy;
}

/** Stores valid values as the group's answer; invalid ones become the draft and the last valid answer stays. */
export function applyAnswer(context: InterviewContext, group: unknown, values: unknown): Changes {
  if (!isGroupId(group)) return {};
  const check = validateGroup(group, values, without(context.answers, group), context.shop);
  if (!check.ok) {
    return {
      drafts: { ...context.drafts, [group]: values },
      errors: { ...context.errors, [group]: check.issues },
    };
  }
  const answers: InterviewAnswers = { ...context.answers, [group]: check.value };
  const changes: Required<Pick<Changes, "answers" | "drafts" | "errors" | "skipped">> = {
    answers,
    drafts: without(context.drafts, group),
    errors: without(context.errors, group),
    skipped: context.skipped.filter((g) => g !== group),
  };
  // A changed refrigerant, label charge or altitude can make another group's stored answer impossible: keep it as a draft to fix.
  for (const [other, issues] of Object.entries(crossCheck(answers, context.shop)) as [
    GroupId,
    NonNullable<Changes["errors"]>[GroupId],
  ][]) {
    if (other === group || issues === undefined) continue;
    changes.drafts = { ...changes.drafts, [other]: changes.answers[other] };
    changes.errors = { ...changes.errors, [other]: issues };
    changes.answers = without(changes.answers, other);
  }
  return changes;
}

/**
 * Keeps what is being typed as the group's draft, with its messages, and leaves the saved answer
 * alone: "9" on the way to "95" must never replace the last answer. ANSWER (on leaving a field, on
 * Next, or after a pause) is what turns a valid draft into the answer.
 */
export function applyTyping(context: InterviewContext, group: unknown, values: unknown): Changes {
  if (!isGroupId(group)) return {};
  const check = validateGroup(group, values, without(context.answers, group), context.shop);
  return {
    drafts: { ...context.drafts, [group]: values },
    errors: check.ok ? without(context.errors, group) : { ...context.errors, [group]: check.issues },
  };
}

/** Marks the step's group as skipped; anything typed is kept as a draft so it is not lost. */
export function applySkip(context: InterviewContext): Changes {
  const group = groupForStep[context.step];
  if (group === null || !isOptionalGroup(group)) return {};
  const typed = context.drafts[group] ?? context.answers[group];
  return {
    skipped: context.skipped.includes(group) ? context.skipped : [...context.skipped, group],
    answers: without(context.answers, group),
    drafts: typed === undefined ? context.drafts : { ...context.drafts, [group]: typed },
    errors: without(context.errors, group),
  };
}

export function applyEnterStep(context: InterviewContext, step: StepId): Changes {
  return { step, visited: context.visited.includes(step) ? context.visited : [...context.visited, step] };
}
