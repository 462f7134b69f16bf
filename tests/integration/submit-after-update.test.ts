import { NextRequest } from "next/server";
import { afterAll, describe, expect, it } from "vitest";
import { POST } from "@/app/api/cases/[id]/submit/route";
import { getLucia } from "@/lib/auth/lucia";
import type { CaseSubmitResult } from "@/lib/contracts/case-submit";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { CAUSE_IDS, diagnose, ENGINE_VERSION } from "@/lib/diagnosis";
import { exampleAnswers } from "@/lib/interview/example-answers";
import { diagnosisInputFor } from "@/lib/interview/to-diagnosis-input";
import { sortSavedAnswers } from "@/lib/interview/validate";
import { getModels } from "@/models";
import { createShopWithCase } from "./fixtures";
import "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

const ORIGIN = "http://127.0.0.1:3000";
// What a phone would send after an update changed the engine under an interview left open.
const OLD_ENGINE_VERSION = "0.9.0+00000000";

/** A technician's case with a complete interview stored, and a signed-in session for them. */
async function openInterview() {
  const models = getModels();
  const fixture = await createShopWithCase(models);
  await fixture.serviceCase.update({
    interviewStep: "findings",
    answers: { answers: exampleAnswers, drafts: {}, skipped: [], visited: [] },
  });
  const session = await getLucia().createSession(fixture.technician.id, {});
  const stored = await models.Case.findByPk(fixture.serviceCase.id, { raw: true });
  return { ...fixture, sessionId: session.id, version: stored!.version };
}

function submitRequest(caseId: number, sessionId: string, body: Record<string, unknown>) {
  const req = new NextRequest(`${ORIGIN}/api/cases/${caseId}/submit`, {
    method: "POST",
    headers: {
      origin: ORIGIN,
      host: "127.0.0.1:3000",
      "content-type": "application/json",
      cookie: `cw_session=${sessionId}`,
    },
    body: JSON.stringify(body),
  });
  return POST(req, { params: Promise.resolve({ id: String(caseId) }) });
}

describe("submitting a case whose screen ran another version of the findings engine", () => {
  it("answers 200, stores findings worked out by the current engine and keeps the technician's conclusion", async () => {
    const { serviceCase, sessionId, version, shop } = await openInterview();
    // Today's leading suspect for these answers, worked out the way the server does.
    const settings = { altitudeM: shop.altitudeM };
    const input = diagnosisInputFor(sortSavedAnswers(exampleAnswers, settings).answers, settings);
    const leader = diagnose(input!).suspects[0]!.cause;
    // A conclusion other than today's leader, so the test shows it is kept rather than recomputed.
    const conclusionCause = CAUSE_IDS.find((c) => c !== leader)!;

    const response = await submitRequest(serviceCase.id, sessionId, {
      baseVersion: version,
      engineVersion: OLD_ENGINE_VERSION,
      conclusionCause,
      conclusionNotes: "Cooling fades after a few minutes; I think this is the cause.",
    });
    expect(response.status).toBe(200);
    const body = (await response.json()) as CaseSubmitResult;
    expect(body.findingsChanged).toBe(true);
    if (!body.findingsChanged) return;
    expect(body.findings.engineVersion).toBe(ENGINE_VERSION);
    expect(body.findings.suspects[0]?.cause).toBe(leader);
    expect(body.status).toBe("signed_off");

    const stored = await getModels().Case.findByPk(serviceCase.id, { raw: true });
    expect(stored?.engineVersion).toBe(ENGINE_VERSION);
    expect((stored?.findings as { engineVersion?: string }).engineVersion).toBe(ENGINE_VERSION);
    expect(stored?.conclusionCause).toBe(conclusionCause);
    expect(stored?.status).toBe("signed_off");
    expect(stored?.version).toBe(body.version);

    const audit = await getModels().AuditEvent.findOne({
      where: { shopId: shop.id, entity: "case", entityId: String(serviceCase.id), action: "submit" },
      raw: true,
    });
    expect(audit?.detail).toMatchObject({
      engineVersion: ENGINE_VERSION,
      screenEngineVersion: OLD_ENGINE_VERSION,
      conclusionCause,
    });
  });

  it("says nothing changed, and sends no findings back, when the screen ran the current engine", async () => {
    const { serviceCase, sessionId, version } = await openInterview();
    const response = await submitRequest(serviceCase.id, sessionId, {
      baseVersion: version,
      engineVersion: ENGINE_VERSION,
      conclusionCause: "undercharge",
      conclusionNotes: "Low on both sides after a slow leak.",
    });
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({
      version: version + 1,
      status: "signed_off",
      findingsChanged: false,
    });
    const stored = await getModels().Case.findByPk(serviceCase.id, { raw: true });
    expect(stored?.engineVersion).toBe(ENGINE_VERSION);
    expect(stored?.conclusionCause).toBe("undercharge");
  });
});
