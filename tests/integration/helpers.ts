import { execFile } from "node:child_process";
import path from "node:path";
import { promisify } from "node:util";
import { inject } from "vitest";

// Point lib/env at the throwaway database before anything reads it (env() caches on first use).
process.env.DATABASE_URL = inject("databaseUrl");
process.env.SMTP_URL = inject("smtpUrl");
process.env.S3_ENDPOINT = inject("s3Endpoint");

const execFileAsync = promisify(execFile);
export const repoRoot = path.resolve(__dirname, "../..");
export const dbScript = path.join(repoRoot, "scripts/db.sh");

export function integrationDb() {
  return {
    databaseUrl: inject("databaseUrl"),
    schemaDatabaseUrl: inject("schemaDatabaseUrl"),
    dbDir: inject("dbDir"),
    dbPort: inject("dbPort"),
  };
}

export type ScriptResult = { code: number; stdout: string; stderr: string };

/** Runs a command and reports its exit code instead of throwing on a non-zero one. */
export async function run(
  file: string,
  args: string[],
  env: Record<string, string> = {},
): Promise<ScriptResult> {
  try {
    const { stdout, stderr } = await execFileAsync(file, args, {
      env: { ...process.env, ...env },
      cwd: repoRoot,
    });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const e = error as { code?: number; stdout?: string; stderr?: string };
    return { code: typeof e.code === "number" ? e.code : 1, stdout: e.stdout ?? "", stderr: e.stderr ?? "" };
  }
}

/** db.sh against the integration instance unless env says otherwise. */
export function runDbScript(command: string, env: Record<string, string> = {}) {
  const { dbDir, dbPort } = integrationDb();
  return run(dbScript, [command], { DB_DIR: dbDir, DB_PORT: String(dbPort), ...env });
}

export function runTsx(script: string, args: string[], env: Record<string, string> = {}) {
  return run(path.join(repoRoot, "node_modules/.bin/tsx"), [path.join(repoRoot, script), ...args], env);
}

let counter = 0;
/** A name no other test run or seed uses, for rows a test creates for itself. */
export function uniqueName(prefix: string): string {
  counter += 1;
  return `${prefix}-${process.pid}-${Date.now().toString(36)}-${counter}`;
}

/** The same fields lib/env's databaseConfig() reads, for a URL other than DATABASE_URL. */
export function settingsFromUrl(databaseUrl: string) {
  const url = new URL(databaseUrl);
  return {
    host: url.hostname,
    port: Number(url.port),
    user: decodeURIComponent(url.username),
    password: decodeURIComponent(url.password),
    database: url.pathname.replace(/^\//, ""),
  };
}
