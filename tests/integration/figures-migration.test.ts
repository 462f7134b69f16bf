import { QueryTypes, type Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createMigrator } from "@/lib/db/migrator";
import { createSequelize } from "@/lib/db/sequelize";
import { integrationDb, settingsFromUrl } from "./helpers";

// On the schema database (never the seeded one): cases written while a figure could be typed twice.
const MIGRATION = "20261204-3001-keep-each-case-figure-once";
let sequelize: Sequelize;

beforeAll(() => {
  sequelize = createSequelize(settingsFromUrl(integrationDb().schemaDatabaseUrl));
});
afterAll(() => sequelize.close());

async function insertId(sql: string, replacements: unknown[]): Promise<number> {
  const [id] = await sequelize.query(sql, { replacements, type: QueryTypes.INSERT });
  return Number(id);
}

const select = <T extends object>(sql: string, replacements: unknown[]) =>
  sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });

describe(`migration ${MIGRATION}`, () => {
  it("moves each figure to its one home, keeps the answers that stay, and audits every copy it drops", async () => {
    const migrator = createMigrator(sequelize);
    await migrator.up();
    await migrator.down({ to: MIGRATION });
    expect((await migrator.executed()).map((m) => m.name)).not.toContain(MIGRATION);

    const shopId = await insertId("INSERT INTO shop (name) VALUES ('Figures shop')", []);
    const userId = `fig${shopId}tech`;
    await sequelize.query(
      "INSERT INTO `user` (id, shop_id, email, name, password_hash, role, active, created_at, updated_at) VALUES (?, ?, ?, 'Fig Tech', 'x', 'technician', 1, NOW(3), NOW(3))",
      { replacements: [userId, shopId, `fig-${shopId}@fixture.test`] },
    );
    const customerId = await insertId(
      "INSERT INTO customer (shop_id, name, created_at, updated_at) VALUES (?, 'Fig Customer', NOW(3), NOW(3))",
      [shopId],
    );
    const vehicle = (label: number | null) =>
      insertId(
        "INSERT INTO vehicle (shop_id, customer_id, year, make, model, refrigerant, expansion_device, label_charge_g, created_at, updated_at) " +
          "VALUES (?, ?, 2016, 'Kia', 'Soul', 'R-134a', 'txv', ?, NOW(3), NOW(3))",
        [shopId, customerId, label],
      );
    const caseWith = (vehicleId: number, answers: object) =>
      insertId(
        "INSERT INTO service_case (shop_id, customer_id, vehicle_id, technician_id, complaint, answers, symptom_tags, created_at, updated_at) " +
          "VALUES (?, ?, ?, ?, 'Warm air', ?, '[]', NOW(3), NOW(3))",
        [shopId, customerId, vehicleId, userId, JSON.stringify({ answers, drafts: {}, skipped: [] })],
      );
    const system = { refrigerant: "R-134a", expansionDevice: "txv", compressorType: "unknown" };

    // A case with a record: the record had no oil figure (typed only in the interview), a different
    // recovered mass (the record's wins: it posted to the ledger), and its own copy of the label.
    const unlabelled = await vehicle(null);
    const withRecord = await caseWith(unlabelled, {
      system: { ...system, labelChargeG: 600 },
      identification: { purityPct: 98.5, hydrocarbonFlagged: false },
      chargeAudit: { recovered: true, recoveredChargeG: 410, oilRemovedMl: 20 },
    });
    const recordId = await insertId(
      "INSERT INTO service_record (shop_id, case_id, technician_id, refrigerant, label_charge_g, recovered_charge_g, parts_replaced, created_at, updated_at) " +
        "VALUES (?, ?, ?, 'R-134a', 600, 430, '[]', NOW(3), NOW(3))",
      [shopId, withRecord, userId],
    );
    // A case with no record: its answers keep the record's figures; the label goes to the vehicle,
    // whose own (different) label wins.
    const labelled = await vehicle(570);
    const noRecord = await caseWith(labelled, {
      system: { ...system, labelChargeG: 590 },
      chargeAudit: { recovered: true, recoveredChargeG: 500 },
    });

    await migrator.up();

    const [record] = await select<Record<string, unknown>>(
      "SELECT label_charge_g, recovered_charge_g, oil_removed_ml, purity_pct FROM service_record WHERE id = ?",
      [recordId],
    );
    expect(record).toEqual({
      label_charge_g: null,
      recovered_charge_g: 430,
      oil_removed_ml: 20,
      purity_pct: 98.5,
    });
    const labels = await select<{ id: number; label_charge_g: number | null }>(
      "SELECT id, label_charge_g FROM vehicle WHERE id IN (?, ?) ORDER BY id",
      [unlabelled, labelled],
    );
    expect(labels.map((v) => v.label_charge_g)).toEqual([600, 570]);
    const answersOf = async (caseId: number) => {
      const [row] = await select<{ answers: unknown }>("SELECT answers FROM service_case WHERE id = ?", [
        caseId,
      ]);
      const parsed = typeof row!.answers === "string" ? JSON.parse(row!.answers) : row!.answers;
      return (parsed as { answers: Record<string, unknown> }).answers;
    };
    expect(await answersOf(withRecord)).toEqual({
      system,
      identification: { hydrocarbonFlagged: false },
      chargeAudit: { recovered: true },
    });
    expect(await answersOf(noRecord)).toEqual({
      system,
      chargeAudit: { recovered: true, recoveredChargeG: 500 },
    });
    const dropped = await select<{ entity_id: string; detail: unknown }>(
      "SELECT entity_id, detail FROM audit_event WHERE shop_id = ? AND action = 'figure_merged' ORDER BY id",
      [shopId],
    );
    expect(
      dropped.map((d) => [
        Number(d.entity_id),
        typeof d.detail === "string" ? JSON.parse(d.detail) : d.detail,
      ]),
    ).toEqual([
      [withRecord, { figure: "recoveredChargeG", dropped: 410, kept: 430 }],
      [noRecord, { figure: "labelChargeG", dropped: 590, kept: 570 }],
    ]);

    // Down puts each kept figure back into the answers that asked it, and the label onto the record.
    await migrator.down({ to: MIGRATION });
    expect((await answersOf(withRecord)).chargeAudit).toEqual({
      recovered: true,
      recoveredChargeG: 430,
      oilRemovedMl: 20,
    });
    const [back] = await select<{ label_charge_g: number }>(
      "SELECT label_charge_g FROM service_record WHERE id = ?",
      [recordId],
    );
    expect(back!.label_charge_g).toBe(600);
    await migrator.up();

    await sequelize.query("DELETE FROM audit_event WHERE shop_id = ?", { replacements: [shopId] });
    await sequelize.query("DELETE FROM service_record WHERE shop_id = ?", { replacements: [shopId] });
    await sequelize.query("DELETE FROM service_case WHERE shop_id = ?", { replacements: [shopId] });
    await sequelize.query("DELETE FROM vehicle WHERE shop_id = ?", { replacements: [shopId] });
    await sequelize.query("DELETE FROM customer WHERE shop_id = ?", { replacements: [shopId] });
    await sequelize.query("DELETE FROM `user` WHERE shop_id = ?", { replacements: [shopId] });
    await sequelize.query("DELETE FROM shop WHERE id = ?", { replacements: [shopId] });
  });
});
