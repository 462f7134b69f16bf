import { afterAll, describe, expect, it } from "vitest";
import { POST as outcomeRoute } from "@/app/api/cases/[id]/outcome/route";
import { POST as reopenRoute } from "@/app/api/cases/[id]/reopen/route";
import { getLucia } from "@/lib/auth/lucia";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { caseOutcome } from "@/lib/server/casebook/outcome";
import { getModels } from "@/models";
import { callRoute, fieldErrorsOf, signedInUser } from "./api-client";
import { createShopWithCase } from "./fixtures";
import "./helpers";

// Closing a case and reopening it, through the routes as a browser calls them, against MariaDB.

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

const GOOD_OUTCOME = {
  causes: ["undercharge"],
  repairIds: ["leak_repair", "recover_evacuate_recharge"],
  note: "Condenser inlet O-ring replaced.",
};

async function signedOffCase() {
  const models = getModels();
  const made = await createShopWithCase(models);
  await made.serviceCase.update({ status: "signed_off" });
  const technicianSession = (await getLucia().createSession(made.technician.id, {})).id;
  const senior = await signedInUser(models, made.shop.id, "senior");
  const apprentice = await signedInUser(models, made.shop.id, "apprentice");
  const caseId = made.serviceCase.id;
  const close = (sessionId: string | null, body: unknown = GOOD_OUTCOME) =>
    callRoute(outcomeRoute, `/api/cases/${caseId}/outcome`, {
      method: "POST",
      sessionId,
      body,
      params: { id: String(caseId) },
    });
  const reopen = (sessionId: string | null, body: unknown) =>
    callRoute(reopenRoute, `/api/cases/${caseId}/reopen`, {
      method: "POST",
      sessionId,
      body,
      params: { id: String(caseId) },
    });
  const audits = async () =>
    (
      await models.AuditEvent.findAll({
        where: { shopId: made.shop.id, entity: "case", entityId: String(caseId) },
        order: [["id", "ASC"]],
        raw: true,
      })
    ).map((a) => ({
      action: a.action,
      detail: typeof a.detail === "string" ? JSON.parse(a.detail) : a.detail,
    }));
  return { ...made, models, caseId, technicianSession, senior, apprentice, close, reopen, audits };
}

describe("closing a case through POST /api/cases/[id]/outcome", () => {
  it("closes a signed-off case with its confirmed cause and repairs as rows, and an audit row", async () => {
    const c = await signedOffCase();
    const done = await c.close(c.technicianSession);
    expect(done.status, done.text).toBe(200);
    expect(done.json).toMatchObject({ caseId: c.caseId, status: "closed" });
    const row = await c.models.Case.findByPk(c.caseId, { raw: true });
    expect(row).toMatchObject({ status: "closed", repairNote: GOOD_OUTCOME.note });
    expect(row!.closedAt).not.toBeNull();
    const view = await caseOutcome({ shopId: c.shop.id, caseId: c.caseId });
    expect(view.causes).toEqual(["undercharge"]);
    expect([...view.repairIds].sort()).toEqual(["leak_repair", "recover_evacuate_recharge"]);
    expect(view.history.map((e) => e.action)).toEqual(["close"]);
    expect(await c.audits()).toEqual([
      {
        action: "close",
        detail: { causes: ["undercharge"], repairIds: GOOD_OUTCOME.repairIds, note: GOOD_OUTCOME.note },
      },
    ]);
  });

  it("refuses without a session (401), bad input (400 with the field), another's case (403), the wrong status (409), another shop (404)", async () => {
    const c = await signedOffCase();
    expect((await c.close(null)).status).toBe(401);

    const empty = await c.close(c.technicianSession, { causes: [], repairIds: [] });
    expect(empty.status).toBe(400);
    expect(fieldErrorsOf(empty.json).causes?.[0]).toBe("Pick at least one confirmed cause, or none found.");
    const mixed = await c.close(c.technicianSession, { causes: ["none_found", "moisture"], repairIds: [] });
    expect(mixed.status).toBe(400);
    expect(fieldErrorsOf(mixed.json).causes?.[0]).toBe("None found stands alone.");
    const unknown = await c.close(c.technicianSession, { causes: ["gremlins"], repairIds: ["magic"] });
    expect(unknown.status).toBe(400);

    // An apprentice who is not the case's technician may not close it.
    const notTheirs = await c.close(c.apprentice.sessionId);
    expect(notTheirs.status).toBe(403);

    const other = await signedOffCase();
    const elsewhere = await c.close(other.technicianSession);
    expect(elsewhere.status).toBe(404);

    await c.serviceCase.update({ status: "awaiting_signoff" });
    const early = await c.close(c.technicianSession);
    expect(early.status).toBe(409);
    expect((early.json as { error: { message: string } }).error.message).toBe(
      "Only a signed-off case can be closed.",
    );
    expect((await c.models.Case.findByPk(c.caseId, { raw: true }))!.status).toBe("awaiting_signoff");
    expect(await c.audits()).toEqual([]);
  });

  it("two closes of one case at once: both answer 200, the outcome is stored once and closed once", async () => {
    const c = await signedOffCase();
    const [a, b] = await Promise.all([c.close(c.technicianSession), c.close(c.senior.sessionId)]);
    expect([a.status, b.status]).toEqual([200, 200]);
    expect((a.json as { closedAt: string }).closedAt).toBe((b.json as { closedAt: string }).closedAt);
    const causes = await c.models.CaseConfirmedCause.findAll({ where: { caseId: c.caseId }, raw: true });
    expect(causes.map((r) => r.cause)).toEqual(["undercharge"]);
    const repairs = await c.models.CaseRepair.findAll({ where: { caseId: c.caseId }, raw: true });
    expect(repairs).toHaveLength(2);
    expect((await c.audits()).map((e) => e.action).sort()).toEqual(["close", "outcome_corrected"]);
  });
});

describe("reopening a case through POST /api/cases/[id]/reopen", () => {
  it("a senior reopens a closed case with a reason: back to signed off, the outcome set aside, the reason kept", async () => {
    const c = await signedOffCase();
    expect((await c.close(c.technicianSession)).status).toBe(200);

    expect((await c.reopen(null, { reason: "Warm again." })).status).toBe(401);
    expect((await c.reopen(c.technicianSession, { reason: "Warm again." })).status).toBe(403);
    const otherShop = await signedOffCase();
    expect((await c.reopen(otherShop.senior.sessionId, { reason: "Warm again." })).status).toBe(404);
    const noReason = await c.reopen(c.senior.sessionId, { reason: "   " });
    expect(noReason.status).toBe(400);
    expect(fieldErrorsOf(noReason.json).reason?.[0]).toBe(
      "Say why the case is reopened: the technician reads it.",
    );

    const reason = "Warm again within a week: look for a second leak.";
    const reopened = await c.reopen(c.senior.sessionId, { reason });
    expect(reopened.status, reopened.text).toBe(200);
    expect(reopened.json).toMatchObject({ caseId: c.caseId, status: "signed_off" });
    const row = await c.models.Case.findByPk(c.caseId, { raw: true });
    expect(row).toMatchObject({ status: "signed_off", closedAt: null });
    const view = await caseOutcome({ shopId: c.shop.id, caseId: c.caseId });
    expect(view.causes).toEqual([]);
    expect(view.repairIds).toEqual([]);
    expect(view.history.map((e) => [e.action, e.reason])).toEqual([
      ["close", null],
      ["reopen", reason],
    ]);
    const audit = (await c.audits()).at(-1)!;
    expect(audit).toMatchObject({
      action: "reopen",
      detail: { reason, previous: { causes: ["undercharge"], note: GOOD_OUTCOME.note } },
    });

    // Reopening an open case is a conflict; the technician closes it again.
    expect((await c.reopen(c.senior.sessionId, { reason })).status).toBe(409);
    const again = await c.close(c.technicianSession, { causes: ["non_condensables"], repairIds: [] });
    expect(again.status).toBe(200);
    expect((await caseOutcome({ shopId: c.shop.id, caseId: c.caseId })).causes).toEqual(["non_condensables"]);
  });

  it("two reopens at once: one succeeds, the other is told the case is no longer closed", async () => {
    const c = await signedOffCase();
    expect((await c.close(c.technicianSession)).status).toBe(200);
    const owner = await signedInUser(c.models, c.shop.id, "owner");
    const answers = await Promise.all([
      c.reopen(c.senior.sessionId, { reason: "First look." }),
      c.reopen(owner.sessionId, { reason: "Second look." }),
    ]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
    expect((await c.audits()).filter((e) => e.action === "reopen")).toHaveLength(1);
  });
});
