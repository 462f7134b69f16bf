import type { SnapshotFrom } from "xstate";
import type { DiagnosisInput } from "@/lib/diagnosis";
import { cautionIdsFor, type CautionRef } from "@/lib/interview/caution-ids";
import { progressFor, type ProgressEntry } from "@/lib/interview/progress";
import type { SavedInterview } from "@/lib/interview/saved";
import { groupForStep, isOptionalGroup, type GroupId, type StepId } from "@/lib/interview/steps";
import { diagnosisInputFor } from "@/lib/interview/to-diagnosis-input";
import type { AnswerIssue } from "@/lib/interview/validate";
import type { InterviewContext } from "./interview-context";
import type { interviewMachine } from "./interview";

export type InterviewSnapshot = SnapshotFrom<typeof interviewMachine>;
export type { SavedInterview };

/** Everything a screen needs to draw the interview at this moment. */
export interface InterviewView {
  step: StepId;
  /** The answer group this step asks; null on findings. */
  group: GroupId | null;
  progress: ProgressEntry[];
  /** The cautions in force, by catalogue id: their words come rendered from the server. */
  cautions: CautionRef[];
  canGoNext: boolean;
  canGoBack: boolean;
  canSkip: boolean;
  errors: Partial<Record<GroupId, AnswerIssue[]>>;
  drafts: Partial<Record<GroupId, unknown>>;
  skipped: GroupId[];
  /** The engine's input from the answers on the current route; null until refrigerant, device and ambient are known. */
  diagnosisInput: DiagnosisInput | null;
  canComputeFindings: boolean;
}

export function viewOf(snapshot: InterviewSnapshot): InterviewView {
  const context = snapshot.context;
  const step = context.step;
  const group = groupForStep[step];
  const diagnosisInput = diagnosisInputFor(context.answers, context.shop);
  return {
    step,
    group,
    progress: progressFor(context, step, context.visited),
    cautions: cautionIdsFor(context.answers, { shop: context.shop, step }).map((id) => ({ id })),
    canGoNext: snapshot.can({ type: "NEXT" }),
    canGoBack: snapshot.can({ type: "BACK" }),
    canSkip: group !== null && isOptionalGroup(group),
    errors: context.errors,
    drafts: context.drafts,
    skipped: context.skipped,
    diagnosisInput,
    canComputeFindings: diagnosisInput !== null,
  };
}

/** The interview as autosave stores it (see savedInterviewSchema). */
export function savedInterviewOf(context: InterviewContext): SavedInterview {
  const { answers, drafts, skipped, visited, step } = context;
  return { answers, drafts, skipped, visited, step };
}
