import "server-only";
import type { User } from "lucia";
import { getModels, type JsonObject, type JsonValue } from "@/models";
import { AppError } from "@/lib/errors";
import { sortSavedAnswers } from "@/lib/interview/validate";
import { diagnosisInputFor } from "@/lib/interview/to-diagnosis-input";
import { diagnose } from "@/lib/diagnosis";
import type { CaseSubmitResult } from "@/lib/contracts/case-submit";
import type { CaseSubmitInput, InterviewSaveInput, InterviewSaveResponse } from "@/lib/contracts/interview";
import { recordAudit } from "./audit";
import { caseIsEditable, mayChangeCase } from "@/lib/auth/case-access";
import { updateCaseAtVersion, type CaseChanges } from "@/lib/db/versioned-update";

/** Loads a case of the user's shop that this user may change, or throws 404/403/409. */
async function editableCase({ user, caseId }: { user: User; caseId: number }) {
  const { Case } = getModels();
  const row = await Case.findOne({ where: { id: caseId, shopId: user.shopId }, raw: true });
  if (!row) throw new AppError("not_found:case", "No such case in this shop.");
  if (!mayChangeCase(user, row)) {
    throw new AppError("forbidden:case", "Only the case's technician or a senior can change this case.");
  }
  if (!caseIsEditable(row)) {
    throw new AppError(
      "conflict:case",
      "This case has been submitted; a senior must send it back before it can change.",
    );
  }
  return row;
}

/** Applies the change only at the version the client last saw; otherwise says plainly what happened. */
async function updateIfVersion({
  caseId,
  shopId,
  baseVersion,
  values,
}: {
  caseId: number;
  shopId: number;
  baseVersion: number;
  values: CaseChanges;
}) {
  const version = await updateCaseAtVersion({
    shopId,
    caseId,
    expectedVersion: baseVersion,
    changes: values,
  });
  if (version !== null) return version;
  const current = await getModels().Case.findOne({
    where: { id: caseId, shopId },
    attributes: ["updatedAt"],
    raw: true,
  });
  throw new AppError(
    "conflict:case",
    `This case was changed on another screen${current ? ` at ${current.updatedAt.toISOString().slice(11, 16)} UTC` : ""}. Reload to see those answers; what you typed here is kept on this device.`,
  );
}

export async function saveInterview({
  user,
  caseId,
  input,
  shopAltitudeM,
}: {
  user: User;
  caseId: number;
  input: InterviewSaveInput;
  shopAltitudeM: number;
}): Promise<InterviewSaveResponse> {
  await editableCase({ user, caseId });
  // Nothing typed is lost: a group that fails validation is stored as a draft, not refused.
  const shop = { altitudeM: shopAltitudeM };
  const sorted = sortSavedAnswers(input.answers, shop);
  const drafts = { ...input.drafts, ...sorted.drafts };
  const version = await updateIfVersion({
    caseId,
    shopId: user.shopId,
    baseVersion: input.baseVersion,
    values: {
      interviewStep: input.step,
      answers: {
        answers: sorted.answers,
        drafts,
        skipped: input.skipped,
        visited: input.visited,
      } as unknown as JsonObject,
      symptomTags: sorted.answers.behaviour?.symptoms ?? [],
    },
  });
  return { version, draftGroups: Object.keys(sorted.drafts) };
}

export async function submitCase({
  user,
  caseId,
  input,
  shopAltitudeM,
}: {
  user: User;
  caseId: number;
  input: CaseSubmitInput;
  shopAltitudeM: number;
}): Promise<CaseSubmitResult> {
  const row = await editableCase({ user, caseId });
  const record = row.answers as { answers?: unknown };
  const shop = { altitudeM: shopAltitudeM };
  const { answers } = sortSavedAnswers(record.answers, shop);
  // The same route-filtered input the findings screen used, so the stored snapshot matches what was shown
  // whenever both ran the same engine.
  const diagnosisInput = diagnosisInputFor(answers, shop);
  if (!diagnosisInput)
    throw new AppError("bad_request:case", "Answer the system and conditions steps before submitting.");
  // Always the server's engine: a screen left open across an update may hold findings from an older one.
  // The technician's conclusion stands either way; the response says when the findings differ.
  const findings = diagnose(diagnosisInput);
  const findingsChanged = input.engineVersion !== findings.engineVersion;
  const technician = await getModels().User.findOne({
    where: { id: row.technicianId, shopId: user.shopId },
    attributes: ["role"],
    raw: true,
  });
  const status = technician?.role === "apprentice" ? "awaiting_signoff" : "signed_off";
  const version = await updateIfVersion({
    caseId,
    shopId: user.shopId,
    baseVersion: input.baseVersion,
    values: {
      status,
      findings: { input: diagnosisInput, ...findings } as unknown as JsonValue,
      engineVersion: findings.engineVersion,
      conclusionCause: input.conclusionCause,
      conclusionNotes: input.conclusionNotes,
      submittedAt: new Date(),
    },
  });
  await recordAudit({
    shopId: user.shopId,
    actorId: user.id,
    entity: "case",
    entityId: caseId,
    action: "submit",
    detail: {
      status,
      conclusionCause: input.conclusionCause,
      engineVersion: findings.engineVersion,
      ...(findingsChanged ? { screenEngineVersion: input.engineVersion } : {}),
    },
  });
  return findingsChanged
    ? { version, status, findingsChanged: true, findings }
    : { version, status, findingsChanged: false };
}
