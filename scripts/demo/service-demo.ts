import type { ServiceRefrigerantId } from "@/lib/refrigerants/catalog";
import type { Models } from "@/models";
import type { CylinderKind } from "@/models";
import { DEFAULT_PART_OIL_ALLOWANCES_ML, REPLACED_PART_IDS } from "@/lib/service/oil";

// Demo data only. The spec-table charges and oil figures below are INVENTED for the demo
// shops (real makes and models, made-up numbers); never use them to charge a vehicle.

type DemoSpec = {
  yearFrom: number;
  yearTo: number;
  make: string;
  model: string;
  variant: string;
  rearAc: boolean;
  refrigerant: ServiceRefrigerantId;
  labelChargeG: number;
  oilType: string;
  totalOilMl: number | null;
};
type DemoCylinder = {
  label: string;
  serial: string;
  refrigerant: ServiceRefrigerantId;
  kind: CylinderKind;
  tareG: number;
  capacityG: number;
  initialNetG: number;
};

const harbourlineSpecs: DemoSpec[] = [
  {
    yearFrom: 2012,
    yearTo: 2018,
    make: "Ford",
    model: "Focus",
    variant: "2.0 L I4",
    rearAc: false,
    refrigerant: "R-134a",
    labelChargeG: 570,
    oilType: "PAG 46",
    totalOilMl: 150,
  },
  {
    yearFrom: 2017,
    yearTo: 2022,
    make: "Honda",
    model: "CR-V",
    variant: "1.5 L turbo",
    rearAc: false,
    refrigerant: "R-1234yf",
    labelChargeG: 450,
    oilType: "PAG 46",
    totalOilMl: 120,
  },
  {
    yearFrom: 2014,
    yearTo: 2018,
    make: "Chevrolet",
    model: "Silverado 1500",
    variant: "5.3 L V8",
    rearAc: false,
    refrigerant: "R-134a",
    labelChargeG: 740,
    oilType: "PAG 150",
    totalOilMl: 240,
  },
  {
    yearFrom: 2014,
    yearTo: 2018,
    make: "Chevrolet",
    model: "Silverado 1500",
    variant: "5.3 L V8",
    rearAc: true,
    refrigerant: "R-134a",
    labelChargeG: 1130,
    oilType: "PAG 150",
    totalOilMl: 290,
  },
  {
    yearFrom: 2019,
    yearTo: 2024,
    make: "Toyota",
    model: "RAV4 Hybrid",
    variant: "2.5 L hybrid",
    rearAc: false,
    refrigerant: "R-1234yf",
    labelChargeG: 480,
    oilType: "POE (dielectric)",
    totalOilMl: 110,
  },
];
const ridgebackSpecs: DemoSpec[] = [
  {
    yearFrom: 2006,
    yearTo: 2011,
    make: "Ford",
    model: "Ranger",
    variant: "4.0 L V6",
    rearAc: false,
    refrigerant: "R-134a",
    labelChargeG: 630,
    oilType: "PAG 46",
    totalOilMl: 210,
  },
];

const harbourlineCylinders: DemoCylinder[] = [
  {
    label: "HL-REC-1",
    serial: "RC-20931",
    refrigerant: "R-134a",
    kind: "recovery",
    tareG: 7_250,
    capacityG: 22_680,
    initialNetG: 3_410,
  },
  {
    label: "HL-REC-YF",
    serial: "RC-31177",
    refrigerant: "R-1234yf",
    kind: "recovery",
    tareG: 7_250,
    capacityG: 22_680,
    initialNetG: 880,
  },
  {
    label: "HL-SUP-134A",
    serial: "VS-88410",
    refrigerant: "R-134a",
    kind: "virgin",
    tareG: 6_120,
    capacityG: 13_610,
    initialNetG: 9_870,
  },
  {
    label: "HL-SUP-YF",
    serial: "VS-90562",
    refrigerant: "R-1234yf",
    kind: "virgin",
    tareG: 4_900,
    capacityG: 4_540,
    initialNetG: 4_540,
  },
];
const ridgebackCylinders: DemoCylinder[] = [
  {
    label: "RB-REC-1",
    serial: "RC-77120",
    refrigerant: "R-134a",
    kind: "recovery",
    tareG: 7_250,
    capacityG: 22_680,
    initialNetG: 1_200,
  },
  {
    label: "RB-SUP-134A",
    serial: "VS-77311",
    refrigerant: "R-134a",
    kind: "virgin",
    tareG: 6_120,
    capacityG: 13_610,
    initialNetG: 13_610,
  },
];

const DEMO: Record<string, { specs: DemoSpec[]; cylinders: DemoCylinder[] }> = {
  "Harbourline Auto Climate": { specs: harbourlineSpecs, cylinders: harbourlineCylinders },
  "Ridgeback Cooling Works": { specs: ridgebackSpecs, cylinders: ridgebackCylinders },
};

/**
 * Spec rows, cylinders and one finished service record (Harbourline's closed Focus case) for
 * the demo shops. A shop that already has spec rows or cylinders is left as it is.
 */
export async function seedServiceDemo({ models }: { models: Models }): Promise<string[]> {
  const done: string[] = [];
  for (const [shopName, demo] of Object.entries(DEMO)) {
    const shop = await models.Shop.findOne({ where: { name: shopName } });
    if (!shop) continue;
    if (
      (await models.SpecEntry.count({ where: { shopId: shop.id } })) > 0 ||
      (await models.Cylinder.count({ where: { shopId: shop.id } })) > 0
    )
      continue;
    let withRecord = false;
    await models.sequelize.transaction(async (transaction) => {
      await models.SpecEntry.bulkCreate(
        demo.specs.map((s) => ({ ...s, shopId: shop.id })),
        { transaction },
      );
      await models.PartOilAllowance.bulkCreate(
        REPLACED_PART_IDS.map((part) => ({
          shopId: shop.id,
          part,
          allowanceMl: DEFAULT_PART_OIL_ALLOWANCES_ML[part],
        })),
        { transaction, ignoreDuplicates: true },
      );
      const cylinders = new Map<string, number>();
      for (const c of demo.cylinders)
        cylinders.set(c.label, (await models.Cylinder.create({ ...c, shopId: shop.id }, { transaction })).id);
      if (shopName !== "Harbourline Auto Climate") return;

      const tech = await models.User.findOne({ where: { shopId: shop.id, role: "technician" }, transaction });
      const focus = await models.Vehicle.findOne({
        where: { shopId: shop.id, make: "Ford", model: "Focus" },
        transaction,
      });
      const focusCase =
        focus &&
        (await models.Case.findOne({ where: { shopId: shop.id, vehicleId: focus.id }, transaction }));
      const spec = await models.SpecEntry.findOne({
        where: { shopId: shop.id, make: "Ford", model: "Focus" },
        transaction,
      });
      if (!tech || !focusCase || !spec) return;
      const recoveryId = cylinders.get("HL-REC-1")!;
      const supplyId = cylinders.get("HL-SUP-134A")!;
      const startedAt = new Date(focusCase.createdAt.getTime() + 95 * 60_000);
      const endedAt = new Date(startedAt.getTime() + 22 * 60_000);
      const chargedAt = new Date(endedAt.getTime() + 70 * 60_000);
      // Invented job: the system was short (430 g recovered against 570 g), a leaking
      // condenser was replaced, 30 mL allowance plus 12 mL drained went back in.
      const record = await models.ServiceRecord.create(
        {
          shopId: shop.id,
          caseId: focusCase.id,
          technicianId: tech.id,
          refrigerant: "R-134a",
          step: "final",
          specEntryId: spec.id,
          labelChargeG: 570,
          purityPct: 99.4,
          airPct: 0.3,
          recoveryStartedAt: startedAt,
          recoveryEndedAt: endedAt,
          recoveredChargeG: 430,
          recoveryCylinderId: recoveryId,
          oilRemovedMl: 12,
          oilPulled: false,
          deepestKpaAbs: 0.35,
          holdStartKpaAbs: 0.4,
          holdEndKpaAbs: 1.6,
          holdMinutes: 10,
          holdPassed: true,
          oilAddedType: "PAG 46",
          oilAddedMl: 42,
          partsReplaced: [{ part: "condenser", count: 1, measuredMl: null }],
          targetG: 570,
          chargedG: 572,
          chargeCylinderId: supplyId,
          notes: "Demo record (invented).",
        },
        { transaction },
      );
      const base = {
        shopId: shop.id,
        caseId: focusCase.id,
        serviceRecordId: record.id,
        technicianId: tech.id,
        refrigerant: "R-134a" as const,
      };
      await models.RefrigerantMovement.create(
        { ...base, cylinderId: recoveryId, type: "recovered_into", massG: 430, occurredAt: endedAt },
        { transaction },
      );
      await models.RefrigerantMovement.create(
        { ...base, cylinderId: supplyId, type: "charged_from", massG: 572, occurredAt: chargedAt },
        { transaction },
      );
      const final = await models.ReadingSet.create(
        {
          shopId: shop.id,
          caseId: focusCase.id,
          kind: "final",
          ambientC: 24,
          highKpaGauge: 1180,
          lowKpaGauge: 200,
          ventC: 5.5,
          takenAt: new Date(chargedAt.getTime() + 15 * 60_000),
        },
        { transaction },
      );
      await record.update({ finalReadingSetId: final.id }, { transaction });
      withRecord = true;
    });
    done.push(`${shopName}: spec table, cylinders${withRecord ? ", a service record" : ""}`);
  }
  return done;
}
