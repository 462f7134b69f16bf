import { afterAll, describe, expect, it } from "vitest";
import { verifyPassword } from "@/lib/auth/password";
import { diagnose, diagnosisInputSchema, ENGINE_VERSION } from "@/lib/diagnosis";
import { interviewAnswersSchema } from "@/lib/interview";
import { closeSequelize } from "@/lib/db/sequelize";
import { demoCases } from "@/scripts/demo/cases";
import { demoCustomers, demoPassword, demoShops } from "@/scripts/demo/people";
import { demoVehicles } from "@/scripts/demo/vehicles";
import { seedAllDemo } from "@/scripts/demo/seed-all";
import { getModels } from "@/models";
import { runTsx } from "./helpers";

afterAll(() => closeSequelize());

// Everything the demo seed writes, counted inside the demo shops only, so rows other test files add
// in their own shops never disturb the comparison, while a duplicated demo shop still would.
const shopScopedTables = [
  "user",
  "customer",
  "vehicle",
  "service_case",
  "reading_set",
  "sign_off",
  "audit_event",
  "spec_entry",
  "part_oil_allowance",
  "cylinder",
  "service_record",
  "refrigerant_movement",
];

async function demoRowCounts(): Promise<Record<string, number>> {
  const names = demoShops.map((s) => s.name);
  const count = async (sql: string) => {
    const [rows] = await getModels().sequelize.query(sql, { replacements: { names } });
    return Number((rows as { n: number | bigint }[])[0]?.n);
  };
  const counts: Record<string, number> = {
    shop: await count("SELECT COUNT(*) AS n FROM shop WHERE name IN (:names)"),
  };
  for (const table of shopScopedTables) {
    counts[table] = await count(
      `SELECT COUNT(*) AS n FROM \`${table}\` WHERE shop_id IN (SELECT id FROM shop WHERE name IN (:names))`,
    );
  }
  return counts;
}

async function demoShop(name: string) {
  const shop = await getModels().Shop.findOne({ where: { name } });
  if (!shop) throw new Error(`demo shop ${name} missing`);
  return shop;
}

async function demoShopIds(): Promise<number[]> {
  const shops = await getModels().Shop.findAll({ where: { name: demoShops.map((s) => s.name) } });
  return shops.map((s) => s.id);
}

describe("demo seed", () => {
  it("creates each demo shop once, with every demo user, customer, vehicle and case", async () => {
    const models = getModels();
    for (const demo of demoShops) {
      const shops = await models.Shop.findAll({ where: { name: demo.name } });
      expect(shops).toHaveLength(1);
      const shopId = shops[0]?.id;
      const users = await models.User.findAll({ where: { shopId }, order: [["email", "ASC"]] });
      expect(users.map((u) => [u.email, u.role, u.active])).toEqual(
        demo.users
          .map((u) => [u.email, u.role, true])
          .sort((x, y) => String(x[0]).localeCompare(String(y[0]))),
      );
      const customerKeys = demoCustomers.filter((c) => c.shopKey === demo.key).map((c) => c.key);
      expect(await models.Customer.count({ where: { shopId } })).toBe(customerKeys.length);
      expect(await models.Vehicle.count({ where: { shopId } })).toBe(
        demoVehicles.filter((v) => customerKeys.includes(v.customerKey)).length,
      );
      expect(await models.Case.count({ where: { shopId } })).toBe(
        demoCases.filter((c) => c.shopKey === demo.key).length,
      );
    }
  });

  it("gives the main demo shop one user per role, and the second shop its altitude", async () => {
    const models = getModels();
    const harbourline = await demoShop("Harbourline Auto Climate");
    const roles = (await models.User.findAll({ where: { shopId: harbourline.id } }))
      .map((u) => u.role)
      .sort();
    expect(roles).toEqual(["apprentice", "owner", "senior", "technician"]);
    const ridgeback = await demoShop("Ridgeback Cooling Works");
    expect(ridgeback.altitudeM).toBe(1500);
  });

  it("lets every demo account sign in with the demo password and no other", async () => {
    const emails = demoShops.flatMap((s) => s.users.map((u) => u.email));
    const users = await getModels()
      .User.scope("withPasswordHash")
      .findAll({ where: { email: emails } });
    expect(users).toHaveLength(emails.length);
    for (const user of users) {
      expect(await verifyPassword(user.passwordHash, demoPassword), user.email).toBe(true);
      expect(await verifyPassword(user.passwordHash, `${demoPassword}x`), user.email).toBe(false);
    }
  });

  it("never hands out password hashes from the default scope", async () => {
    const user = await getModels().User.findOne({ where: { email: "owner@harbourline.test" } });
    expect(user?.get({ plain: true })).not.toHaveProperty("passwordHash");
  });

  it("includes an apprentice case waiting for sign-off, with readings", async () => {
    const models = getModels();
    const harbourline = await demoShop("Harbourline Auto Climate");
    const waiting = await models.Case.findAll({
      where: { shopId: harbourline.id, status: "awaiting_signoff" },
      include: [
        { model: models.User, as: "technician" },
        { model: models.ReadingSet, as: "readingSets" },
      ],
    });
    expect(waiting.length).toBeGreaterThanOrEqual(1);
    const first = waiting[0]!;
    expect((first.get("technician") as { role: string }).role).toBe("apprentice");
    expect((first.get("readingSets") as unknown[]).length).toBeGreaterThan(0);
    expect(first.submittedAt).toBeInstanceOf(Date);
  });

  it("keeps each case's history in order: created, readings, submitted, verdicts", async () => {
    const models = getModels();
    const seeded = await models.Case.findAll({
      where: { shopId: await demoShopIds() },
      include: [
        { model: models.SignOff, as: "signOffs" },
        { model: models.ReadingSet, as: "readingSets" },
      ],
    });
    expect(seeded).toHaveLength(demoCases.length);
    for (const c of seeded) {
      const readings = c.get("readingSets") as { takenAt: Date }[];
      const verdicts = c.get("signOffs") as { createdAt: Date }[];
      for (const r of readings) expect(r.takenAt.getTime()).toBeGreaterThanOrEqual(c.createdAt.getTime());
      if (c.submittedAt)
        for (const v of verdicts) expect(v.createdAt.getTime()).toBeGreaterThan(c.submittedAt.getTime());
      expect(c.updatedAt.getTime()).toBeGreaterThanOrEqual(c.createdAt.getTime());
      expect(c.createdAt.getTime()).toBeLessThan(Date.now());
    }
  });

  it("stores the interview record in the interview's own shape, so drafts resume", async () => {
    const models = getModels();
    const cases = await models.Case.findAll({ where: { shopId: await demoShopIds() } });
    expect(cases).toHaveLength(demoCases.length);
    for (const c of cases) {
      const record = c.answers as { answers: unknown; drafts: unknown; skipped: unknown; visited: string[] };
      expect(interviewAnswersSchema.safeParse(record.answers).success, c.complaint).toBe(true);
      expect(record.drafts).toEqual({});
      expect(record.visited).toContain(c.interviewStep);
      const behaviour = (record.answers as { behaviour?: { symptoms: string[] } }).behaviour;
      expect(c.symptomTags).toEqual(behaviour?.symptoms ?? []);
    }
    expect(cases.filter((c) => c.status === "draft").map((c) => c.interviewStep)).not.toContain("findings");
  });

  it("stores for each submitted case the findings engine's own output on its answers", async () => {
    const models = getModels();
    const demoSubmitted = await models.Case.findAll({
      where: {
        shopId: await demoShopIds(),
        status: ["awaiting_signoff", "sent_back", "signed_off", "closed"],
      },
    });
    expect(demoSubmitted).toHaveLength(demoCases.filter((c) => c.diagnosed).length);
    for (const c of demoSubmitted) {
      const stored = c.findings as { input: unknown; suspects: { cause: string }[] };
      const recomputed = JSON.parse(
        JSON.stringify(diagnose(diagnosisInputSchema.parse(stored.input))),
      ) as object;
      expect(c.engineVersion).toBe(ENGINE_VERSION);
      expect(stored).toEqual({ input: stored.input, ...recomputed });
      // The computed values live in the findings snapshot only (the case's own column was dropped).
      expect((stored as { computed?: unknown }).computed).toEqual(
        (recomputed as { computed: unknown }).computed,
      );
      expect(stored.suspects.length).toBeGreaterThan(0);
    }
  });

  it("uses only invented contact details: .test e-mail domains and 555-01xx phone numbers", () => {
    for (const shop of demoShops) for (const u of shop.users) expect(u.email).toMatch(/@[a-z-]+\.test$/);
    for (const c of demoCustomers) {
      expect(c.phone).toMatch(/ 555 01\d\d$/);
      if (c.email) expect(c.email).toMatch(/\.test$/);
    }
  });

  it("changes nothing when run again, in process or through scripts/seed.ts", async () => {
    const before = await demoRowCounts();
    expect(before.service_case).toBe(demoCases.length);
    expect(before.service_record).toBeGreaterThan(0);
    const again = await seedAllDemo({
      models: getModels(),
      passwordHash: "unused-because-nothing-is-created",
    });
    expect(again).toEqual(demoShops.map((s) => `present  ${s.name} (left as it is)`));
    expect(await demoRowCounts()).toEqual(before);

    const cli = await runTsx("scripts/seed.ts", []);
    expect(cli.code, cli.stderr).toBe(0);
    expect(cli.stdout.trim().split("\n")).toEqual(again);
    expect(await demoRowCounts()).toEqual(before);
  });
});
