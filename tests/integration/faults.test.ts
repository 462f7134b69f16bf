import { mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as listCasesRoute } from "@/app/api/cases/route";
import { PUT as saveInterviewRoute } from "@/app/api/cases/[id]/interview/route";
import { PUT as saveServiceRoute } from "@/app/api/cases/[id]/service/route";
import { GET as listPhotosRoute, POST as uploadPhotoRoute } from "@/app/api/cases/[id]/attachments/route";
import { GET as readPhotoRoute } from "@/app/api/cases/[id]/attachments/[attachmentId]/route";
import { STORAGE_RETRY_AFTER_S } from "@/lib/storage/s3";
import { startS3Fake, type S3Fake } from "@/scripts/fakes/s3-fake";
import { screenshotPng } from "./owner-fixtures";
import { getLucia } from "@/lib/auth/lucia";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { createMigrator } from "@/lib/db/migrator";
import { env } from "@/lib/env";
import { DATABASE_RETRY_AFTER_S, errorResponse } from "@/lib/server/handler";
import { getModels } from "@/models";
import { callRoute } from "./api-client";
import { runDbScript } from "./helpers";
import { createShopWithCylinders } from "./service-fixtures";

// Faults on a private MariaDB of this file's own (never the shared integration database): stop it
// in the middle of an interview, start it again, and cut a connection in the middle of a save.

let dbDir = "";
let s3: S3Fake | undefined;
let s3Port = 0;
let dbEnv: Record<string, string> = {};

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      server.close(() => (typeof address === "object" && address ? resolve(address.port) : reject()));
    });
  });
}

async function db(command: "up" | "down" | "url") {
  const result = await runDbScript(command, dbEnv);
  if (result.code !== 0) throw new Error(`db.sh ${command} failed: ${result.stderr}`);
  return result.stdout.trim();
}

let fixture: Awaited<ReturnType<typeof createShopWithCylinders>>;
let sessionId = "";

beforeAll(async () => {
  dbDir = mkdtempSync("/tmp/cw-faults-");
  dbEnv = { DB_DIR: dbDir, DB_PORT: String(await freePort()) };
  await db("up");
  // lib/env reads its settings once, on first use: point it at the private instances before that.
  process.env.DATABASE_URL = await db("url");
  s3 = await startS3Fake({ dir: `${dbDir}-s3`, bucket: "chillwright-photos" });
  s3Port = s3.port;
  process.env.S3_ENDPOINT = s3.endpoint;
  expect(env().DATABASE_URL).toBe(process.env.DATABASE_URL);
  const models = getModels();
  await createMigrator(models.sequelize).up();
  fixture = await createShopWithCylinders(models);
  // The case's own technician, who may change its interview and service record.
  sessionId = (await getLucia().createSession(fixture.technician.id, {})).id;
}, 120_000);

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
  await runDbScript("down", dbEnv);
  await s3?.close();
  rmSync(dbDir, { recursive: true, force: true });
  rmSync(`${dbDir}-s3`, { recursive: true, force: true });
}, 60_000);

async function caseRow() {
  return getModels().Case.findByPk(fixture.serviceCase.id, { raw: true });
}

function saveAnswers(baseVersion: number, ownerWords: string) {
  return callRoute(saveInterviewRoute, `/api/cases/${fixture.serviceCase.id}/interview`, {
    method: "PUT",
    sessionId,
    params: { id: String(fixture.serviceCase.id) },
    body: { baseVersion, step: "complaint", answers: { complaint: { ownerWords } } },
  });
}

function expectUnavailable(res: { status: number; headers: Headers; text: string }) {
  expect(res.status).toBe(503);
  expect(res.headers.get("retry-after")).toBe(String(DATABASE_RETRY_AFTER_S));
  const body = JSON.parse(res.text) as { error: { code: string; message: string } };
  expect(body.error.code).toBe("unavailable:database");
  expect(body.error.message).toMatch(/Nothing you entered was lost/);
  // No driver message, socket address or stack in the answer.
  expect(res.text).not.toMatch(/ECONNREFUSED|127\.0\.0\.1|at \w+ \(|Sequelize|mariadb|mysql/i);
}

describe("the database stops in the middle of an interview", () => {
  it("answers 503 with Retry-After while it is down, and takes the queued save exactly once after", async () => {
    const first = await saveAnswers((await caseRow())!.version, "Cold at first, warm after ten minutes.");
    expect(first.status).toBe(200);
    const { version } = first.json as { version: number };

    await db("down");
    // What the phone sends next (it keeps the same record queued until the server takes it).
    const queued = "Cold at first, warm after ten minutes; worse in traffic.";
    expectUnavailable(await saveAnswers(version, queued));
    expectUnavailable(await saveAnswers(version, queued));
    expectUnavailable(await callRoute(listCasesRoute, "/api/cases", { sessionId }));
    // The Sequelize side (models) maps the same way as Lucia's mysql2 pool.
    const modelError = await getModels()
      .Case.count()
      .then(
        () => null,
        (e: unknown) => e,
      );
    const mapped = errorResponse(modelError);
    expect(mapped.status).toBe(503);

    await db("up");
    // The client retries with backoff; a connection the pool held from before the stop may fail once more.
    let saved: Awaited<ReturnType<typeof saveAnswers>> | undefined;
    for (let attempt = 0; attempt < 10; attempt += 1) {
      saved = await saveAnswers(version, queued);
      if (saved.status !== 503) break;
      await new Promise((resolve) => setTimeout(resolve, 500));
    }
    expect(saved?.status).toBe(200);
    expect((saved?.json as { version: number }).version).toBe(version + 1);
    const row = await caseRow();
    expect(row?.version).toBe(version + 1);
    expect(
      (row?.answers as { answers: { complaint: { ownerWords: string } } }).answers.complaint.ownerWords,
    ).toBe(queued);
    // The same record sent once more (a retry whose answer was lost) is refused, never applied twice.
    const again = await saveAnswers(version, queued);
    expect(again.status).toBe(409);
    expect((await caseRow())?.version).toBe(version + 1);
  }, 120_000);
});

describe("the app dies in the middle of a save", () => {
  it("leaves the service record and its ledger postings all saved or all absent", async () => {
    const { sequelize, ServiceRecord, RefrigerantMovement } = getModels();
    // Hold the save inside its transaction, right after the record row and before the ledger row.
    await sequelize.query(
      "CREATE TRIGGER fault_hold_movement BEFORE INSERT ON refrigerant_movement FOR EACH ROW SET @held = SLEEP(30)",
    );
    try {
      const saving = callRoute(saveServiceRoute, `/api/cases/${fixture.serviceCase.id}/service`, {
        method: "PUT",
        sessionId,
        params: { id: String(fixture.serviceCase.id) },
        body: {
          baseVersion: 0,
          step: "recovery",
          recoveredChargeG: 640,
          recoveryCylinderId: fixture.recovery.id,
        },
      });
      // Find the connection doing the save and cut it, as the server does when the app process dies.
      let connectionId: number | undefined;
      for (let i = 0; i < 100 && connectionId === undefined; i += 1) {
        const [rows] = (await sequelize.query(
          "SELECT id AS id FROM information_schema.processlist WHERE id <> CONNECTION_ID() AND (info LIKE '%INSERT%refrigerant_movement%' OR state = 'User sleep')",
        )) as [{ id: number }[], unknown];
        connectionId = rows[0]?.id;
        if (connectionId === undefined) await new Promise((resolve) => setTimeout(resolve, 100));
      }
      expect(connectionId).toBeDefined();
      await sequelize.query(`KILL CONNECTION ${Number(connectionId)}`);
      const res = await saving;
      expect(res.status).toBe(503);
      expect(res.text).not.toMatch(/at \w+ \(|Sequelize|mariadb/i);
    } finally {
      await sequelize.query("DROP TRIGGER IF EXISTS fault_hold_movement");
    }
    // Rolled back as one: no record, no posting; the phone still holds the values and saves again.
    expect(await ServiceRecord.count({ where: { caseId: fixture.serviceCase.id } })).toBe(0);
    expect(await RefrigerantMovement.count({ where: { caseId: fixture.serviceCase.id } })).toBe(0);
    const retried = await callRoute(saveServiceRoute, `/api/cases/${fixture.serviceCase.id}/service`, {
      method: "PUT",
      sessionId,
      params: { id: String(fixture.serviceCase.id) },
      body: {
        baseVersion: 0,
        step: "recovery",
        recoveredChargeG: 640,
        recoveryCylinderId: fixture.recovery.id,
      },
    });
    expect(retried.status).toBe(200);
    expect(await ServiceRecord.count({ where: { caseId: fixture.serviceCase.id } })).toBe(1);
    expect(await RefrigerantMovement.count({ where: { caseId: fixture.serviceCase.id } })).toBe(1);
  }, 120_000);
});

describe("photo storage stops", () => {
  const caseId = () => String(fixture.serviceCase.id);
  async function upload(caption: string) {
    const form = new FormData();
    form.set("file", new Blob([new Uint8Array(await screenshotPng())], { type: "image/png" }), "gauges.png");
    form.set("caption", caption);
    return callRoute(uploadPhotoRoute, `/api/cases/${caseId()}/attachments`, {
      method: "POST",
      sessionId,
      params: { id: caseId() },
      body: form,
    });
  }
  const photoCount = () => getModels().Attachment.count({ where: { caseId: fixture.serviceCase.id } });

  it("answers 503 with Retry-After for uploads and reads, keeps no half photo, and works again once back", async () => {
    const first = await upload("before the stop");
    expect(first.status).toBe(200);
    const { attachment } = first.json as { attachment: { id: number } };

    await s3!.close();
    const before = await photoCount();
    const refused = await upload("during the stop");
    expect(refused.status).toBe(503);
    expect(refused.headers.get("retry-after")).toBe(String(STORAGE_RETRY_AFTER_S));
    expect((refused.json as { error: { code: string; message: string } }).error).toMatchObject({
      code: "unavailable:photos",
      message: expect.stringMatching(/not saved.*Try again/),
    });
    expect(refused.text).not.toMatch(/ECONNREFUSED|at \w+ \(/);
    expect(await photoCount()).toBe(before);
    const read = await callRoute(readPhotoRoute, `/api/cases/${caseId()}/attachments/${attachment.id}`, {
      sessionId,
      params: { id: caseId(), attachmentId: String(attachment.id) },
    });
    expect(read.status).toBe(503);
    // The list comes from the database and still answers.
    const list = await callRoute(listPhotosRoute, `/api/cases/${caseId()}/attachments`, {
      sessionId,
      params: { id: caseId() },
    });
    expect(list.status).toBe(200);

    s3 = await startS3Fake({ port: s3Port, dir: `${dbDir}-s3`, bucket: "chillwright-photos" });
    expect((await upload("after the restart")).status).toBe(200);
    expect(await photoCount()).toBe(before + 1);
  }, 120_000);
});
