import { randomBytes } from "node:crypto";
import type { Transaction } from "sequelize";
import { diagnose, diagnosisInputSchema } from "@/lib/diagnosis";
import { interviewAnswersSchema, stepIds, toDiagnosisInput } from "@/lib/interview";
import type { JsonObject, JsonValue, Models } from "@/models";
import { demoCases, type DemoCase } from "./cases";
import { demoCustomers, demoShops, type DemoShop } from "./people";
import { demoVehicles } from "./vehicles";
import { refreshCasebookEntry } from "@/lib/db/casebook-refresh";

const minuteMs = 60_000;
const dayMs = 24 * 60 * minuteMs;

/** A Lucia-style user id: 10 random bytes in lower-case base32 (16 characters). */
export function newUserId(): string {
  const alphabet = "abcdefghijklmnopqrstuvwxyz234567";
  let bits = 0;
  let value = 0;
  let id = "";
  for (const byte of randomBytes(10)) {
    value = (value << 8) | byte;
    bits += 8;
    while (bits >= 5) {
      id += alphabet[(value >>> (bits - 5)) & 31];
      bits -= 5;
    }
  }
  return id;
}

export type SeedDemoOptions = { models: Models; passwordHash: string; now?: Date };
export type SeedDemoResult = { created: string[]; skipped: string[] };

/**
 * Adds the demo shops with their people, vehicles and cases. A shop whose owner e-mail already
 * exists is left alone, so running the seed again changes nothing.
 */
export async function seedDemo({
  models,
  passwordHash,
  now = new Date(),
}: SeedDemoOptions): Promise<SeedDemoResult> {
  const result: SeedDemoResult = { created: [], skipped: [] };
  for (const shop of demoShops) {
    const ownerEmail = shop.users.find((u) => u.role === "owner")?.email ?? "";
    const present = await models.User.findOne({ where: { email: ownerEmail } });
    if (present) {
      result.skipped.push(shop.name);
      continue;
    }
    await models.sequelize.transaction((transaction) =>
      seedShop(models, shop, passwordHash, now, transaction),
    );
    result.created.push(shop.name);
  }
  return result;
}

async function seedShop(
  models: Models,
  demo: DemoShop,
  passwordHash: string,
  now: Date,
  transaction: Transaction,
) {
  const shop = await models.Shop.create(
    {
      name: demo.name,
      units: demo.units,
      altitudeM: demo.altitudeM,
      timeZone: demo.timeZone,
      locale: demo.locale,
    },
    { transaction },
  );
  const userIds = new Map<string, string>();
  for (const u of demo.users) {
    const user = await models.User.create(
      { id: newUserId(), shopId: shop.id, email: u.email, name: u.name, passwordHash, role: u.role },
      { transaction },
    );
    userIds.set(u.key, user.id);
  }
  const customerIds = new Map<string, number>();
  for (const c of demoCustomers.filter((c) => c.shopKey === demo.key)) {
    const customer = await models.Customer.create(
      { shopId: shop.id, name: c.name, phone: c.phone, email: c.email },
      { transaction },
    );
    customerIds.set(c.key, customer.id);
  }
  const vehicles = new Map<string, { id: number; customerId: number }>();
  for (const { key, customerKey, ...v } of demoVehicles.filter((v) => customerIds.has(v.customerKey))) {
    const customerId = required(customerIds.get(customerKey), `customer ${customerKey}`);
    const vehicle = await models.Vehicle.create({ ...v, shopId: shop.id, customerId }, { transaction });
    vehicles.set(key, { id: vehicle.id, customerId });
  }
  const caseIds: number[] = [];
  for (const demoCase of demoCases.filter((c) => c.shopKey === demo.key)) {
    caseIds.push(
      await seedCase(models, {
        shopId: shop.id,
        altitudeM: demo.altitudeM,
        demoCase,
        userIds,
        vehicles,
        now,
        transaction,
      }),
    );
  }
  // The casebook's search rows, readings and comeback links, once every case of the shop is in.
  for (const caseId of caseIds) await refreshCasebookEntry({ shopId: shop.id, caseId, transaction });
}

type SeedCaseInput = {
  shopId: number;
  altitudeM: number;
  demoCase: DemoCase;
  userIds: Map<string, string>;
  vehicles: Map<string, { id: number; customerId: number }>;
  now: Date;
  transaction: Transaction;
};

/**
 * The case columns the interview writes: its record of answers, and for a case that reached findings
 * the findings engine's output on those answers (what the technician was shown), with its input.
 */
export function interviewColumns(d: DemoCase, altitudeM: number) {
  const answers = interviewAnswersSchema.parse(d.answers);
  const visited = stepIds.filter((step) => step in answers || step === d.interviewStep);
  const record = { answers, drafts: {}, skipped: d.skipped ?? [], visited };
  const toJson = (value: unknown) => JSON.parse(JSON.stringify(value)) as JsonObject;
  if (!d.diagnosed) return { answers: toJson(record), findings: null, engineVersion: null };
  const input = diagnosisInputSchema.parse(toDiagnosisInput(answers, { altitudeM }));
  const findings = diagnose(input);
  return {
    answers: toJson(record),
    findings: toJson({ input, ...findings }) as JsonValue,
    engineVersion: findings.engineVersion,
  };
}

async function seedCase(
  models: Models,
  { shopId, altitudeM, demoCase: d, userIds, vehicles, now, transaction }: SeedCaseInput,
) {
  const startMs = caseStartMs(now, d.daysAgo);
  const at = (minutesIn: number) => new Date(startMs + minutesIn * minuteMs);
  const vehicle = required(vehicles.get(d.vehicleKey), `vehicle ${d.vehicleKey}`);
  const technicianId = required(userIds.get(d.technicianKey), `user ${d.technicianKey}`);
  const lastMinute = Math.max(
    d.closedMinutesIn ?? 0,
    d.submittedMinutesIn ?? 0,
    ...d.readingSets.map((r) => r.minutesIn),
    ...d.signOffs.map((s) => s.minutesIn),
  );

  const serviceCase = await models.Case.create(
    {
      shopId,
      customerId: vehicle.customerId,
      vehicleId: vehicle.id,
      technicianId,
      status: d.status,
      complaint: d.complaint,
      symptomTags: d.answers.behaviour?.symptoms ?? [],
      interviewStep: d.interviewStep,
      ...interviewColumns(d, altitudeM),
      conclusionCause: d.conclusionCause,
      conclusionNotes: d.conclusionNotes,
      confirmedRepair: d.confirmedRepair,
      repairNote: d.outcome?.note ?? null,
      submittedAt: d.submittedMinutesIn === null ? null : at(d.submittedMinutesIn),
      closedAt: d.status === "closed" ? at(d.closedMinutesIn ?? lastMinute) : null,
      createdAt: at(0),
      updatedAt: at(lastMinute),
    },
    { transaction, silent: true },
  );
  const caseId = serviceCase.id;
  const audit = (
    actorId: string,
    action: string,
    minutesIn: number,
    detail: Record<string, string> | null = null,
  ) =>
    models.AuditEvent.create(
      { shopId, actorId, entity: "case", entityId: String(caseId), action, detail, createdAt: at(minutesIn) },
      { transaction },
    );

  await audit(technicianId, "create", 0);
  for (const { minutesIn, ...r } of d.readingSets) {
    await models.ReadingSet.create(
      { ...r, shopId, caseId, takenAt: at(minutesIn), createdAt: at(minutesIn), updatedAt: at(minutesIn) },
      { transaction, silent: true },
    );
  }
  if (d.submittedMinutesIn !== null) await audit(technicianId, "submit", d.submittedMinutesIn);
  for (const s of d.signOffs) {
    const reviewerId = required(userIds.get(s.reviewerKey), `user ${s.reviewerKey}`);
    await models.SignOff.create(
      { shopId, caseId, reviewerId, verdict: s.verdict, comment: s.comment, createdAt: at(s.minutesIn) },
      { transaction },
    );
    await audit(reviewerId, s.verdict, s.minutesIn);
  }
  if (d.status === "closed") await audit(technicianId, "close", lastMinute);
  if (d.outcome) {
    await models.CaseConfirmedCause.bulkCreate(
      d.outcome.causes.map((cause) => ({ shopId, caseId, cause, createdAt: at(lastMinute) })),
      { transaction },
    );
    await models.CaseRepair.bulkCreate(
      d.outcome.repairIds.map((repairId) => ({ shopId, caseId, repairId, createdAt: at(lastMinute) })),
      { transaction },
    );
  }
  return caseId;
}

/** 13:00 UTC on the case's day (morning in the demo shops' zones), never later than three hours ago. */
function caseStartMs(now: Date, daysAgo: number): number {
  const day = new Date(now.getTime() - daysAgo * dayMs);
  const startMs = Date.UTC(day.getUTCFullYear(), day.getUTCMonth(), day.getUTCDate(), 13);
  return Math.min(startMs, now.getTime() - 3 * 60 * minuteMs);
}

function required<T>(value: T | undefined, what: string): T {
  if (value === undefined) throw new Error(`demo data refers to a missing ${what}`);
  return value;
}
