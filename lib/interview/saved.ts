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
 * For the autosave route. Answers must be valid (the machine only stores valid ones); drafts are
 * whatever was typed, kept so nothing is lost. The shop's altitude is checked again when the machine starts.
 */
export const savedInterviewSchema = z.object({
  answers: interviewAnswersSchema,
  drafts: z.partialRecord(z.enum(groupIds), z.unknown()),
  skipped: z.array(z.enum(groupIds)).max(groupIds.length),
  visited: z.array(z.enum(stepIds)).max(stepIds.length),
  step: z.enum(stepIds),
}) satisfies z.ZodType<SavedInterview>;
