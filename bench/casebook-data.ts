// A throwaway database of invented cases at scale: 50 shops and 100,000 cases by default, each case with
// its casebook rows, symptoms, readings and (when closed) confirmed causes and repairs. Reusable: other
// benchmarks call ensureBenchDatabase() and get the same database (its own scripts/db.sh instance in /tmp).
//
//   npx tsx bench/casebook-data.ts            fills /tmp/cw-bench-casebook (port 3531) unless already full
//   BENCH_DB_DIR=… BENCH_DB_PORT=… BENCH_CASES=… BENCH_SHOPS=…  move or resize it
//
// Everything here is generated: shops, people, vehicles, words and readings are invented scenarios.
import { execFileSync } from "node:child_process";
import { createHash } from "node:crypto";
import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { randomBytes } from "node:crypto";
import { QueryTypes, type Sequelize } from "sequelize";
import { CAUSE_IDS, type CauseId } from "@/lib/diagnosis/causes";
import { SYMPTOM_IDS } from "@/lib/diagnosis/symptoms";
import { REPAIR_IDS } from "@/lib/repairs/catalog";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import { caseFeaturesFrom } from "@/lib/casebook/features";
import { caseSearchText } from "@/lib/casebook/search-text";
import { shopIndexTerms } from "@/lib/casebook/words";

export const BENCH_PASSWORD = "bench-only-password";
const REPO = path.resolve(__dirname, "..");
const dayMs = 86_400_000;
const BUFFER_POOL_BYTES = 1024 * 1048576;
const BENCH_DB_NAME = "chillwright_bench";

/**
 * What a filled database was made from: this generator, the casebook code that shapes its rows (words,
 * search text, readings), the migrations and the size asked for. A database with another stamp (or none:
 * filled by an older generator, or interrupted) is dropped and filled again rather than measured stale.
 */
function fillStamp(shops: number, cases: number): string {
  const hash = createHash("sha256");
  const files = [
    "bench/casebook-data.ts",
    ...readdirSync(path.join(REPO, "lib/casebook"))
      .filter((f) => f.endsWith(".ts") && !f.endsWith(".test.ts"))
      .map((f) => `lib/casebook/${f}`),
    ...readdirSync(path.join(REPO, "migrations")).map((f) => `migrations/${f}`),
  ].sort();
  for (const file of files) hash.update(file).update(readFileSync(path.join(REPO, file)));
  return `${hash.digest("hex").slice(0, 16)}:${shops}:${cases}`;
}

function rootSql(dir: string, sql: string): string {
  return execFileSync("mariadb", ["--no-defaults", `--socket=${dir}/sock`, "-uroot", "-N", "-B", "-e", sql], {
    encoding: "utf8",
    stdio: ["ignore", "pipe", "pipe"],
  });
}

export interface BenchDatabaseOptions {
  dir?: string;
  port?: number;
  shops?: number;
  cases?: number;
  /** Print progress lines. */
  log?: (line: string) => void;
}

/** A small, seeded generator so the same options always give the same database. */
export function prng(seed: number) {
  let s = seed >>> 0;
  const next = () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const int = (lo: number, hi: number) => lo + Math.floor(next() * (hi - lo + 1));
  const pick = <T>(items: readonly T[]): T => items[Math.floor(next() * items.length)]!;
  const normal = (mean: number, sd: number) => {
    const u = Math.max(next(), 1e-9);
    return mean + sd * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * next());
  };
  const weighted = <T extends string>(weights: Record<T, number>): T => {
    const entries = Object.entries(weights) as [T, number][];
    let r = next() * entries.reduce((sum, [, w]) => sum + w, 0);
    for (const [key, w] of entries) if ((r -= w) <= 0) return key;
    return entries[entries.length - 1]![0];
  };
  return { next, int, pick, normal, weighted };
}

// How often each cause turns out to be the answer, roughly as a shop sees them (from memory).
const CAUSE_MIX: Record<CauseId, number> = {
  undercharge: 30,
  condenser_airflow: 12,
  overcharge: 9,
  weak_compressor: 8,
  no_refrigerant_fault: 6,
  non_condensables: 6,
  metering_restriction: 6,
  moisture: 5,
  evaporator_icing: 5,
  high_side_restriction: 4,
  oil_loss: 3,
  metering_stuck_open: 3,
  contaminated_refrigerant: 2,
};

/** Offsets from a healthy system: condensing, evaporating (°C), subcooling, superheat (K), charge (%). */
const PROFILE: Record<CauseId, [number, number, number, number, number]> = {
  undercharge: [-8, -6, -5, 12, -30],
  overcharge: [10, 4, 8, -4, 25],
  condenser_airflow: [15, 3, 0, -1, 0],
  non_condensables: [12, 2, -2, 0, 0],
  moisture: [0, -5, 0, 8, 0],
  metering_restriction: [2, -12, 5, 15, 0],
  high_side_restriction: [-3, -10, 10, 10, 0],
  metering_stuck_open: [-3, 6, -2, -6, 0],
  weak_compressor: [-10, 8, -2, 3, 0],
  evaporator_icing: [0, -6, 0, -2, 0],
  contaminated_refrigerant: [6, 2, 0, 0, 0],
  oil_loss: [-3, 3, 0, 0, 0],
  no_refrigerant_fault: [0, 0, 0, 0, 0],
};

const SYMPTOMS_BY_CAUSE: Record<CauseId, string[]> = {
  undercharge: ["clutch_rapid_cycling", "oil_residue_at_fitting", "bubbles_in_sight_glass", "leak_found"],
  overcharge: ["high_pressure_cutout", "recent_service_elsewhere", "worse_at_idle"],
  condenser_airflow: ["worse_at_idle", "condenser_fan_not_running", "water_spray_drops_head_pressure"],
  non_condensables: ["gauge_needle_flutter", "recent_service_elsewhere", "high_pressure_cutout"],
  moisture: ["cooling_fades_then_returns", "low_side_swings_to_vacuum", "moisture_indicator_wet"],
  metering_restriction: ["frost_at_metering_device", "low_side_swings_to_vacuum", "evaporator_airflow_drops"],
  high_side_restriction: ["frost_on_liquid_line", "liquid_line_temperature_drop"],
  metering_stuck_open: ["suction_line_frosted", "txv_bulb_test_no_response"],
  weak_compressor: ["compressor_noise", "pressures_equalise_fast", "clutch_or_belt_slipping"],
  evaporator_icing: ["evaporator_airflow_drops", "clutch_not_cycling"],
  contaminated_refrigerant: ["identifier_flags_hydrocarbon", "recent_service_elsewhere"],
  oil_loss: ["oil_pulled_during_recovery", "compressor_noise"],
  no_refrigerant_fault: ["condenser_fan_running", "low_side_steady"],
};

const REPAIRS_BY_CAUSE: Record<CauseId, string[]> = {
  undercharge: ["leak_repair", "replace_hose", "recover_evacuate_recharge"],
  overcharge: ["recover_evacuate_recharge"],
  condenser_airflow: ["condenser_fan_repair", "clean_condenser"],
  non_condensables: ["recover_evacuate_recharge", "replace_drier"],
  moisture: ["replace_drier", "recover_evacuate_recharge"],
  metering_restriction: ["replace_orifice_tube", "replace_expansion_valve", "flush_system"],
  high_side_restriction: ["replace_drier", "replace_condenser"],
  metering_stuck_open: ["replace_expansion_valve"],
  weak_compressor: ["replace_compressor", "compressor_clutch_repair"],
  evaporator_icing: ["cycling_control_repair", "replace_cabin_filter"],
  contaminated_refrigerant: ["contaminated_refrigerant_removal", "recover_evacuate_recharge"],
  oil_loss: ["oil_correction", "leak_repair"],
  no_refrigerant_fault: ["further_diagnosis", "replace_cabin_filter"],
};

const OPENERS = [
  "Air is warm",
  "Not cold enough",
  "Blows warm",
  "Cooling is weak",
  "A/C stopped cooling",
  "Lukewarm air from the vents",
  "Only cool, never cold",
  "Cold on one side only",
  "Cooling comes and goes",
  "Takes ages to cool down",
];
const WHEN = [
  "at idle",
  "in traffic",
  "on the highway",
  "after twenty minutes of driving",
  "on hot afternoons",
  "first thing in the morning",
  "when parked with the engine running",
  "at stoplights",
  "with a full load of passengers",
  "after a long climb",
];
const CAUSE_WORDS: Record<CauseId, string[]> = {
  undercharge: ["compressor clicks on and off", "hissing under the hood", "oily patch near the condenser"],
  overcharge: ["since a top-up elsewhere", "loud click from the engine bay", "cuts out on hot days"],
  condenser_airflow: ["fan seems quiet", "leaves packed in the grille", "temperature gauge creeps up"],
  non_condensables: ["after a repair elsewhere", "gauges jump around", "never as cold as when new"],
  moisture: ["cold then warm every few minutes", "ice on the pipe by the firewall"],
  metering_restriction: ["frost on a pipe near the firewall", "airflow cold then weak"],
  high_side_restriction: ["one pipe is frosty", "cold spot on the line behind the grille"],
  metering_stuck_open: ["suction pipe sweating heavily", "frost back to the compressor"],
  weak_compressor: ["grinding noise", "rattle when the A/C switches on", "belt squeal"],
  evaporator_icing: ["airflow drops after an hour", "water dripping in the footwell", "vents ice up"],
  contaminated_refrigerant: ["topped up from a parts-store can", "odd smell at the service port"],
  oil_loss: ["compressor got noisy", "oil drips under the front"],
  no_refrigerant_fault: ["blend door clicks", "musty smell from the vents", "cabin filter looks dirty"],
};
const NOTE_WORDS = [
  "checked the fuse and relay",
  "static pressure matched ambient",
  "vent temperature measured at the centre outlet",
  "readings taken at 1500 rpm with doors open",
  "identifier showed clean refrigerant",
  "dye added for a return visit",
  "condenser face inspected",
  "belt tension within range",
];
const SENIOR_WORDS = [
  "Good readings; confirm with a static check first.",
  "Agreed. Weigh the recovered charge before anything else.",
  "Look at condenser airflow before condemning the compressor.",
  "Check the cycling switch before replacing parts.",
  "Nice work on the leak search.",
];
const MODELS: { make: string; model: string; device: ExpansionDevice }[] = [
  { make: "Ford", model: "F-150", device: "orifice_tube" },
  { make: "Ford", model: "Transit", device: "orifice_tube" },
  { make: "Ford", model: "Escape", device: "txv" },
  { make: "Chevrolet", model: "Silverado", device: "orifice_tube" },
  { make: "Chevrolet", model: "Malibu", device: "orifice_tube" },
  { make: "Chevrolet", model: "Equinox", device: "txv" },
  { make: "GMC", model: "Sierra", device: "orifice_tube" },
  { make: "Ram", model: "1500", device: "orifice_tube" },
  { make: "Toyota", model: "Corolla", device: "txv" },
  { make: "Toyota", model: "RAV4", device: "txv" },
  { make: "Toyota", model: "Tacoma", device: "txv" },
  { make: "Honda", model: "Civic", device: "txv" },
  { make: "Honda", model: "CR-V", device: "txv" },
  { make: "Honda", model: "Odyssey", device: "txv" },
  { make: "Nissan", model: "Altima", device: "txv" },
  { make: "Nissan", model: "Rogue", device: "txv" },
  { make: "Hyundai", model: "Elantra", device: "txv" },
  { make: "Kia", model: "Sorento", device: "txv" },
  { make: "Subaru", model: "Outback", device: "txv" },
  { make: "Mazda", model: "CX-5", device: "txv" },
  { make: "Volkswagen", model: "Jetta", device: "txv" },
  { make: "Jeep", model: "Wrangler", device: "txv" },
  { make: "Dodge", model: "Grand Caravan", device: "orifice_tube" },
  { make: "Tesla", model: "Model 3", device: "txv" },
];
const STATUS_MIX = { closed: 70, signed_off: 10, draft: 8, awaiting_signoff: 5, sent_back: 7 };
const ROLES = ["owner", "senior", "technician", "technician", "technician", "apprentice"] as const;

function sentence(parts: string[]): string {
  const s = parts.filter(Boolean).join(", ");
  return `${s.charAt(0).toUpperCase()}${s.slice(1)}.`;
}

interface GeneratedCase {
  id: number;
  shopId: number;
  vehicleIdx: number;
  technicianId: string;
  status: keyof typeof STATUS_MIX;
  openedAt: Date;
  closedAt: Date | null;
  cause: CauseId;
}

const q = (sequelize: Sequelize, value: unknown) =>
  value === null || value === undefined
    ? "NULL"
    : value instanceof Date
      ? sequelize.escape(value.toISOString().slice(0, 23).replace("T", " "))
      : typeof value === "boolean"
        ? value
          ? "1"
          : "0"
        : typeof value === "object"
          ? sequelize.escape(JSON.stringify(value))
          : sequelize.escape(value as string | number);

async function insert(sequelize: Sequelize, table: string, columns: string[], rows: unknown[][]) {
  for (let i = 0; i < rows.length; i += 1000) {
    const chunk = rows.slice(i, i + 1000);
    await sequelize.query(
      `INSERT INTO \`${table}\` (${columns.map((c) => `\`${c}\``).join(", ")}) VALUES ${chunk
        .map((r) => `(${r.map((v) => q(sequelize, v)).join(", ")})`)
        .join(",\n")}`,
    );
  }
}

async function firstId(sequelize: Sequelize, sql: string): Promise<number> {
  const [row] = await sequelize.query<{ id: number }>(sql, { type: QueryTypes.SELECT });
  if (!row?.id) throw new Error(`no id from ${sql}`);
  return Number(row.id);
}

function lowerBase32(bytes: number) {
  const alphabet = "abcdefghijklmnopqrstuvwxyz234567";
  return [...randomBytes(bytes)].map((b) => alphabet[b & 31]).join("");
}

/** Adds `shops` shops and `cases` cases in all to a migrated database (empty, or a test's). */
export async function fillCasebookDatabase(
  sequelize: Sequelize,
  {
    shops = 50,
    cases = 100_000,
    passwordHash,
    namePrefix = "Bench shop",
    log = () => {},
  }: {
    shops?: number;
    cases?: number;
    passwordHash: string;
    /** Shop names are `${namePrefix} 1`, `${namePrefix} 2`, … */
    namePrefix?: string;
    log?: (line: string) => void;
  },
): Promise<{ shopIds: number[] }> {
  const rng = prng(20261203);
  const now = Date.now();
  const perShop = Math.ceil(cases / shops);
  // Case ids follow whatever the database already holds, so a test database can take a batch too.
  let caseId = await firstId(sequelize, "SELECT COALESCE(MAX(id), 0) + 1 AS id FROM service_case").then(
    (id) => id - 1,
  );
  const firstCase = caseId;
  const shopIds: number[] = [];
  for (let s = 1; s <= shops; s++) {
    const shopName = `${namePrefix} ${s}`;
    await sequelize.query(
      `INSERT INTO shop (name, units, altitude_m, time_zone) VALUES (${q(sequelize, shopName)}, ${q(sequelize, s % 3 === 0 ? "imperial" : "metric")}, ${s % 5 === 0 ? 1500 : 0}, 'UTC')`,
    );
    const shopId = await firstId(
      sequelize,
      `SELECT MAX(id) AS id FROM shop WHERE name = ${q(sequelize, shopName)}`,
    );
    shopIds.push(shopId);
    const users = ROLES.map((role, i) => ({
      id: lowerBase32(16),
      role,
      name: `${["Avery", "Blake", "Casey", "Devon", "Emery", "Finley"][i]} ${String.fromCharCode(65 + (s % 26))}.`,
      email: `${role}${i}.shop${s}@bench.test`,
    }));
    await insert(
      sequelize,
      "user",
      ["id", "shop_id", "email", "name", "password_hash", "role"],
      users.map((u) => [u.id, shopId, u.email, u.name, passwordHash, u.role]),
    );
    const technicians = users.filter((u) => u.role !== "owner");
    const vehicleCount = Math.round(perShop * 0.35);
    const customers = Array.from({ length: vehicleCount }, (_, i) => [
      shopId,
      `Customer ${s}-${i + 1}`,
      null,
      null,
    ]);
    await insert(sequelize, "customer", ["shop_id", "name", "phone", "email"], customers);
    const customerBase = await firstId(
      sequelize,
      `SELECT MIN(id) AS id FROM customer WHERE shop_id = ${shopId}`,
    );
    const vehicles = Array.from({ length: vehicleCount }, (_, i) => {
      const m = rng.pick(MODELS);
      const year = rng.int(2004, 2025);
      const refrigerant = year >= 2018 || (year >= 2015 && rng.next() < 0.4) ? "R-1234yf" : "R-134a";
      const electric = m.make === "Tesla";
      return {
        values: [
          shopId,
          customerBase + i,
          year,
          m.make,
          m.model,
          refrigerant,
          m.device,
          electric,
          rng.int(450, 1100),
        ],
        make: m.make,
        model: m.model,
        year,
        refrigerant,
        device: m.device,
        electric,
      };
    });
    await insert(
      sequelize,
      "vehicle",
      [
        "shop_id",
        "customer_id",
        "year",
        "make",
        "model",
        "refrigerant",
        "expansion_device",
        "electric_compressor",
        "label_charge_g",
      ],
      vehicles.map((v) => v.values),
    );
    const vehicleBase = await firstId(
      sequelize,
      `SELECT MIN(id) AS id FROM vehicle WHERE shop_id = ${shopId}`,
    );

    // Cases, oldest first over three years, each on a vehicle of the shop.
    const generated: GeneratedCase[] = [];
    for (let i = 0; i < perShop && caseId - firstCase < cases; i++) {
      const openedAt = new Date(now - (1 - i / perShop) * 3 * 365 * dayMs + rng.int(0, 8) * 3_600_000);
      const status = rng.weighted(STATUS_MIX);
      const closedAt =
        status === "closed"
          ? new Date(Math.min(now - 60_000, openedAt.getTime() + rng.int(1, 72) * 3_600_000))
          : null;
      generated.push({
        id: ++caseId,
        shopId,
        vehicleIdx: rng.int(0, vehicleCount - 1),
        technicianId: rng.pick(technicians).id,
        status,
        openedAt,
        closedAt,
        cause: rng.weighted(CAUSE_MIX),
      });
    }
    // Comebacks: a vehicle's case opened within 90 days after its previous case closed.
    const lastClosed = new Map<number, GeneratedCase>();
    const comebackOf = new Map<number, number>();
    const cameBack = new Map<number, number>();
    for (const c of generated) {
      const before = lastClosed.get(c.vehicleIdx);
      if (
        before?.closedAt &&
        c.openedAt > before.closedAt &&
        c.openedAt.getTime() - before.closedAt.getTime() <= 90 * dayMs
      ) {
        comebackOf.set(c.id, before.id);
        if (!cameBack.has(before.id)) cameBack.set(before.id, c.id);
      }
      if (c.closedAt) lastClosed.set(c.vehicleIdx, c);
    }

    const caseRows: unknown[][] = [];
    const entryRows: unknown[][] = [];
    const symptomRows: unknown[][] = [];
    const featureRows: unknown[][] = [];
    const causeRows: unknown[][] = [];
    const repairRows: unknown[][] = [];
    const signOffRows: unknown[][] = [];
    for (const c of generated) {
      const v = vehicles[c.vehicleIdx]!;
      const cause = c.cause;
      const symptoms = [
        ...new Set([
          rng.pick(SYMPTOMS_BY_CAUSE[cause]),
          ...(rng.next() < 0.5 ? [rng.pick(SYMPTOMS_BY_CAUSE[cause])] : []),
          ...(rng.next() < 0.2 ? [rng.pick(SYMPTOM_IDS)] : []),
        ]),
      ];
      const complaint = sentence([
        rng.pick(OPENERS),
        rng.pick(WHEN),
        rng.pick(CAUSE_WORDS[cause]),
        rng.next() < 0.3 ? rng.pick(WHEN) : "",
      ]);
      const submitted = c.status !== "draft";
      const leading: CauseId = rng.next() < 0.72 ? cause : rng.pick(CAUSE_IDS);
      const ambientC = Math.round(rng.normal(30, 5) * 10) / 10;
      const [dc, de, ds, dsh, dq] = PROFILE[cause];
      const hasReadings = submitted && rng.next() < 0.92;
      const condensingC = ambientC + 15 + dc + rng.normal(0, 3);
      const computed = hasReadings
        ? {
            condensingC,
            evaporatingC: 2 + de + rng.normal(0, 2),
            subcoolingK: Math.max(0, (v.device === "txv" ? 8 : 4) + ds + rng.normal(0, 2.5)),
            superheatK: Math.max(0, 7 + dsh + rng.normal(0, 3)),
            condensingApproachK: condensingC - ambientC,
            ...(rng.next() < 0.4 ? { chargeDeltaPct: dq + rng.normal(0, 6) } : {}),
          }
        : null;
      const findings = submitted
        ? {
            suspects: [{ cause: leading }],
            input: { ambientC, refrigerant: v.refrigerant, expansionDevice: v.device },
            ...(computed ? { computed } : {}),
          }
        : null;
      const conclusionNotes = submitted ? sentence([rng.pick(NOTE_WORDS), rng.pick(NOTE_WORDS)]) : null;
      const confirmed: string[] = c.closedAt ? [rng.next() < 0.85 ? cause : leading] : [];
      const repairs = c.closedAt
        ? [
            ...new Set([
              rng.pick(REPAIRS_BY_CAUSE[cause]),
              ...(rng.next() < 0.3 ? [rng.pick(REPAIR_IDS)] : []),
            ]),
          ]
        : [];
      const seniorNote = c.status !== "draft" && rng.next() < 0.25 ? rng.pick(SENIOR_WORDS) : null;
      const repairNote =
        c.closedAt && rng.next() < 0.4
          ? sentence([rng.pick(CAUSE_WORDS[cause]), "fixed and verified"])
          : null;
      const updatedAt = c.closedAt ?? c.openedAt;
      caseRows.push([
        c.id,
        c.shopId,
        null,
        vehicleBase + c.vehicleIdx,
        c.technicianId,
        c.status,
        complaint,
        symptoms,
        submitted ? "findings" : "running",
        { answers: {} },
        findings,
        submitted ? "bench" : null,
        submitted ? leading : null,
        conclusionNotes,
        null,
        submitted ? new Date(c.openedAt.getTime() + 3_600_000) : null,
        c.closedAt,
        repairNote,
        c.openedAt,
        updatedAt,
      ]);
      if (seniorNote)
        signOffRows.push([c.shopId, c.id, technicians[0]!.id, "signed_off", seniorNote, c.openedAt]);
      const searchText = caseSearchText({
        complaint,
        make: v.make,
        model: v.model,
        conclusionCause: submitted ? leading : null,
        conclusionNotes,
        reviewNotes: seniorNote ? [seniorNote] : [],
        serviceNotes: null,
        confirmedCauses: confirmed,
        repairIds: repairs,
        confirmedRepair: null,
        repairNote,
      });
      const before = comebackOf.get(c.id) ?? null;
      const after = cameBack.get(c.id) ?? null;
      entryRows.push([
        c.id,
        c.shopId,
        c.status,
        c.technicianId,
        vehicleBase + c.vehicleIdx,
        v.make,
        v.model,
        v.year,
        v.refrigerant,
        v.device,
        v.electric ? "electric" : null,
        submitted ? leading : null,
        confirmed[0] ?? null,
        c.openedAt,
        c.closedAt,
        before,
        after,
        Boolean(before || after),
        searchText,
        shopIndexTerms(searchText, c.shopId),
        updatedAt,
      ]);
      for (const symptom of symptoms) symptomRows.push([c.shopId, symptom, c.id]);
      if (computed && findings) {
        const f = caseFeaturesFrom(findings);
        featureRows.push([
          c.id,
          c.shopId,
          v.refrigerant,
          v.device,
          Boolean(c.closedAt),
          f.condensingC,
          f.evaporatingC,
          f.subcoolingK,
          f.superheatK,
          f.approachK,
          f.ambientC,
          f.chargeDeviationPct,
          updatedAt,
        ]);
      }
      for (const k of confirmed) causeRows.push([c.shopId, c.id, k]);
      for (const r of repairs) repairRows.push([c.shopId, c.id, r]);
    }
    await insert(
      sequelize,
      "service_case",
      [
        "id",
        "shop_id",
        "customer_id",
        "vehicle_id",
        "technician_id",
        "status",
        "complaint",
        "symptom_tags",
        "interview_step",
        "answers",
        "findings",
        "engine_version",
        "conclusion_cause",
        "conclusion_notes",
        "confirmed_repair",
        "submitted_at",
        "closed_at",
        "repair_note",
        "created_at",
        "updated_at",
      ],
      caseRows,
    );
    await insert(
      sequelize,
      "sign_off",
      ["shop_id", "case_id", "reviewer_id", "verdict", "comment", "created_at"],
      signOffRows,
    );
    await insert(sequelize, "case_confirmed_cause", ["shop_id", "case_id", "cause"], causeRows);
    await insert(sequelize, "case_repair", ["shop_id", "case_id", "repair_id"], repairRows);
    await insert(
      sequelize,
      "casebook_entry",
      [
        "case_id",
        "shop_id",
        "status",
        "technician_id",
        "vehicle_id",
        "make",
        "model",
        "year",
        "refrigerant",
        "metering_device",
        "compressor_type",
        "leading_suspect",
        "outcome",
        "opened_at",
        "closed_at",
        "comeback_of_case_id",
        "came_back_case_id",
        "comeback",
        "search_text",
        "search_terms",
        "updated_at",
      ],
      entryRows,
    );
    await insert(sequelize, "casebook_symptom", ["shop_id", "symptom", "case_id"], symptomRows);
    await insert(
      sequelize,
      "case_features",
      [
        "case_id",
        "shop_id",
        "refrigerant",
        "metering_device",
        "closed",
        "condensing_c",
        "evaporating_c",
        "subcooling_k",
        "superheat_k",
        "approach_k",
        "ambient_c",
        "charge_deviation_pct",
        "updated_at",
      ],
      featureRows,
    );
    if (s % 5 === 0) log(`  ${s} of ${shops} shops, ${caseId} cases`);
  }
  await sequelize.query(
    "ANALYZE TABLE casebook_entry, casebook_symptom, case_features, case_confirmed_cause, service_case",
  );
  return { shopIds };
}

/**
 * Starts (or finds) the benchmark's own MariaDB, migrates it and fills it once. Returns its DATABASE_URL.
 * A second call with the same folder reuses what the first one built.
 */
export async function ensureBenchDatabase(options: BenchDatabaseOptions = {}) {
  const dir = options.dir ?? process.env.BENCH_DB_DIR ?? "/tmp/cw-bench-casebook";
  const port = options.port ?? Number(process.env.BENCH_DB_PORT ?? 3531);
  const shops = options.shops ?? Number(process.env.BENCH_SHOPS ?? 50);
  const cases = options.cases ?? Number(process.env.BENCH_CASES ?? 100_000);
  const log = options.log ?? ((line: string) => console.log(line));
  const env = { ...process.env, DB_DIR: dir, DB_PORT: String(port), DB_NAME: BENCH_DB_NAME };
  execFileSync("bash", [path.join(REPO, "scripts/db.sh"), "up"], {
    env,
    stdio: ["ignore", "ignore", "inherit"],
  });
  const stamp = fillStamp(shops, cases);
  let filledWith = "";
  try {
    filledWith = rootSql(dir, `SELECT stamp FROM \`${BENCH_DB_NAME}\`.bench_fill LIMIT 1`).trim();
  } catch {
    // no stamp table: an empty database, or one an older generator filled
  }
  if (filledWith !== stamp) {
    log(`${dir}: not filled by this generator and size (${filledWith || "no stamp"}); filling it afresh`);
    rootSql(
      dir,
      `DROP DATABASE IF EXISTS \`${BENCH_DB_NAME}\`; CREATE DATABASE \`${BENCH_DB_NAME}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
    );
  }
  // db.sh starts MariaDB with its defaults (a 128 MB buffer pool); a server holding 100,000 cases gets
  // room for its working set, as any production server would be sized.
  execFileSync("mariadb", [
    "--no-defaults",
    `--socket=${dir}/sock`,
    "-uroot",
    "-e",
    `SET GLOBAL innodb_buffer_pool_size = ${BUFFER_POOL_BYTES}`,
  ]);
  log(`innodb_buffer_pool_size set to ${BUFFER_POOL_BYTES / 1048576} MB`);
  const databaseUrl = execFileSync("bash", [path.join(REPO, "scripts/db.sh"), "url"], {
    env,
    encoding: "utf8",
  }).trim();
  process.env.DATABASE_URL = databaseUrl;
  const { getModels } = await import("@/models");
  const { createMigrator } = await import("@/lib/db/migrator");
  const { hashPassword } = await import("@/lib/auth/password");
  const { sequelize } = getModels();
  await createMigrator(sequelize).up();
  const [count] = await sequelize.query<{ n: number }>("SELECT COUNT(*) AS n FROM service_case", {
    type: QueryTypes.SELECT,
  });
  const present = Number(count?.n ?? 0);
  if (present === 0) {
    const started = performance.now();
    log(`filling ${dir} with ${cases} invented cases for ${shops} shops…`);
    await fillCasebookDatabase(sequelize, {
      shops,
      cases,
      passwordHash: await hashPassword(BENCH_PASSWORD),
      log,
    });
    // The stamp goes in last, so an interrupted fill is redone next time.
    await sequelize.query("CREATE TABLE bench_fill (stamp VARCHAR(64) NOT NULL)");
    await sequelize.query("INSERT INTO bench_fill (stamp) VALUES (?)", { replacements: [stamp] });
    log(`filled in ${((performance.now() - started) / 1000).toFixed(0)} s`);
  } else {
    log(`reusing ${dir}: ${present} cases already there`);
  }
  return { databaseUrl, dir, port, env };
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(__filename)) {
  ensureBenchDatabase()
    .then(async ({ databaseUrl }) => {
      console.log(`DATABASE_URL=${databaseUrl}`);
      const { closeSequelize } = await import("@/lib/db/sequelize");
      await closeSequelize();
    })
    .catch((error: unknown) => {
      console.error(error);
      process.exitCode = 1;
    });
}
