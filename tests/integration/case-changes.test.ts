import { NextRequest } from "next/server";
import type { User } from "lucia";
import { afterAll, afterEach, describe, expect, it, vi } from "vitest";
import { DELETE, PUT } from "@/app/api/cases/[id]/service/route";
import { getLucia } from "@/lib/auth/lucia";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { AppError } from "@/lib/errors";
import { exampleAnswers } from "@/lib/interview/example-answers";
import { createCase, saveInterview, submitCase } from "@/lib/server/cases";
import { deleteServiceRecord, saveServiceRecord } from "@/lib/server/service-records";
import { endSentence, formatShopTime } from "@/lib/units/clock";
import { getModels } from "@/models";
import { addCase, createShopWithCylinders, recordInput } from "./service-fixtures";
import "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});
afterEach(() => vi.restoreAllMocks());

const ORIGIN = "http://127.0.0.1:3000";

function request(method: string, url: string, sessionId: string, body?: unknown) {
  return new NextRequest(`${ORIGIN}${url}`, {
    method,
    headers: {
      origin: ORIGIN,
      host: "127.0.0.1:3000",
      cookie: `cw_session=${sessionId}`,
      ...(body ? { "content-type": "application/json" } : {}),
    },
    body: body ? JSON.stringify(body) : undefined,
  });
}

/** A shop with cylinders, and a case whose service record will get an id other than the case's. */
async function shopWithRecordCase() {
  const models = getModels();
  const fixture = await createShopWithCylinders(models);
  const { shop, vehicle, customer, technician, user } = fixture;
  let serviceCase = fixture.serviceCase;
  // Ids of different tables can coincide; a test of "which id was audited" needs them apart.
  const nextRecordId = (((await models.ServiceRecord.max("id")) as number | null) ?? 0) + 1;
  if (serviceCase.id === nextRecordId)
    serviceCase = await addCase(models, shop.id, vehicle.id, customer.id, technician.id);
  return { ...fixture, serviceCase, user };
}

async function auditRows(shopId: number, entity: string) {
  return getModels().AuditEvent.findAll({ where: { shopId, entity }, order: [["id", "ASC"]], raw: true });
}

describe("service record changes and their audit rows", () => {
  it("audit a removed record under the record's id, not the case's (failed before: the route audited the case id)", async () => {
    const { shop, serviceCase, technician } = await shopWithRecordCase();
    const session = await getLucia().createSession(technician.id, {});
    const saveResponse = await PUT(
      request("PUT", `/api/cases/${serviceCase.id}/service`, session.id, recordInput({ labelChargeG: 650 })),
      { params: Promise.resolve({ id: String(serviceCase.id) }) },
    );
    expect(saveResponse.status).toBe(200);
    const { record } = (await saveResponse.json()) as { record: { id: number; version: number } };
    expect(record.id).not.toBe(serviceCase.id);

    const removeResponse = await DELETE(
      request("DELETE", `/api/cases/${serviceCase.id}/service?version=${record.version}`, session.id),
      { params: Promise.resolve({ id: String(serviceCase.id) }) },
    );
    expect(removeResponse.status).toBe(200);

    const rows = await auditRows(shop.id, "service_record");
    expect(rows.map((r) => [r.action, r.entityId])).toEqual([
      ["saved:recharge", String(record.id)],
      ["deleted", String(record.id)],
    ]);
  });

  it("write no record and no ledger row when the audit row cannot be written (failed before: audited after the commit)", async () => {
    const models = getModels();
    const { shop, serviceCase, supply, user } = await shopWithRecordCase();
    vi.spyOn(models.AuditEvent, "create").mockRejectedValueOnce(new Error("audit trail unavailable"));
    await expect(
      saveServiceRecord({
        user,
        caseId: serviceCase.id,
        input: recordInput({ chargedG: 500, chargeCylinderId: supply.id }),
      }),
    ).rejects.toThrow("audit trail unavailable");
    expect(await models.ServiceRecord.count({ where: { shopId: shop.id } })).toBe(0);
    expect(await models.RefrigerantMovement.count({ where: { shopId: shop.id } })).toBe(0);
  });

  it("keep the record when the removal's audit row cannot be written (failed before: the route audited after the commit)", async () => {
    const models = getModels();
    const { shop, serviceCase, supply, user } = await shopWithRecordCase();
    const saved = await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({ chargedG: 500, chargeCylinderId: supply.id }),
    });
    vi.spyOn(models.AuditEvent, "create").mockRejectedValueOnce(new Error("audit trail unavailable"));
    await expect(
      deleteServiceRecord({ user, caseId: serviceCase.id, version: saved.record.version }),
    ).rejects.toThrow("audit trail unavailable");
    expect(await models.ServiceRecord.count({ where: { shopId: shop.id } })).toBe(1);
    // The posting stands and no correction was written.
    expect(await models.RefrigerantMovement.count({ where: { shopId: shop.id } })).toBe(1);
  });
});

describe("case changes and their audit rows", () => {
  it("open no case when its audit row cannot be written (failed before: audited after the commit)", async () => {
    const models = getModels();
    const { shop, vehicle, technician } = await shopWithRecordCase();
    const before = await models.Case.count({ where: { shopId: shop.id } });
    vi.spyOn(models.AuditEvent, "create").mockRejectedValueOnce(new Error("audit trail unavailable"));
    await expect(
      createCase({
        shopId: shop.id,
        technicianId: technician.id,
        input: { vehicleId: vehicle.id, complaint: "Cold at idle, warm on the highway" },
      }),
    ).rejects.toThrow("audit trail unavailable");
    expect(await models.Case.count({ where: { shopId: shop.id } })).toBe(before);
  });

  it("leave a case unsubmitted when the submission's audit row cannot be written (failed before: audited after it)", async () => {
    const models = getModels();
    const { serviceCase, user } = await shopWithRecordCase();
    await serviceCase.update({
      interviewStep: "findings",
      answers: { answers: exampleAnswers, drafts: {}, skipped: [], visited: [] },
    });
    const stored = await models.Case.findByPk(serviceCase.id, { raw: true });
    vi.spyOn(models.AuditEvent, "create").mockRejectedValueOnce(new Error("audit trail unavailable"));
    await expect(
      submitCase({
        user,
        caseId: serviceCase.id,
        input: {
          baseVersion: stored!.version,
          conclusionCause: "overcharge",
          conclusionNotes: "High side well above the band for the ambient.",
          conclusionReasons: [],
          engineVersion: "any",
        },
      }),
    ).rejects.toThrow("audit trail unavailable");
    const after = await models.Case.findByPk(serviceCase.id, { raw: true });
    expect(after).toMatchObject({ status: "draft", version: stored!.version, conclusionCause: null });
  });
});

describe("conflict messages", () => {
  async function halifaxShop() {
    const fixture = await shopWithRecordCase();
    await fixture.shop.update({ timeZone: "America/Halifax", locale: "en-CA" });
    return fixture;
  }
  const clock = { timeZone: "America/Halifax", locale: "en-CA" };

  it("give the other screen's change on the shop's clock for the interview (failed before: in UTC)", async () => {
    const models = getModels();
    const { serviceCase, user } = await halifaxShop();
    const stored = await models.Case.findByPk(serviceCase.id, { raw: true });
    const input = {
      baseVersion: stored!.version - 1,
      step: "complaint" as const,
      answers: {},
      drafts: {},
      skipped: [],
      visited: [],
    };
    const error = await saveInterview({ user, caseId: serviceCase.id, input }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(AppError);
    const message = (error as AppError).message;
    expect(message).toContain(
      `changed on another screen at ${endSentence(formatShopTime(stored!.updatedAt, clock))} Reload`,
    );
    expect(message).not.toMatch(/UTC|\.\./);
  });

  it("give the other screen's change on the shop's clock for the service record (failed before: in UTC)", async () => {
    const { serviceCase, user } = await halifaxShop();
    const first = await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({ labelChargeG: 650 }),
    });
    await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({ labelChargeG: 660, baseVersion: first.record.version }),
    });
    const stored = await getModels().ServiceRecord.findOne({ where: { caseId: serviceCase.id }, raw: true });
    const error = await saveServiceRecord({
      user: user as User,
      caseId: serviceCase.id,
      input: recordInput({ labelChargeG: 670, baseVersion: first.record.version }),
    }).catch((e: unknown) => e);
    expect((error as AppError).status).toBe(409);
    expect((error as AppError).message).toBe(
      `This record was changed on another screen at ${endSentence(formatShopTime(stored!.updatedAt, clock))} Reload to see it; what you typed here is kept on this device.`,
    );
  });
});
