import { z } from "zod";
import { CONCLUSION_REASON_IDS } from "@/lib/cases/conclusion";
import { boundedJson } from "./json-body";
import { multiLineText, singleLineText } from "./text";
import { groupIds, stepIds } from "@/lib/interview/steps";
import { CAUSE_IDS } from "@/lib/diagnosis";

// Drafts hold what was typed but is not yet valid; bounded so a buggy client cannot fill the row.
const MAX_RECORD_CHARS = 64_000;
/** A group's draft is its form's values as typed: a few levels (a list of readings) at most. */
const draftValue = boundedJson({ maxDepth: 6, maxChars: 16_000 });

export const interviewSaveSchema = z
  .object({
    baseVersion: z.number().int().positive(),
    step: z.enum(stepIds, { message: "Unknown interview step." }),
    answers: z.partialRecord(z.enum(groupIds), z.unknown()),
    drafts: z.partialRecord(z.enum(groupIds), draftValue).default({}),
    skipped: z.array(z.enum(groupIds)).max(groupIds.length).default([]),
    visited: z
      .array(z.enum(stepIds))
      .max(stepIds.length * 4)
      .default([]),
  })
  .refine((v) => JSON.stringify(v).length <= MAX_RECORD_CHARS, {
    message: "The interview record is too large to save.",
  });
export type InterviewSaveInput = z.infer<typeof interviewSaveSchema>;

/** PUT /api/cases/[id]/interview: the case's new version and the groups kept as drafts. */
export interface InterviewSaveResponse {
  version: number;
  draftGroups: string[];
}

export const caseSubmitSchema = z.object({
  baseVersion: z.number().int().positive(),
  engineVersion: singleLineText().min(1).max(64),
  conclusionCause: z.enum(CAUSE_IDS, { message: "Choose the cause you concluded." }),
  /** Optional for a technician or senior; an apprentice gives reasons or words (lib/cases/conclusion.ts). */
  conclusionNotes: multiLineText().trim().max(4000, "Keep it under 4000 characters.").default(""),
  conclusionReasons: z
    .array(z.enum(CONCLUSION_REASON_IDS, { message: "Unknown reason." }))
    .max(CONCLUSION_REASON_IDS.length)
    .default([]),
});
export type CaseSubmitInput = z.infer<typeof caseSubmitSchema>;
