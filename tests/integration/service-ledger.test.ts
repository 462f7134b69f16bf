import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import { deleteServiceRecord, getServiceRecord, saveServiceRecord } from "@/lib/server/service-records";
import { ledgerReport, listCylinders, listMovements } from "@/lib/server/ledger";
import { addCase, createShopWithCylinders, recordInput } from "./service-fixtures";
import "./helpers";

afterAll(() => closeSequelize());

async function netOf(shopId: number, cylinderId: number) {
  const c = (await listCylinders({ shopId })).find((x) => x.id === cylinderId);
  if (!c) throw new Error("cylinder missing");
  return c.netG;
}

async function totals(shopId: number) {
  const { rows } = await ledgerReport({ shopId });
  return {
    recoveredChargeG: rows.reduce((s, r) => s + r.recoveredG, 0),
    chargedG: rows.reduce((s, r) => s + r.chargedG, 0),
  };
}

async function recordSums(shopId: number) {
  const records = await getModels().ServiceRecord.findAll({ where: { shopId }, raw: true });
  return {
    recoveredChargeG: records.reduce((s, r) => s + (r.recoveredChargeG ?? 0), 0),
    chargedG: records.reduce((s, r) => s + (r.chargedG ?? 0), 0),
  };
}

describe("service record ↔ refrigerant ledger", () => {
  it("posts recovery and recharge, corrects them on edit, posts nothing on an unchanged save, and cancels them on delete", async () => {
    const models = getModels();
    const { shop, serviceCase, recovery, supply, user } = await createShopWithCylinders(models);
    const input = recordInput({
      recoveredChargeG: 800,
      recoveryCylinderId: recovery.id,
      chargedG: 650,
      chargeCylinderId: supply.id,
      labelChargeG: 650,
      targetG: 650,
    });

    const first = await saveServiceRecord({ user, caseId: serviceCase.id, input });
    expect(first.posted).toBe(2);
    expect(await netOf(shop.id, recovery.id)).toBe(1000 + 800);
    expect(await netOf(shop.id, supply.id)).toBe(13_600 - 650);
    expect(await totals(shop.id)).toEqual(await recordSums(shop.id));

    const same = await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: { ...input, baseVersion: first.record.version },
    });
    expect(same.posted).toBe(0);

    const edited = await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: { ...input, recoveredChargeG: 820, baseVersion: same.record.version },
    });
    expect(edited.posted).toBe(2); // one correction cancelling 800, one new posting of 820
    expect(await netOf(shop.id, recovery.id)).toBe(1000 + 820);
    expect(await totals(shop.id)).toEqual(await recordSums(shop.id));
    const movements = await listMovements({ shopId: shop.id });
    const cancelled = movements.find((m) => m.type === "recovered_into" && m.massG === 800 && !m.reversesId);
    expect(cancelled?.reversedById).not.toBeNull();

    await deleteServiceRecord({ user, caseId: serviceCase.id, version: edited.record.version });
    expect(await getServiceRecord({ shopId: shop.id, caseId: serviceCase.id })).toBeNull();
    expect(await netOf(shop.id, recovery.id)).toBe(1000);
    expect(await netOf(shop.id, supply.id)).toBe(13_600);
    expect(await totals(shop.id)).toEqual({ recoveredChargeG: 0, chargedG: 0 });
    // Nothing was erased: 2 postings + 2 on edit + 2 cancellations on delete.
    expect((await listMovements({ shopId: shop.id })).length).toBe(6);
  });

  it("keeps the ledger totals equal to the sum of several records, as they are edited", async () => {
    const models = getModels();
    const { shop, serviceCase, vehicle, customer, technician, recovery, supply, user } =
      await createShopWithCylinders(models);
    const second = await addCase(models, shop.id, vehicle.id, customer.id, technician.id);
    const a = await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({
        recoveredChargeG: 410,
        recoveryCylinderId: recovery.id,
        chargedG: 500,
        chargeCylinderId: supply.id,
      }),
    });
    await saveServiceRecord({
      user,
      caseId: second.id,
      input: recordInput({ recoveredChargeG: 735, recoveryCylinderId: recovery.id }),
    });
    expect(await totals(shop.id)).toEqual(await recordSums(shop.id));
    await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({
        baseVersion: a.record.version,
        recoveredChargeG: 0,
        recoveryCylinderId: recovery.id,
        chargedG: 515,
        chargeCylinderId: supply.id,
      }),
    });
    expect(await totals(shop.id)).toEqual(await recordSums(shop.id));
    expect(await totals(shop.id)).toEqual({ recoveredChargeG: 735, chargedG: 515 });
  });

  it("refuses a stale version with 409 and leaves record and ledger as they were", async () => {
    const models = getModels();
    const { shop, serviceCase, recovery, user } = await createShopWithCylinders(models);
    const first = await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({ recoveredChargeG: 300, recoveryCylinderId: recovery.id }),
    });
    await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({
        baseVersion: first.record.version,
        recoveredChargeG: 310,
        recoveryCylinderId: recovery.id,
      }),
    });
    const stale = saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({
        baseVersion: first.record.version,
        recoveredChargeG: 999,
        recoveryCylinderId: recovery.id,
      }),
    });
    await expect(stale).rejects.toMatchObject({ status: 409 });
    expect((await getServiceRecord({ shopId: shop.id, caseId: serviceCase.id }))?.recoveredChargeG).toBe(310);
    expect(await netOf(shop.id, recovery.id)).toBe(1000 + 310);
  });

  it("refuses a cylinder of the wrong refrigerant or kind with a field message", async () => {
    const models = getModels();
    const { shop, serviceCase, supply, user } = await createShopWithCylinders(models);
    const yf = await models.Cylinder.create({
      shopId: shop.id,
      label: `YF-${shop.id}`,
      refrigerant: "R-1234yf",
      kind: "recovery",
      tareG: 7000,
      capacityG: 22_000,
    });
    const wrongGas = saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({ recoveredChargeG: 500, recoveryCylinderId: yf.id }),
    });
    await expect(wrongGas).rejects.toMatchObject({
      status: 400,
      fieldErrors: { recoveryCylinderId: [expect.stringMatching(/Never mix/)] },
    });
    const wrongKind = saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({ recoveredChargeG: 500, recoveryCylinderId: supply.id }),
    });
    await expect(wrongKind).rejects.toMatchObject({ status: 400 });
    expect(await getServiceRecord({ shopId: shop.id, caseId: serviceCase.id })).toBeNull();
  });

  it("answers 404 for another shop's case and 400 for another shop's cylinder", async () => {
    const models = getModels();
    const a = await createShopWithCylinders(models);
    const b = await createShopWithCylinders(models);
    const foreignCase = saveServiceRecord({ user: a.user, caseId: b.serviceCase.id, input: recordInput() });
    await expect(foreignCase).rejects.toMatchObject({ status: 404 });
    const foreignCylinder = saveServiceRecord({
      user: a.user,
      caseId: a.serviceCase.id,
      input: recordInput({ recoveredChargeG: 200, recoveryCylinderId: b.recovery.id }),
    });
    await expect(foreignCylinder).rejects.toBeInstanceOf(AppError);
    await expect(foreignCylinder).rejects.toMatchObject({ status: 400 });
    await expect(
      deleteServiceRecord({ user: a.user, caseId: b.serviceCase.id, version: 1 }),
    ).rejects.toMatchObject({ status: 404 });
    expect(await netOf(b.shop.id, b.recovery.id)).toBe(1000);
  });

  it("stores a final reading set of kind 'final' and the hold verdict", async () => {
    const models = getModels();
    const { serviceCase, user } = await createShopWithCylinders(models);
    const saved = await saveServiceRecord({
      user,
      caseId: serviceCase.id,
      input: recordInput({
        step: "final",
        holdStartKpaAbs: 3,
        holdEndKpaAbs: 3 + 3 * 3.386389,
        holdMinutes: 5,
        finalAmbientC: 27,
        finalVentC: 6.5,
        finalHighKpaGauge: 1250,
        finalLowKpaGauge: 210,
      }),
    });
    expect(saved.record.holdPassed).toBe(false); // 3 inHg in 5 min > 2 inHg limit (TM 5-2420-230-24-1 field practice)
    const reading = await models.ReadingSet.findOne({
      where: { id: saved.record.finalReadingSetId! },
      raw: true,
    });
    expect(reading?.kind).toBe("final");
    expect(saved.record.finalVentC).toBe(6.5);
  });
});
