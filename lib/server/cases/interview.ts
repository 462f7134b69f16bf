import "server-only";
import type { Transaction } from "sequelize";
import type { User } from "lucia";
import { getModels, type JsonObject, type JsonValue } from "@/models";
import { AppError } from "@/lib/errors";
import { sortSavedAnswers } from "@/lib/interview/validate";
import { diagnosisInputFor } from "@/lib/interview/to-diagnosis-input";
import { diagnose } from "@/lib/diagnosis";
import { conclusionWritersWith, statusAfterSubmit } from "@/lib/cases/rules";
import { conclusionNotesFrom, conclusionProblem } from "@/lib/cases/conclusion";
import { endSentence, formatShopTime } from "@/lib/units/clock";
import type { CaseSubmitResult } from "@/lib/contracts/case-submit";
import type { CaseSubmitInput, InterviewSaveInput, InterviewSaveResponse } from "@/lib/contracts/interview";
import { updateCaseAtVersion, type CaseChanges } from "@/lib/db/versioned-update";
import { recordAudit } from "../audit";
import { getShop, type ShopSummary } from "../shops";
import { caseForAction, conclusionWritersOf } from "./load";
import { refreshCasebookEntry } from "../casebook/refresh";
import { interviewRecordWithFigures, saveInterviewFigures } from "../case-figures";

/**
 * Applies the change only at the version the client last saw; otherwise says plainly what happened,
 * with the time of the other change on the shop's clock. The case row is locked by the caller.
 */
async function updateIfVersion({
  row,
  shop,
  baseVersion,
  values,
  transaction,
}: {
  row: { id: number; shopId: number; version: number; updatedAt: Date };
  shop: ShopSummary;
  baseVersion: number;
  values: CaseChanges;
  transaction: Transaction;
}) {
  const version =
    row.version === baseVersion
      ? await updateCaseAtVersion({
          shopId: row.shopId,
          caseId: row.id,
          expectedVersion: baseVersion,
          changes: values,
          transaction,
        })
      : null;
  if (version !== null) return version;
  throw new AppError(
    "conflict:case",
    `This case was changed on another screen at ${endSentence(formatShopTime(row.updatedAt, shop))} Reload to see those answers; what you typed here is kept on this device.`,
  );
}

export async function saveInterview({
  user,
  caseId,
  input,
}: {
  user: User;
  caseId: number;
  input: InterviewSaveInput;
}): Promise<InterviewSaveResponse> {
  const shop = await getShop({ shopId: user.shopId });
  return getModels().sequelize.transaction(async (transaction) => {
    const row = await caseForAction({ user, caseId, action: "edit", transaction });
    // Nothing typed is lost: a group that fails validation is stored as a draft, not refused.
    const settings = { altitudeM: shop.altitudeM };
    const sorted = sortSavedAnswers(input.answers, settings);
    const drafts = { ...input.drafts, ...sorted.drafts };
    // A stale screen is refused here, before any figure is written elsewhere.
    if (row.version !== input.baseVersion)
      await updateIfVersion({ row, shop, baseVersion: input.baseVersion, transaction, values: {} });
    // Each figure typed here is written where it lives (lib/server/case-figures/); the answers keep
    // only those that live in them.
    const answers = await saveInterviewFigures({ user, caseRow: row, answers: sorted.answers, transaction });
    const version = await updateIfVersion({
      row,
      shop,
      baseVersion: input.baseVersion,
      transaction,
      values: {
        interviewStep: input.step,
        answers: {
          answers,
          drafts,
          skipped: input.skipped,
          visited: input.visited,
        } as unknown as JsonObject,
        symptomTags: sorted.answers.behaviour?.symptoms ?? [],
        conclusionWriterIds: conclusionWritersWith(conclusionWritersOf(row), user.id),
      },
    });
    return { version, draftGroups: Object.keys(sorted.drafts) };
  });
}

export async function submitCase({
  user,
  caseId,
  input,
}: {
  user: User;
  caseId: number;
  input: CaseSubmitInput;
}): Promise<CaseSubmitResult> {
  const shop = await getShop({ shopId: user.shopId });
  const { sequelize, User: UserModel } = getModels();
  return sequelize.transaction(async (transaction) => {
    const row = await caseForAction({ user, caseId, action: "submit", transaction });
    // With the figures from where they live (the vehicle's label, the service record's masses).
    const record = (await interviewRecordWithFigures({
      shopId: user.shopId,
      caseId,
      vehicleId: row.vehicleId ?? null,
      interviewRecord: row.answers,
      transaction,
    })) as { answers?: unknown };
    const settings = { altitudeM: shop.altitudeM };
    const { answers } = sortSavedAnswers(record.answers, settings);
    // The same route-filtered input the findings screen used, so the stored snapshot matches what was shown
    // whenever both ran the same engine.
    const diagnosisInput = diagnosisInputFor(answers, settings);
    if (!diagnosisInput)
      throw new AppError("bad_request:case", "Answer the system and conditions steps before submitting.");
    // Always the server's engine: a screen left open across an update may hold findings from an older one.
    // The technician's conclusion stands either way; the response says when the findings differ.
    const findings = diagnose(diagnosisInput);
    const findingsChanged = input.engineVersion !== findings.engineVersion;
    const technician = await UserModel.findOne({
      where: { id: row.technicianId, shopId: user.shopId },
      attributes: ["role"],
      raw: true,
      transaction,
    });
    const status = statusAfterSubmit(technician?.role ?? null);
    const problem = conclusionProblem({
      needsReason: status === "awaiting_signoff",
      reasons: input.conclusionReasons,
      words: input.conclusionNotes,
    });
    if (problem)
      throw new AppError("bad_request:case", problem, { fieldErrors: { conclusionNotes: [problem] } });
    const version = await updateIfVersion({
      row,
      shop,
      baseVersion: input.baseVersion,
      transaction,
      values: {
        status,
        findings: { input: diagnosisInput, ...findings } as unknown as JsonValue,
        engineVersion: findings.engineVersion,
        conclusionCause: input.conclusionCause,
        conclusionNotes: conclusionNotesFrom(input.conclusionReasons, input.conclusionNotes),
        submittedAt: new Date(),
        conclusionWriterIds: conclusionWritersWith(conclusionWritersOf(row), user.id),
      },
    });
    // Findings, leading suspect, symptoms and readings for the casebook and similar cases.
    await refreshCasebookEntry({ shopId: user.shopId, caseId, transaction });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "case",
      entityId: caseId,
      action: "submit",
      detail: {
        status,
        conclusionCause: input.conclusionCause,
        conclusionReasons: input.conclusionReasons,
        engineVersion: findings.engineVersion,
        ...(findingsChanged ? { screenEngineVersion: input.engineVersion } : {}),
      },
      transaction,
    });
    return findingsChanged
      ? { version, status, findingsChanged: true, findings }
      : { version, status, findingsChanged: false };
  });
}
