import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import { getCase, saveInterview } from "@/lib/server/cases";
import { getServiceCase, getServiceRecord, saveServiceRecord } from "@/lib/server/service-records";
import { listCylinders, listMovements } from "@/lib/server/ledger";
import type { CaseFigures, FigureChangeDetail } from "@/lib/contracts/case-figures";
import type { ServiceRecordInput } from "@/lib/contracts/service-records";
import { createShopWithCylinders, recordInput } from "./service-fixtures";
import "./helpers";

afterAll(() => closeSequelize());

// Invented figures for an invented R-134a car; none is checked against a table, they only travel.
const FIRST: CaseFigures = {
  labelChargeG: 620,
  recoveredChargeG: 430,
  oilRemovedMl: 25,
  purityPct: 98.5,
  airPct: 1.2,
  chargedG: 600,
};

function interviewAnswers(f: CaseFigures) {
  return {
    complaint: { ownerWords: "Cool air only at motorway speed" },
    system: {
      refrigerant: "R-134a",
      expansionDevice: "txv",
      compressorType: "unknown",
      labelChargeG: f.labelChargeG,
    },
    identification: { purityPct: f.purityPct, airPct: f.airPct, hydrocarbonFlagged: false },
    chargeAudit: {
      recovered: true,
      recoveredChargeG: f.recoveredChargeG,
      oilRemovedMl: f.oilRemovedMl,
      chargedG: f.chargedG,
    },
  };
}

const recordFigures = (f: CaseFigures): Partial<ServiceRecordInput> => ({ ...f });

async function netOf(shopId: number, cylinderId: number) {
  const c = (await listCylinders({ shopId })).find((x) => x.id === cylinderId);
  if (!c) throw new Error("cylinder missing");
  return c.netG;
}

async function figureAudits(shopId: number, caseId: number) {
  const rows = await getModels().AuditEvent.findAll({
    where: { shopId, entity: "case", entityId: String(caseId), action: "figure_changed" },
    order: [["id", "ASC"]],
    raw: true,
  });
  return rows.map((r) => {
    const detail = typeof r.detail === "string" ? JSON.parse(r.detail) : r.detail;
    return { actorId: r.actorId as string | null, ...(detail as FigureChangeDetail) };
  });
}

/** What the interview shows: its stored answers with every figure written in from where it lives. */
async function interviewShows(shopId: number, caseId: number) {
  const detail = await getCase({ shopId, caseId });
  const answers = (detail.answers as { answers: ReturnType<typeof interviewAnswers> }).answers;
  return {
    version: detail.version,
    figures: {
      labelChargeG: answers.system.labelChargeG,
      recoveredChargeG: answers.chargeAudit.recoveredChargeG,
      oilRemovedMl: answers.chargeAudit.oilRemovedMl,
      purityPct: answers.identification.purityPct,
      airPct: answers.identification.airPct,
      chargedG: answers.chargeAudit.chargedG,
    },
  };
}

async function storedAnswers(caseId: number) {
  const row = await getModels().Case.findByPk(caseId, { raw: true });
  const record = typeof row?.answers === "string" ? JSON.parse(row.answers) : row?.answers;
  return (record as { answers: Record<string, Record<string, unknown>> }).answers;
}

describe("each figure typed once, between the interview and the service record", () => {
  it("carries all five figures both ways, audits each change and never double-posts the ledger", async () => {
    const models = getModels();
    const { shop, serviceCase, vehicle, recovery, supply, user } = await createShopWithCylinders(models);
    const caseId = serviceCase.id;
    const shopId = shop.id;

    // 1. Typed in the interview before any service record: the record starts with them.
    const saved = await saveInterview({
      user,
      caseId,
      input: {
        baseVersion: serviceCase.version,
        step: "chargeAudit",
        answers: interviewAnswers(FIRST),
        drafts: {},
        skipped: [],
        visited: [],
      },
    });
    expect(saved.draftGroups).toEqual([]);
    expect((await getServiceCase({ shopId, caseId })).figures).toEqual(FIRST);
    expect((await models.Vehicle.findByPk(vehicle.id, { raw: true }))?.labelChargeG).toBe(620);
    expect((await interviewShows(shopId, caseId)).figures).toEqual(FIRST);
    // The label charge lives on the vehicle only; the answers keep none.
    expect((await storedAnswers(caseId)).system).not.toHaveProperty("labelChargeG");
    const afterInterview = await figureAudits(shopId, caseId);
    expect(afterInterview.map((a) => a.figure).sort()).toEqual(Object.keys(FIRST).sort());
    expect(
      afterInterview.every((a) => a.typedIn === "interview" && a.from === null && a.actorId === user.id),
    ).toBe(true);

    // The service record's first save takes the prefilled figures; the masses post once.
    const first = await saveServiceRecord({
      user,
      caseId,
      input: recordInput({
        ...recordFigures(FIRST),
        recoveryCylinderId: recovery.id,
        chargeCylinderId: supply.id,
      }),
    });
    expect(first.posted).toBe(2);
    expect(await netOf(shopId, recovery.id)).toBe(1000 + 430);
    expect(await netOf(shopId, supply.id)).toBe(13_600 - 600);
    expect((await figureAudits(shopId, caseId)).length).toBe(afterInterview.length); // nothing changed
    // Moved, not copied: the answers no longer hold the record's figures.
    const moved = await storedAnswers(caseId);
    expect(moved.chargeAudit).toEqual({ recovered: true });
    expect(moved.identification).toEqual({ hydrocarbonFlagged: false });

    // 2. Changed on the service record: the interview shows the new values, with an audit row each.
    const SECOND: CaseFigures = {
      labelChargeG: 640,
      recoveredChargeG: 450,
      oilRemovedMl: 30,
      purityPct: 97,
      airPct: 2,
      chargedG: 610,
    };
    const before = await interviewShows(shopId, caseId);
    const second = await saveServiceRecord({
      user,
      caseId,
      input: recordInput({
        ...recordFigures(SECOND),
        baseVersion: first.record.version,
        recoveryCylinderId: recovery.id,
        chargeCylinderId: supply.id,
      }),
    });
    expect(second.posted).toBe(4); // each mass: one correction and one new posting
    const shown = await interviewShows(shopId, caseId);
    expect(shown.figures).toEqual(SECOND);
    expect(shown.version).toBeGreaterThan(before.version);
    const fromRecord = (await figureAudits(shopId, caseId)).slice(afterInterview.length);
    expect(fromRecord).toEqual(
      (Object.keys(SECOND) as (keyof CaseFigures)[]).map((figure) => ({
        actorId: user.id,
        figure,
        from: FIRST[figure],
        to: SECOND[figure],
        typedIn: "service_record",
        keptIn: figure === "labelChargeG" ? "vehicle" : "service_record",
      })),
    );
    expect(await netOf(shopId, recovery.id)).toBe(1000 + 450);
    expect(await netOf(shopId, supply.id)).toBe(13_600 - 610);

    // A screen that loaded the interview before that change is refused, and writes nothing.
    await expect(
      saveInterview({
        user,
        caseId,
        input: {
          baseVersion: before.version,
          step: "chargeAudit",
          answers: interviewAnswers(FIRST),
          drafts: {},
          skipped: [],
          visited: [],
        },
      }),
    ).rejects.toMatchObject({ code: "conflict:case" });
    expect((await getServiceRecord({ shopId, caseId }))?.recoveredChargeG).toBe(450);

    // 3. Changed in the interview while the record exists: the record shows it, the ledger follows once.
    const THIRD: CaseFigures = {
      labelChargeG: 650,
      recoveredChargeG: 470.4, // typed in ounces and converted: the record keeps whole grams
      oilRemovedMl: 35,
      purityPct: 96.5,
      airPct: 2.5,
      chargedG: 620,
    };
    const recordBefore = (await getServiceRecord({ shopId, caseId }))!;
    const third = await saveInterview({
      user,
      caseId,
      input: {
        baseVersion: shown.version,
        step: "chargeAudit",
        answers: interviewAnswers(THIRD),
        drafts: {},
        skipped: [],
        visited: [],
      },
    });
    const record = (await getServiceRecord({ shopId, caseId }))!;
    expect(record.version).toBe(recordBefore.version + 1);
    expect({
      labelChargeG: record.labelChargeG,
      recoveredChargeG: record.recoveredChargeG,
      oilRemovedMl: record.oilRemovedMl,
      purityPct: record.purityPct,
      airPct: record.airPct,
      chargedG: record.chargedG,
    }).toEqual({ ...THIRD, recoveredChargeG: 470 });
    expect(await netOf(shopId, recovery.id)).toBe(1000 + 470);
    expect(await netOf(shopId, supply.id)).toBe(13_600 - 620);
    const fromInterview = (await figureAudits(shopId, caseId)).slice(
      afterInterview.length + fromRecord.length,
    );
    expect(fromInterview.map((a) => [a.figure, a.from, a.to, a.typedIn])).toEqual([
      ["labelChargeG", 640, 650, "interview"],
      ["recoveredChargeG", 450, 470, "interview"],
      ["oilRemovedMl", 30, 35, "interview"],
      ["purityPct", 97, 96.5, "interview"],
      ["airPct", 2, 2.5, "interview"],
      ["chargedG", 610, 620, "interview"],
    ]);

    // The same answers again change nothing: no audit row, no ledger line.
    const movementsBefore = (await listMovements({ shopId })).length;
    const auditsBefore = (await figureAudits(shopId, caseId)).length;
    await saveInterview({
      user,
      caseId,
      input: {
        baseVersion: third.version,
        step: "chargeAudit",
        answers: interviewAnswers(THIRD),
        drafts: {},
        skipped: [],
        visited: [],
      },
    });
    expect((await listMovements({ shopId })).length).toBe(movementsBefore);
    expect((await figureAudits(shopId, caseId)).length).toBe(auditsBefore);

    // Every posting for this record nets to the record's figures: nothing was posted twice.
    const mine = (await listMovements({ shopId })).filter((m) => m.serviceRecordId === record.id);
    const net = (type: string) =>
      mine.filter((m) => m.type === type).reduce((sum, m) => sum + (m.reversesId ? -m.massG : m.massG), 0);
    expect(net("recovered_into")).toBe(470);
    expect(net("charged_from")).toBe(620);
  });

  it("keeps a half-typed figure a draft: the record and the ledger do not move", async () => {
    const models = getModels();
    const { shop, serviceCase, recovery, supply, user } = await createShopWithCylinders(models);
    const base = await saveInterview({
      user,
      caseId: serviceCase.id,
      input: {
        baseVersion: serviceCase.version,
        step: "chargeAudit",
        answers: interviewAnswers(FIRST),
        drafts: {},
        skipped: [],
        visited: [],
      },
    });
    await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({
        ...recordFigures(FIRST),
        recoveryCylinderId: recovery.id,
        chargeCylinderId: supply.id,
      }),
    });
    const current = await getCase({ shopId: shop.id, caseId: serviceCase.id });
    const answers = interviewAnswers(FIRST);
    const result = await saveInterview({
      user,
      caseId: serviceCase.id,
      input: {
        baseVersion: current.version,
        step: "chargeAudit",
        answers: { ...answers, chargeAudit: { ...answers.chargeAudit, recoveredChargeG: -4 } },
        drafts: {},
        skipped: [],
        visited: [],
      },
    });
    expect(base.draftGroups).toEqual([]);
    expect(result.draftGroups).toEqual(["chargeAudit"]);
    expect((await getServiceRecord({ shopId: shop.id, caseId: serviceCase.id }))?.recoveredChargeG).toBe(430);
    expect(await netOf(shop.id, recovery.id)).toBe(1000 + 430);
  });

  it("refuses a figure on someone else's record to an apprentice, and keeps the record as it was", async () => {
    const models = getModels();
    const { shop, serviceCase, recovery, supply, user } = await createShopWithCylinders(models);
    await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({
        ...recordFigures(FIRST),
        recoveryCylinderId: recovery.id,
        chargeCylinderId: supply.id,
      }),
    });
    const apprentice = await models.User.create({
      id: `appr-${serviceCase.id}-${Date.now()}`,
      shopId: shop.id,
      email: `apprentice-${serviceCase.id}-${Date.now()}@fixture.test`,
      name: "Fixture Apprentice",
      passwordHash: "not-a-real-hash",
      role: "apprentice",
    });
    await models.Case.update({ technicianId: apprentice.id }, { where: { id: serviceCase.id } });
    const current = await getCase({ shopId: shop.id, caseId: serviceCase.id });
    const error = await saveInterview({
      user: { ...user, id: apprentice.id, role: "apprentice" },
      caseId: serviceCase.id,
      input: {
        baseVersion: current.version,
        step: "chargeAudit",
        answers: interviewAnswers({ ...FIRST, recoveredChargeG: 900 }),
        drafts: {},
        skipped: [],
        visited: [],
      },
    }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).code).toBe("forbidden:service");
    expect((error as AppError).message).toMatch(/recovered mass is kept on the service record/);
    expect((await getServiceRecord({ shopId: shop.id, caseId: serviceCase.id }))?.recoveredChargeG).toBe(430);
    expect(await netOf(shop.id, recovery.id)).toBe(1000 + 430);
  });
});
