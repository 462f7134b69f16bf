import { execFile } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import path from "node:path";
import { promisify } from "node:util";
import { devices, expect, test, type BrowserContext } from "@playwright/test";
import mysql from "mysql2/promise";
import { freePort, startAppInstances, type AppInstances } from "../../scripts/app-instances";
import { InterviewPage, openCase } from "./pages/interview-page";
import { SignInPage } from "./pages/sign-in-page";
import { STEP_LABELS } from "@/lib/interview/steps";

// The database stops in the middle of an interview on a phone: the answers wait on the device, the
// server says 503 with a retry hint (never 500), and once the database is back everything queued
// arrives exactly once. A private MariaDB and app server of this file's own, so stopping the database
// never disturbs the other browser tests.
test.describe.configure({ mode: "serial", timeout: 240_000 });

const REPO = path.resolve(__dirname, "../..");
const run = promisify(execFile);
let dbDir = "";
let dbEnv: Record<string, string> = {};
let databaseUrl = "";
let app: AppInstances | undefined;
let context: BrowserContext | undefined;

async function db(command: "up" | "down" | "url") {
  const { stdout } = await run("bash", ["scripts/db.sh", command], {
    cwd: REPO,
    env: { ...process.env, ...dbEnv },
  });
  return stdout.trim();
}

async function tsx(script: string, ...args: string[]) {
  await run(path.join(REPO, "node_modules/.bin/tsx"), [script, ...args], {
    cwd: REPO,
    env: { ...process.env, DATABASE_URL: databaseUrl },
  });
}

async function savedCase(caseId: number) {
  const connection = await mysql.createConnection(databaseUrl.replace(/^mariadb:/, "mysql:"));
  try {
    const [rows] = await connection.query(
      "SELECT version, interview_step, answers FROM service_case WHERE id = ?",
      [caseId],
    );
    const row = (rows as { version: number; interview_step: string; answers: unknown }[])[0]!;
    const answers = typeof row.answers === "string" ? JSON.parse(row.answers) : row.answers;
    return { ...row, answers: answers as { answers: Record<string, Record<string, unknown>> } };
  } finally {
    await connection.end();
  }
}

test.beforeAll(async () => {
  dbDir = mkdtempSync("/tmp/cw-away-");
  dbEnv = { DB_DIR: dbDir, DB_PORT: String(await freePort()), DB_NAME: "chillwright_away" };
  await db("up");
  databaseUrl = await db("url");
  await tsx("scripts/migrate.ts", "up");
  await tsx("scripts/seed.ts");
  app = await startAppInstances({ count: 1, databaseUrl });
});

test.afterAll(async () => {
  await context?.close();
  await app?.stop();
  await db("down").catch(() => undefined);
  rmSync(dbDir, { recursive: true, force: true });
});

test("with the database stopped mid-interview, answers wait on the phone and arrive once when it is back", async ({
  browser,
}) => {
  const baseURL = app!.instances[0]!.baseUrl;
  context = await browser.newContext({ ...devices["Pixel 7"], baseURL });
  const page = await context.newPage();
  await new SignInPage(page).signInAs("technician");

  const interview = new InterviewPage(page);
  await openCase(interview, /Ford Focus/, "Cold for ten minutes, then warm.");
  await interview.next();
  await interview.expectStep(STEP_LABELS.conditions);
  await interview.waitUntilSaved();
  const caseId = interview.caseIdFromUrl();
  const before = await savedCase(caseId);
  // Every interview save the phone sends from here on, with the server's answer.
  const saves: { status: number; body: string }[] = [];
  page.on("requestfinished", async (request) => {
    if (request.method() !== "PUT" || !request.url().endsWith(`/api/cases/${caseId}/interview`)) return;
    const response = await request.response();
    saves.push({ status: response?.status() ?? 0, body: request.postData() ?? "" });
  });

  await db("down");
  // The API says the database is away and when to try again; it does not fail with a 500.
  const probe = await page.request.get(`/api/cases/${caseId}`);
  expect(probe.status()).toBe(503);
  expect(Number(probe.headers()["retry-after"])).toBeGreaterThan(0);

  await interview.digits("31");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.static);
  await interview.digits("700");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.running);
  await interview.digits("1750");
  await interview.enter("Low side", "240");
  await expect(
    page.getByText(/Server not answering: \d+ changes? waiting on this device, trying again/),
  ).toBeVisible({ timeout: 20_000 });
  // Nothing reached the stored case while the database was away: a reload would still show it on the phone.
  await expect(interview.field("High side")).toHaveValue("1750");

  await db("up");
  // The queued answers go once the server takes them again (after its Retry-After and our back-off).
  await expect(page.getByText("All answers saved")).toBeVisible({ timeout: 60_000 });
  const after = await savedCase(caseId);
  expect(after.answers.answers.conditions).toMatchObject({ ambientC: 31 });
  expect(after.answers.answers.static).toEqual({ staticKpaGauge: 700 });
  expect(after.answers.answers.running).toMatchObject({ highKpaGauge: 1750, lowKpaGauge: 240 });
  expect(after.interview_step).toBe("running");
  // Everything queued arrived once: while the database was away every save was answered 503 (never 500),
  // afterwards each accepted save carried a different state, none was refused as a replay (409), and
  // the version moved once per accepted save.
  console.log(`saves while away and after: ${saves.map((s) => s.status).join(", ")}`);
  const accepted = saves.filter((s) => s.status === 200);
  expect(saves.filter((s) => s.status !== 200 && s.status !== 503)).toEqual([]);
  expect(saves.some((s) => s.status === 503)).toBe(true);
  expect(accepted.length).toBeGreaterThan(0);
  expect(new Set(accepted.map((s) => s.body)).size).toBe(accepted.length);
  expect(after.version).toBe(before.version + accepted.length);
  await expect(page.getByText(/kept on this device, not lost/)).toHaveCount(0);

  await page.reload();
  await interview.expectStep(STEP_LABELS.running);
  await expect(interview.field("High side")).toHaveValue("1750");
  await expect(interview.field("Low side")).toHaveValue("240");
});
