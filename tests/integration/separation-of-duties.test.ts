import { NextRequest } from "next/server";
import { afterAll, describe, expect, it } from "vitest";
import { PUT as saveInterviewRoute } from "@/app/api/cases/[id]/interview/route";
import { POST as submitRoute } from "@/app/api/cases/[id]/submit/route";
import { POST as signOffRoute } from "@/app/api/cases/[id]/signoff/route";
import { getLucia } from "@/lib/auth/lucia";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { diagnose } from "@/lib/diagnosis";
import { exampleAnswers } from "@/lib/interview/example-answers";
import { diagnosisInputFor } from "@/lib/interview/to-diagnosis-input";
import { sortSavedAnswers } from "@/lib/interview/validate";
import { getModels } from "@/models";
import { newUserId } from "@/scripts/demo/seed-demo";
import { createShopWithCase } from "./fixtures";
import { uniqueName } from "./helpers";
import "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

const ORIGIN = "http://127.0.0.1:3000";

function request(method: string, url: string, sessionId: string, body: unknown) {
  return new NextRequest(`${ORIGIN}${url}`, {
    method,
    headers: {
      origin: ORIGIN,
      host: "127.0.0.1:3000",
      cookie: `cw_session=${sessionId}`,
      "content-type": "application/json",
    },
    body: JSON.stringify(body),
  });
}

async function person(shopId: number, role: "senior" | "apprentice") {
  const user = await getModels().User.create({
    id: newUserId(),
    shopId,
    email: `${uniqueName(role)}@fixture.test`,
    name: `Fixture ${role}`,
    passwordHash: "not-a-real-hash",
    role,
  });
  return { user, session: (await getLucia().createSession(user.id, {})).id };
}

/** An apprentice's case, its interview filled in by whoever `writer` is, then submitted by them. */
async function writtenAndSubmittedBy(who: "apprentice" | "senior") {
  const models = getModels();
  const { shop, serviceCase } = await createShopWithCase(models);
  const apprentice = await person(shop.id, "apprentice");
  const senior = await person(shop.id, "senior");
  const otherSenior = await person(shop.id, "senior");
  await serviceCase.update({ technicianId: apprentice.user.id, interviewStep: "findings" });
  const writer = who === "apprentice" ? apprentice : senior;
  const params = { params: Promise.resolve({ id: String(serviceCase.id) }) };
  const saved = await saveInterviewRoute(
    request("PUT", `/api/cases/${serviceCase.id}/interview`, writer.session, {
      baseVersion: (await models.Case.findByPk(serviceCase.id, { raw: true }))!.version,
      step: "findings",
      answers: exampleAnswers,
    }),
    params,
  );
  expect(saved.status, await saved.clone().text()).toBe(200);
  const { version } = (await saved.json()) as { version: number };
  const settings = { altitudeM: shop.altitudeM };
  const findings = diagnose(diagnosisInputFor(sortSavedAnswers(exampleAnswers, settings).answers, settings)!);
  const submitted = await submitRoute(
    request("POST", `/api/cases/${serviceCase.id}/submit`, writer.session, {
      baseVersion: version,
      engineVersion: findings.engineVersion,
      conclusionCause: findings.suspects[0]!.cause,
      conclusionNotes: "High side and subcooling both high after a top-off.",
    }),
    params,
  );
  expect(submitted.status, await submitted.clone().text()).toBe(200);
  return { shop, serviceCase, apprentice, senior, otherSenior, params };
}

describe("separation of duties on sign-off", () => {
  it("refuses with 403 and says why when a senior signs off a conclusion they saved and submitted on an apprentice's case (failed before: the audit showed submit and sign-off by one person)", async () => {
    const { shop, serviceCase, senior, otherSenior, params } = await writtenAndSubmittedBy("senior");
    expect((await getModels().Case.findByPk(serviceCase.id, { raw: true }))!.status).toBe("awaiting_signoff");

    const refused = await signOffRoute(
      request("POST", `/api/cases/${serviceCase.id}/signoff`, senior.session, { verdict: "signed_off" }),
      params,
    );
    expect(refused.status).toBe(403);
    expect(((await refused.json()) as { error: { message: string } }).error.message).toMatch(
      /saved this case's interview or submitted its conclusion/,
    );
    const audit = await getModels().AuditEvent.findAll({
      where: { shopId: shop.id, entity: "case", entityId: String(serviceCase.id) },
      raw: true,
    });
    expect(audit.map((a) => a.action)).not.toContain("signed_off");

    // A second senior, who wrote nothing, may.
    const signed = await signOffRoute(
      request("POST", `/api/cases/${serviceCase.id}/signoff`, otherSenior.session, { verdict: "signed_off" }),
      params,
    );
    expect(signed.status).toBe(200);
  });

  it("lets a senior sign off an apprentice's conclusion they did not touch", async () => {
    const { serviceCase, senior, params } = await writtenAndSubmittedBy("apprentice");
    const signed = await signOffRoute(
      request("POST", `/api/cases/${serviceCase.id}/signoff`, senior.session, { verdict: "signed_off" }),
      params,
    );
    expect(signed.status).toBe(200);
    const row = await getModels().Case.findByPk(serviceCase.id, { raw: true });
    expect(row!.status).toBe("signed_off");
  });
});

describe("the conclusion's why", () => {
  it("asks an apprentice for a reason or words (400, nothing stored), and stores picked reasons as a sentence", async () => {
    const models = getModels();
    const { shop, serviceCase } = await createShopWithCase(models);
    const apprentice = await person(shop.id, "apprentice");
    await serviceCase.update({
      technicianId: apprentice.user.id,
      interviewStep: "findings",
      answers: { answers: exampleAnswers, drafts: {}, skipped: [], visited: [] },
    });
    const params = { params: Promise.resolve({ id: String(serviceCase.id) }) };
    const settings = { altitudeM: shop.altitudeM };
    const findings = diagnose(
      diagnosisInputFor(sortSavedAnswers(exampleAnswers, settings).answers, settings)!,
    );
    const body = async () => ({
      baseVersion: (await models.Case.findByPk(serviceCase.id, { raw: true }))!.version,
      engineVersion: findings.engineVersion,
      conclusionCause: findings.suspects[0]!.cause,
    });
    const bare = await submitRoute(
      request("POST", `/api/cases/${serviceCase.id}/submit`, apprentice.session, await body()),
      params,
    );
    expect(bare.status).toBe(400);
    expect(JSON.stringify(await bare.json())).toMatch(/Pick at least one reason/);
    expect((await models.Case.findByPk(serviceCase.id, { raw: true }))!.status).toBe("draft");

    const withReasons = await submitRoute(
      request("POST", `/api/cases/${serviceCase.id}/submit`, apprentice.session, {
        ...(await body()),
        conclusionReasons: ["charge_weight", "pressures"],
      }),
      params,
    );
    expect(withReasons.status).toBe(200);
    const row = await models.Case.findByPk(serviceCase.id, { raw: true });
    expect(row!.status).toBe("awaiting_signoff");
    expect(row!.conclusionNotes).toBe("The pressures point to it; the recovered charge against the label.");
  });
});
