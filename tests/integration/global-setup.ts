import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import path from "node:path";
import type { TestProject } from "vitest/node";

// One throwaway MariaDB for the whole integration run: its own folder under /tmp (short socket
// path) and a free port, so it never touches the developer's .data/ instance.

declare module "vitest" {
  export interface ProvidedContext {
    databaseUrl: string;
    schemaDatabaseUrl: string;
    dbDir: string;
    dbPort: number;
    smtpUrl: string;
    mailDir: string;
    s3Endpoint: string;
  }
}

export const dbScript = path.resolve(__dirname, "../../scripts/db.sh");
export const schemaDatabaseName = "chillwright_schema";

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      server.close(() =>
        typeof address === "object" && address ? resolve(address.port) : reject(new Error("no port")),
      );
    });
  });
}

function runDbScript(command: string, env: Record<string, string>): string {
  return execFileSync(dbScript, [command], {
    env: { ...process.env, ...env },
    encoding: "utf8",
    stdio: ["ignore", "pipe", "pipe"],
  });
}

export default async function setup(project: TestProject) {
  const dbDir = mkdtempSync("/tmp/cw-itest-");
  // The mail catcher and S3 fake of this run: free loopback ports, folders beside the database's.
  const { startMailCatcher } = await import("../../scripts/fakes/mail-catcher");
  const { startS3Fake } = await import("../../scripts/fakes/s3-fake");
  const mail = await startMailCatcher({ dir: `${dbDir}-mail` });
  const s3 = await startS3Fake({ dir: `${dbDir}-s3`, bucket: "chillwright-photos" });
  process.env.SMTP_URL = `smtp://127.0.0.1:${mail.smtpPort}`;
  process.env.S3_ENDPOINT = s3.endpoint;
  const dbPort = await freePort();
  const env = { DB_DIR: dbDir, DB_PORT: String(dbPort) };
  const teardown = async () => {
    try {
      runDbScript("down", env);
    } finally {
      rmSync(dbDir, { recursive: true, force: true });
      await Promise.allSettled([mail.close(), s3.close()]);
      rmSync(`${dbDir}-mail`, { recursive: true, force: true });
      rmSync(`${dbDir}-s3`, { recursive: true, force: true });
    }
  };

  try {
    let startedMs = performance.now();
    runDbScript("up", env);
    const upMs = performance.now() - startedMs;
    // A second database on the same server for the migration down/up test, so it never wipes the seeded one.
    runDbScript("up", { ...env, DB_NAME: schemaDatabaseName });
    const databaseUrl = runDbScript("url", env).trim();
    const schemaDatabaseUrl = runDbScript("url", { ...env, DB_NAME: schemaDatabaseName }).trim();
    process.env.DATABASE_URL = databaseUrl;

    startedMs = performance.now();
    const { migrateAndSeed } = await import("./migrate-and-seed");
    await migrateAndSeed();
    const seedMs = performance.now() - startedMs;
    console.log(
      `integration db: db.sh up from empty ${upMs.toFixed(0)} ms, migrate+seed ${seedMs.toFixed(0)} ms`,
    );

    project.provide("databaseUrl", databaseUrl);
    project.provide("schemaDatabaseUrl", schemaDatabaseUrl);
    project.provide("dbDir", dbDir);
    project.provide("dbPort", dbPort);
    project.provide("smtpUrl", process.env.SMTP_URL);
    project.provide("mailDir", mail.dir);
    project.provide("s3Endpoint", s3.endpoint);
  } catch (error) {
    await teardown();
    throw error;
  }
  return teardown;
}
