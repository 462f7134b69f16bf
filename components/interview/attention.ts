import { sayInUnits, type ReaderUnits } from "@/lib/units";
import { STEP_LABELS, type GroupId } from "@/lib/interview/steps";
import type { AnswerIssue } from "@/lib/interview/validate";
import { GROUP_FIELDS } from "./group-fields";

/** An answer the save line names: one that needs fixing, or one typed but not yet taken as the answer. */
export interface AttentionItem {
  group: GroupId;
  label: string;
  /** The problem in the reader's units; absent when the value is fine but still being typed. */
  message?: string;
}

function labelOf(group: GroupId, field: string): string {
  return GROUP_FIELDS[group]?.find((f) => f.name === field)?.label ?? STEP_LABELS[group];
}

/**
 * What the save line must name instead of "all answers saved": each group whose draft has a problem
 * (its last valid answer is kept), then each group typed but not yet taken as the answer.
 */
export function attentionOf(
  context: {
    answers: Partial<Record<GroupId, unknown>>;
    drafts: Partial<Record<GroupId, unknown>>;
    errors: Partial<Record<GroupId, AnswerIssue[]>>;
    skipped: GroupId[];
  },
  units: ReaderUnits,
): AttentionItem[] {
  const items: AttentionItem[] = [];
  for (const [group, issues] of Object.entries(context.errors) as [GroupId, AnswerIssue[] | undefined][]) {
    if (context.skipped.includes(group)) continue;
    for (const issue of issues ?? [])
      items.push({ group, label: labelOf(group, issue.field), message: sayInUnits(issue.message, units) });
  }
  for (const group of Object.keys(context.drafts) as GroupId[]) {
    if (context.skipped.includes(group) || (context.errors[group]?.length ?? 0) > 0) continue;
    const draft = context.drafts[group] as Record<string, unknown> | undefined;
    const answer = (context.answers[group] ?? {}) as Record<string, unknown>;
    const changed = Object.keys({ ...draft, ...answer }).filter(
      (field) => JSON.stringify(draft?.[field]) !== JSON.stringify(answer[field]),
    );
    if (changed.length > 0) items.push({ group, label: labelOf(group, changed[0]!) });
  }
  return items;
}
