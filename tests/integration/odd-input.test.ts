import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as createCaseRoute } from "@/app/api/cases/route";
import { PUT as saveInterviewRoute } from "@/app/api/cases/[id]/interview/route";
import { PUT as saveServiceRoute } from "@/app/api/cases/[id]/service/route";
import { POST as createCylinderRoute } from "@/app/api/cylinders/route";
import { POST as inviteRoute } from "@/app/api/invitations/route";
import { POST as postMovementRoute } from "@/app/api/ledger/movements/route";
import { TEXT_MESSAGES } from "@/lib/contracts/text";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { callRoute, fieldErrorsOf, signedInUser } from "./api-client";
import { uniqueName } from "./helpers";
import { createShopWithCylinders } from "./service-fixtures";

// Odd input the forms never send but a client can: each is refused with a 400 that names the field
// and says what is wrong, and nothing is stored.

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

let fixture: Awaited<ReturnType<typeof createShopWithCylinders>>;
let owner: { sessionId: string };
let tech: { sessionId: string };

beforeAll(async () => {
  const models = getModels();
  fixture = await createShopWithCylinders(models);
  owner = await signedInUser(models, fixture.shop.id, "owner");
  tech = await signedInUser(models, fixture.shop.id, "technician");
});

/** A raw JSON body whose string holds "\ud800" as an escape, the way a broken client sends it. */
const LONE = "\\ud800";

function newCase(complaint: string, customerName = "Dana Example") {
  return {
    vehicleId: fixture.vehicle.id,
    newCustomer: { name: customerName },
    complaint,
  };
}

async function caseCount() {
  return getModels().Case.count({ where: { shopId: fixture.shop.id } });
}

async function interviewBody(extra: string) {
  const row = await getModels().Case.findByPk(fixture.serviceCase.id, { raw: true });
  return `{"baseVersion":${row!.version},"step":"complaint",${extra}}`;
}

function saveInterview(body: string) {
  return callRoute(saveInterviewRoute, `/api/cases/${fixture.serviceCase.id}/interview`, {
    method: "PUT",
    sessionId: owner.sessionId,
    body,
    params: { id: String(fixture.serviceCase.id) },
  });
}

describe("a lone UTF-16 surrogate", () => {
  it("in a complaint: 400 naming the field, no case made", async () => {
    const before = await caseCount();
    const body = JSON.stringify(newCase("placeholder")).replace("placeholder", `cold then warm ${LONE}`);
    const res = await callRoute(createCaseRoute, "/api/cases", {
      method: "POST",
      sessionId: tech.sessionId,
      body,
    });
    expect(res.status).toBe(400);
    expect(fieldErrorsOf(res.json)).toEqual({ complaint: [TEXT_MESSAGES.illFormed] });
    expect(await caseCount()).toBe(before);
  });

  it("in a cylinder label: 400, no cylinder made", async () => {
    const label = uniqueName("CYL");
    const body = `{"label":"${label}${LONE}","refrigerant":"R-134a","kind":"virgin","tareG":6000,"capacityG":13600,"initialNetG":0}`;
    const res = await callRoute(createCylinderRoute, "/api/cylinders", {
      method: "POST",
      sessionId: owner.sessionId,
      body,
    });
    expect(res.status).toBe(400);
    expect(fieldErrorsOf(res.json)).toEqual({ label: [TEXT_MESSAGES.illFormed] });
    expect(await getModels().Cylinder.count({ where: { shopId: fixture.shop.id, label } })).toBe(0);
  });

  it("in an interview answer or a draft key: 400, the stored interview unchanged", async () => {
    const before = await getModels().Case.findByPk(fixture.serviceCase.id, { raw: true });
    for (const extra of [
      `"answers":{"complaint":{"ownerWords":"warm air ${LONE}"}}`,
      `"answers":{},"drafts":{"complaint":{"${LONE}":"x"}}`,
    ]) {
      const res = await saveInterview(await interviewBody(extra));
      expect(res.status).toBe(400);
      expect(Object.values(fieldErrorsOf(res.json)).flat()).toEqual([TEXT_MESSAGES.illFormed]);
    }
    expect(
      fieldErrorsOf(
        (await saveInterview(await interviewBody(`"answers":{"complaint":{"ownerWords":"a${LONE}"}}`))).json,
      ),
    ).toHaveProperty("answers.complaint.ownerWords");
    const after = await getModels().Case.findByPk(fixture.serviceCase.id, { raw: true });
    expect(after?.version).toBe(before?.version);
    expect(after?.answers).toEqual(before?.answers);
  });
});

describe("deeply nested JSON in interview drafts", () => {
  for (const levels of [30, 2_000, 200_000]) {
    it(`${levels} levels: 400 before anything recursive runs, nothing stored`, async () => {
      const before = await getModels().Case.findByPk(fixture.serviceCase.id, { raw: true });
      const deep = "[".repeat(levels) + "]".repeat(levels);
      const res = await saveInterview(await interviewBody(`"answers":{},"drafts":{"complaint":${deep}}`));
      expect(res.status).toBe(400);
      expect((res.json as { error: { message: string } }).error.message).toMatch(/levels deep/);
      const after = await getModels().Case.findByPk(fixture.serviceCase.id, { raw: true });
      expect(after?.version).toBe(before?.version);
    });
  }

  it("a draft nested deeper than a form's values, though inside the body limit: 400 on drafts.complaint", async () => {
    const deep = "[".repeat(8) + "]".repeat(8);
    const res = await saveInterview(await interviewBody(`"answers":{},"drafts":{"complaint":${deep}}`));
    expect(res.status).toBe(400);
    expect(Object.keys(fieldErrorsOf(res.json))).toEqual(["drafts.complaint"]);
  });

  it("an ordinary draft still saves", async () => {
    const res = await saveInterview(
      await interviewBody(
        `"answers":{},"drafts":{"complaint":{"ownerWords":"warm at idle\\nfine on the road"}}`,
      ),
    );
    expect(res.status).toBe(200);
  });
});

describe("NUL bytes and the right-to-left override", () => {
  const cases: [string, string][] = [
    ["NUL", "\u0000"],
    ["right-to-left override", "\u202E"],
    ["escape (terminal colours)", "\u001B[31m"],
  ];
  for (const [what, chars] of cases) {
    it(`${what} in a customer name or a complaint: 400, no case made`, async () => {
      const before = await caseCount();
      for (const body of [newCase(`warm air${chars}`), newCase("warm air", `Dana${chars}Example`)]) {
        const res = await callRoute(createCaseRoute, "/api/cases", {
          method: "POST",
          sessionId: tech.sessionId,
          body,
        });
        expect(res.status).toBe(400);
        const messages = Object.values(fieldErrorsOf(res.json)).flat();
        expect(messages.length).toBe(1);
        expect(messages[0]).toMatch(/invisible/);
      }
      expect(await caseCount()).toBe(before);
    });

    it(`${what} in an invited person's name: 400, no invitation`, async () => {
      const email = `${uniqueName("invitee")}@fixture.test`;
      const res = await callRoute(inviteRoute, "/api/invitations", {
        method: "POST",
        sessionId: owner.sessionId,
        body: { email, name: `Sam${chars}Rivera`, role: "technician" },
      });
      expect(res.status).toBe(400);
      expect(Object.keys(fieldErrorsOf(res.json))).toEqual(["name"]);
      expect(await getModels().UserInvitation.count({ where: { email } })).toBe(0);
    });
  }

  it("line breaks stay allowed in a complaint, refused in a name", async () => {
    const ok = await callRoute(createCaseRoute, "/api/cases", {
      method: "POST",
      sessionId: tech.sessionId,
      body: newCase("Cold in the morning.\nWarm by noon.\tFan fine."),
    });
    expect(ok.status).toBe(201);
    const refused = await callRoute(createCaseRoute, "/api/cases", {
      method: "POST",
      sessionId: tech.sessionId,
      body: newCase("warm", "Dana\nExample"),
    });
    expect(refused.status).toBe(400);
    expect(fieldErrorsOf(refused.json)).toEqual({ "newCustomer.name": [TEXT_MESSAGES.singleLine] });
  });
});

describe("dates outside a plausible range", () => {
  const movement = (occurredAt: string) => ({
    cylinderId: fixture.supply.id,
    type: "adjustment",
    massG: -5,
    note: "weighed on the bench scale",
    occurredAt,
  });
  async function movementCount() {
    return getModels().RefrigerantMovement.count({ where: { shopId: fixture.shop.id } });
  }

  for (const occurredAt of ["0000-01-01T00:00:00Z", "9999-12-31T00:00:00Z", "1970-01-01T00:00:00Z"]) {
    it(`a ledger movement dated ${occurredAt.slice(0, 10)}: 400 on occurredAt, nothing posted`, async () => {
      const before = await movementCount();
      const res = await callRoute(postMovementRoute, "/api/ledger/movements", {
        method: "POST",
        sessionId: owner.sessionId,
        body: movement(occurredAt),
      });
      expect(res.status).toBe(400);
      expect(fieldErrorsOf(res.json).occurredAt?.[0]).toMatch(/check the year/);
      expect(await movementCount()).toBe(before);
    });
  }

  it("a ledger movement dated today posts and reads back the same instant", async () => {
    const occurredAt = new Date(Date.now() - 60_000).toISOString();
    const res = await callRoute(postMovementRoute, "/api/ledger/movements", {
      method: "POST",
      sessionId: owner.sessionId,
      body: movement(occurredAt),
    });
    expect(res.status).toBe(201);
    const { movement: saved } = res.json as { movement: { occurredAt: string } };
    expect(Date.parse(saved.occurredAt)).toBe(Date.parse(occurredAt));
  });

  it("a service record whose recovery started in year 0: 400, no record", async () => {
    const res = await callRoute(saveServiceRoute, `/api/cases/${fixture.serviceCase.id}/service`, {
      method: "PUT",
      sessionId: owner.sessionId,
      params: { id: String(fixture.serviceCase.id) },
      body: { baseVersion: 0, step: "recovery", recoveryStartedAt: "0000-01-01T00:00:00Z" },
    });
    expect(res.status).toBe(400);
    expect(Object.keys(fieldErrorsOf(res.json))).toEqual(["recoveryStartedAt"]);
    expect(await getModels().ServiceRecord.count({ where: { caseId: fixture.serviceCase.id } })).toBe(0);
  });
});
