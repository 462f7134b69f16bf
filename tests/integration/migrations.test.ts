import { readdirSync } from "node:fs";
import path from "node:path";
import type { Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createMigrator } from "@/lib/db/migrator";
import { createSequelize } from "@/lib/db/sequelize";
import { migrations } from "@/migrations";
import { integrationDb, repoRoot, settingsFromUrl } from "./helpers";

// Runs against its own database (chillwright_schema) so the seeded one stays intact.
const appTables = [
  "attachment",
  "audit_event",
  "casebook_entry",
  "casebook_symptom",
  "casebook_version",
  "case_confirmed_cause",
  "case_features",
  "case_repair",
  "customer",
  "cylinder",
  "outbound_email",
  "part_oil_allowance",
  "reading_set",
  "refrigerant_movement",
  "repair_proposal",
  "service_case",
  "service_record",
  "share_link",
  "shop",
  "sign_in_attempt",
  "sign_in_throttle",
  "sign_off",
  "spec_entry",
  "user",
  "user_invitation",
  "user_session",
  "vehicle",
];

let sequelize: Sequelize;

async function tables(): Promise<string[]> {
  const [rows] = await sequelize.query(
    "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE() ORDER BY table_name",
  );
  return (rows as { name: string }[]).map((r) => r.name);
}

beforeAll(() => {
  sequelize = createSequelize(settingsFromUrl(integrationDb().schemaDatabaseUrl));
});
afterAll(() => sequelize.close());

describe("migrations", () => {
  it("lists every file in migrations/, in name order", () => {
    const files = readdirSync(path.join(repoRoot, "migrations"))
      .filter((f) => /^\d{8}-\d{4}-.+\.ts$/.test(f))
      .map((f) => f.replace(/\.ts$/, ""))
      .sort();
    expect(migrations.map((m) => m.name)).toEqual(files);
  });

  it("runs up from empty, down to nothing, and up again", async () => {
    const migrator = createMigrator(sequelize);
    await migrator.down({ to: 0 });
    expect((await tables()).filter((t) => appTables.includes(t))).toEqual([]);

    const applied = await migrator.up();
    expect(applied.map((m) => m.name)).toEqual(migrations.map((m) => m.name));
    expect((await tables()).filter((t) => t !== "schema_migration")).toEqual(appTables);
    expect(await migrator.pending()).toEqual([]);

    await migrator.down({ to: 0 });
    expect(await tables()).toEqual(["schema_migration"]);
    expect(await migrator.executed()).toEqual([]);

    await migrator.up();
    expect((await tables()).filter((t) => t !== "schema_migration")).toEqual(appTables);
  });

  it("steps down and back up one migration at a time", async () => {
    const migrator = createMigrator(sequelize);
    await migrator.up();
    const names = migrations.map((m) => m.name);
    for (let left = names.length - 1; left >= 0; left -= 1) {
      await migrator.down();
      expect((await migrator.executed()).map((m) => m.name)).toEqual(names.slice(0, left));
    }
    for (let done = 1; done <= names.length; done += 1) {
      await migrator.up({ step: 1 });
      expect((await migrator.executed()).map((m) => m.name)).toEqual(names.slice(0, done));
    }
    expect((await tables()).filter((t) => t !== "schema_migration")).toEqual(appTables);
  });

  it("drops the case's unread computed column, and brings it back empty on the way down", async () => {
    const migrator = createMigrator(sequelize);
    const columns = async () =>
      Object.keys(await sequelize.getQueryInterface().describeTable("service_case"));
    await migrator.up();
    expect(await columns()).not.toContain("computed");
    await migrator.down({ to: "20261203-4001-drop-case-computed" });
    expect(await columns()).toContain("computed");
    await migrator.up();
    expect(await columns()).not.toContain("computed");
  });

  it("makes every table InnoDB with utf8mb4", async () => {
    const [rows] = await sequelize.query(
      "SELECT table_name AS name, engine, table_collation AS collation FROM information_schema.tables WHERE table_schema = DATABASE()",
    );
    const app = (rows as { name: string; engine: string; collation: string }[]).filter((r) =>
      appTables.includes(r.name),
    );
    expect(app).toHaveLength(appTables.length);
    for (const table of app) {
      expect(table.engine, table.name).toBe("InnoDB");
      expect(table.collation, table.name).toBe("utf8mb4_unicode_ci");
    }
  });
});
