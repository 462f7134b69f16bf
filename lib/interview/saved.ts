import { z } from "zod";
import type { InterviewAnswers } from "./answers";
import { interviewAnswersSchema } from "./checked-answers";
import { groupIds, stepIds, type GroupId, type StepId } from "./steps";

/** What autosave stores with the case; passed back as the machine's input, it resumes the interview where it was left. */
export interface SavedInterview {
  answers: InterviewAnswers;
  drafts: Partial<Record<GroupId, unknown>>;
  skipped: GroupId[];
  visited: StepId[];
  step: StepId;
}

/**
 * A saved interview as the machine resumes from it, checked strictly: answers must be valid (the
 * machine only stores valid ones); drafts are whatever was typed, kept so nothing is lost. The shop's
 * altitude is checked again when the machine starts. This is not the autosave route's schema: the
 * route validates with `interviewSaveSchema` (lib/contracts/interview.ts), which takes any answers so
 * the server can keep a group that fails as a draft; the server then stores answers, drafts, skipped
 * and visited in the case's `answers` column and the step in `interviewStep`.
 */
export const savedInterviewSchema = z.object({
  answers: interviewAnswersSchema,
  drafts: z.partialRecord(z.enum(groupIds), z.unknown()),
  skipped: z.array(z.enum(groupIds)).max(groupIds.length),
  visited: z.array(z.enum(stepIds)).max(stepIds.length),
  step: z.enum(stepIds),
}) satisfies z.ZodType<SavedInterview>;
