import { mkdtempSync, rmSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { gzipSync } from "node:zlib";
import mysql from "mysql2/promise";
import { afterAll, describe, expect, it } from "vitest";
import { dbScript, integrationDb, run, settingsFromUrl } from "./helpers";

// Backs up the seeded integration database (with whatever earlier test files added), wipes it,
// restores it, and compares every table's row count and a checksum of its values with what was there.
const scratch = mkdtempSync("/tmp/cw-backup-");
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

/** scripts/db.sh with arguments, against the integration instance. */
function db(args: string[], env: Record<string, string> = {}) {
  const { dbDir, dbPort } = integrationDb();
  return run(dbScript, args, { DB_DIR: dbDir, DB_PORT: String(dbPort), ...env });
}

type TableState = { rows: number; checksum: string };

async function connect() {
  return mysql.createConnection(settingsFromUrl(integrationDb().databaseUrl));
}

async function tableStates(conn: mysql.Connection): Promise<Record<string, TableState>> {
  const [tables] = await conn.query(
    "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE() ORDER BY table_name",
  );
  const states: Record<string, TableState> = {};
  for (const { name } of tables as { name: string }[]) {
    const [[count]] = (await conn.query(`SELECT COUNT(*) AS n FROM \`${name}\``)) as unknown as [
      { n: number }[],
    ];
    // A checksum of the values, not CHECKSUM TABLE: that one also reads how rows are laid out on disk,
    // which a restore rewrites (a column added by ALTER, a stored generated column) without any value
    // changing. Every column's bytes in hex, NULL told apart from an empty string, XOR-ed over the rows.
    const [columns] = await conn.query(
      "SELECT column_name AS name FROM information_schema.columns WHERE table_schema = DATABASE() AND table_name = ? ORDER BY ordinal_position",
      [name],
    );
    const cells = (columns as { name: string }[])
      .map(({ name: column }) => `COALESCE(HEX(\`${column}\`), 'NULL')`)
      .join(", ");
    const [[sum]] = (await conn.query(
      `SELECT COALESCE(BIT_XOR(CRC32(CONCAT_WS('|', ${cells}))), 0) AS checksum FROM \`${name}\``,
    )) as unknown as [{ checksum: number | string }[]];
    states[name] = { rows: Number(count!.n), checksum: String(sum!.checksum) };
  }
  return states;
}

describe("npm run db:backup / db:restore (scripts/db.sh backup|restore)", () => {
  it("backs up the seeded database, wipes it, restores it: every table's rows and checksum come back", async () => {
    let conn = await connect();
    const before = await tableStates(conn);
    await conn.end();
    expect(Object.keys(before)).toEqual(expect.arrayContaining(["service_case", "user", "spec_entry"]));
    expect(before.service_case!.rows).toBeGreaterThan(0);
    expect(before.user!.rows).toBeGreaterThan(0);

    let startedMs = performance.now();
    const backup = await db(["backup"], { BACKUP_DIR: scratch });
    const backupMs = performance.now() - startedMs;
    expect(backup.code, backup.stderr).toBe(0);
    const file = backup.stdout.trim();
    expect(file).toMatch(new RegExp(`^${scratch}/chillwright-\\d{8}T\\d{6}Z\\.sql\\.gz$`));
    // A name of one's own works too.
    const named = path.join(scratch, "before-upgrade.sql.gz");
    expect((await db(["backup", named])).stdout.trim()).toBe(named);

    // Wipe: nothing of the shop's data is left.
    conn = await connect();
    await conn.query("SET FOREIGN_KEY_CHECKS = 0");
    for (const name of Object.keys(before)) await conn.query(`DROP TABLE \`${name}\``);
    await conn.query("SET FOREIGN_KEY_CHECKS = 1");
    expect(await tableStates(conn)).toEqual({});
    await conn.end();

    startedMs = performance.now();
    const restore = await db(["restore", file]);
    const restoreMs = performance.now() - startedMs;
    expect(restore.code, restore.stderr).toBe(0);

    conn = await connect();
    const after = await tableStates(conn);
    await conn.end();
    console.log(
      `db backup: ${Object.keys(before).length} tables, ${Object.values(before).reduce((n, t) => n + t.rows, 0)} rows, ` +
        `${(statSync(file).size / 1024).toFixed(1)} kB gzip; backup ${backupMs.toFixed(0)} ms, restore ${restoreMs.toFixed(0)} ms`,
    );
    expect(after).toEqual(before);
  });

  it("refuses a file that is not a whole dump and leaves the database as it was", async () => {
    const conn = await connect();
    const before = await tableStates(conn);
    const truncated = path.join(scratch, "truncated.sql.gz");
    writeFileSync(truncated, gzipSync("-- MariaDB dump 10.19\nCREATE TABLE half (id INT);\n"));
    const notGzip = path.join(scratch, "plain.sql");
    writeFileSync(notGzip, "DROP DATABASE chillwright;");
    for (const [file, message] of [
      [truncated, /incomplete/],
      [notGzip, /not a gzip file/],
      [path.join(scratch, "missing.sql.gz"), /cannot read/],
    ] as const) {
      const result = await db(["restore", file]);
      expect(result.code, file).not.toBe(0);
      expect(result.stderr).toMatch(message);
    }
    expect(await tableStates(conn)).toEqual(before);
    await conn.end();
  });
});
