import { QueryTypes, type QueryInterface } from "sequelize";
import type { MigrationParams } from "umzug";

type Params = MigrationParams<QueryInterface>;

// One stored value per figure (lib/server/case-figures/): the label charge moves onto the vehicle,
// and the recovered mass, oil drained, identifier result and charged mass onto the case's service
// record where it has one; the interview's answers keep them only while no record exists. Where two
// copies disagreed, the kept one wins (the record's: it posted to the ledger; the vehicle's: it is
// the label's) and the other is written to the audit trail, so no figure ever typed is lost. Self-
// contained on purpose: a landed migration must not change when the app's code does.

// Whichever copy is kept, the answers' group and field it was asked in.
const FIGURES = [
  ["labelChargeG", "system", "label_charge_g"],
  ["recoveredChargeG", "chargeAudit", "recovered_charge_g"],
  ["oilRemovedMl", "chargeAudit", "oil_removed_ml"],
  ["purityPct", "identification", "purity_pct"],
  ["airPct", "identification", "air_pct"],
  ["chargedG", "chargeAudit", "charged_g"],
] as const;
const BATCH = 500;

type Json = Record<string, unknown>;
type CaseRow = {
  id: number;
  shop_id: number;
  vehicle_id: number | null;
  answers: unknown;
  vehicle_label: number | null;
  record_id: number | null;
} & Partial<Record<(typeof FIGURES)[number][2], unknown>>;

const isObject = (v: unknown): v is Json => typeof v === "object" && v !== null && !Array.isArray(v);
function parse(v: unknown): Json {
  if (typeof v === "string")
    try {
      v = JSON.parse(v);
    } catch {
      return {};
    }
  return isObject(v) ? v : {};
}
const num = (v: unknown) => (v === null || v === undefined || v === "" ? null : Number(v));

async function batches(qi: QueryInterface, visit: (rows: CaseRow[]) => Promise<void>) {
  let after = 0;
  for (;;) {
    const rows = await qi.sequelize.query<CaseRow>(
      `SELECT c.id, c.shop_id, c.vehicle_id, c.answers, v.label_charge_g AS vehicle_label, r.id AS record_id,
              r.recovered_charge_g, r.oil_removed_ml, r.purity_pct, r.air_pct, r.charged_g
         FROM service_case c
         LEFT JOIN vehicle v ON v.id = c.vehicle_id
         LEFT JOIN service_record r ON r.case_id = c.id
        WHERE c.id > ? ORDER BY c.id LIMIT ${BATCH}`,
      { type: QueryTypes.SELECT, replacements: [after] },
    );
    if (rows.length === 0) return;
    await visit(rows);
    after = rows[rows.length - 1]!.id;
  }
}

async function auditDropped(qi: QueryInterface, row: CaseRow, figure: string, dropped: number, kept: number) {
  await qi.sequelize.query(
    "INSERT INTO audit_event (shop_id, actor_id, entity, entity_id, action, detail, created_at) VALUES (?, NULL, 'case', ?, 'figure_merged', ?, NOW(3))",
    { replacements: [row.shop_id, String(row.id), JSON.stringify({ figure, dropped, kept })] },
  );
}

export async function up({ context: qi }: Params) {
  // The record's own label charge first: onto its vehicle where the vehicle had none.
  const labelled = await qi.sequelize.query<{
    id: number;
    shop_id: number;
    label: number;
    vehicle_id: number;
    vehicle_label: number | null;
  }>(
    `SELECT c.id, c.shop_id, r.label_charge_g AS label, v.id AS vehicle_id, v.label_charge_g AS vehicle_label
       FROM service_record r JOIN service_case c ON c.id = r.case_id JOIN vehicle v ON v.id = c.vehicle_id
      WHERE r.label_charge_g IS NOT NULL`,
    { type: QueryTypes.SELECT },
  );
  for (const l of labelled) {
    if (l.vehicle_label === null) {
      await qi.sequelize.query(
        "UPDATE vehicle SET label_charge_g = ? WHERE id = ? AND label_charge_g IS NULL",
        {
          replacements: [l.label, l.vehicle_id],
        },
      );
      l.vehicle_label = l.label;
    } else if (Number(l.vehicle_label) !== Number(l.label))
      await auditDropped(
        qi,
        { id: l.id, shop_id: l.shop_id } as CaseRow,
        "labelChargeG",
        Number(l.label),
        Number(l.vehicle_label),
      );
  }
  await qi.sequelize.query("UPDATE service_record SET label_charge_g = NULL");

  await batches(qi, async (rows) => {
    for (const row of rows) {
      const record = parse(row.answers);
      const answers = parse(record.answers);
      let changed = false;
      const recordSets: string[] = [];
      const recordValues: number[] = [];
      for (const [id, group, column] of FIGURES) {
        const home = id === "labelChargeG" ? row.vehicle_id : row.record_id;
        const g = answers[group];
        if (home === null || !isObject(g) || typeof g[id] !== "number") continue;
        const typed = g[id] as number;
        const kept = id === "labelChargeG" ? num(row.vehicle_label) : num(row[column]);
        if (kept === null) {
          // Whole grams and millilitres, as the homes store them.
          const value = id === "purityPct" || id === "airPct" ? typed : Math.round(typed);
          if (id === "labelChargeG")
            await qi.sequelize.query("UPDATE vehicle SET label_charge_g = ? WHERE id = ?", {
              replacements: [value, row.vehicle_id],
            });
          else {
            recordSets.push(`${column} = ?`);
            recordValues.push(value);
          }
        } else if (Math.abs(kept - typed) > 0.005) await auditDropped(qi, row, id, typed, kept);
        const next = { ...g };
        delete next[id];
        answers[group] = next;
        changed = true;
      }
      if (recordSets.length > 0)
        await qi.sequelize.query(`UPDATE service_record SET ${recordSets.join(", ")} WHERE id = ?`, {
          replacements: [...recordValues, row.record_id],
        });
      if (changed)
        await qi.sequelize.query("UPDATE service_case SET answers = ? WHERE id = ?", {
          replacements: [JSON.stringify({ ...record, answers }), row.id],
        });
    }
  });
}

export async function down({ context: qi }: Params) {
  // The figures back into the answers that asked them, and the label charge back onto the record.
  await qi.sequelize.query(
    `UPDATE service_record r JOIN service_case c ON c.id = r.case_id JOIN vehicle v ON v.id = c.vehicle_id
        SET r.label_charge_g = v.label_charge_g`,
  );
  await batches(qi, async (rows) => {
    for (const row of rows) {
      const record = parse(row.answers);
      const answers = parse(record.answers);
      let changed = false;
      for (const [id, group, column] of FIGURES) {
        const value =
          id === "labelChargeG" ? num(row.vehicle_label) : row.record_id ? num(row[column]) : null;
        const g = answers[group];
        if (value === null || !isObject(g)) continue;
        answers[group] = { ...g, [id]: value };
        changed = true;
      }
      if (changed)
        await qi.sequelize.query("UPDATE service_case SET answers = ? WHERE id = ?", {
          replacements: [JSON.stringify({ ...record, answers }), row.id],
        });
    }
  });
}
