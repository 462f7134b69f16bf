import { expect, request, test, type APIRequestContext, type APIResponse } from "@playwright/test";
import { startAppInstances, type AppInstances } from "../../scripts/app-instances";
import { readCase } from "./pages/db";
import { E2E_DATABASE_URL } from "./pages/e2e-env";
import { DEMO_PASSWORD, DEMO_USERS } from "./pages/sign-in-page";

// Two production servers on one database, as behind a load balancer: this test plays the
// balancer (the Origin both instances call their own, X-Forwarded-For for the client address).
test.describe.configure({ mode: "serial", timeout: 120_000 });

let app: AppInstances;
let client: APIRequestContext;
// A documentation range (RFC 5737) address of this run's own, so reruns never share a count.
const run = Date.now() % 200;
const address = (n: number) => `198.51.100.${(run + n) % 250}`;

test.beforeAll(async () => {
  app = await startAppInstances({ count: 2, databaseUrl: E2E_DATABASE_URL });
  client = await request.newContext({ extraHTTPHeaders: { origin: app.appOrigin } });
});

test.afterAll(async () => {
  await client?.dispose();
  await app?.stop();
});

/** Instance i % 2, so parallel requests alternate between the two servers. */
const on = (i: number) => app.instances[i % 2]!.baseUrl;
const statuses = (responses: APIResponse[]) => responses.map((r) => r.status());
const tally = (codes: number[]) =>
  codes.reduce<Record<number, number>>((t, c) => ({ ...t, [c]: (t[c] ?? 0) + 1 }), {});

function signIn(i: number, email: string, password: string, from: string) {
  return client.post(`${on(i)}/api/session`, {
    data: { email, password },
    headers: { "x-forwarded-for": from },
  });
}

test("sign-in throttling counts once across both instances", async () => {
  const email = DEMO_USERS.apprentice.email;
  const guesser = address(1);

  const first = await Promise.all(
    Array.from({ length: 20 }, (_, i) => signIn(i, email, `wrong-${i}`, guesser)),
  );
  const firstTally = tally(statuses(first));
  console.log(`two instances, 20 parallel wrong passwords: ${JSON.stringify(firstTally)}`);
  expect(firstTally).toEqual({ 401: 5, 429: 15 });
  for (const r of first.filter((r) => r.status() === 429))
    expect(Number(r.headers()["retry-after"])).toBeGreaterThan(0);

  // The right password among wrong ones, after the limit, on either instance: refused.
  const second = await Promise.all(
    Array.from({ length: 20 }, (_, i) => signIn(i, email, i === 7 ? DEMO_PASSWORD : "wrong", guesser)),
  );
  expect(tally(statuses(second))).toEqual({ 429: 20 });

  // The apprentice, from their own address, still signs in.
  expect((await signIn(1, email, DEMO_PASSWORD, address(2))).status()).toBe(200);

  // One client trying forty addresses once each is slowed, whichever instance it reaches.
  const sprayer = address(3);
  const spray = await Promise.all(
    Array.from({ length: 40 }, (_, i) => signIn(i, `nobody-${run}-${i}@spray.test`, "Summer2026!", sprayer)),
  );
  const sprayTally = tally(statuses(spray));
  console.log(`two instances, 40 accounts from one client: ${JSON.stringify(sprayTally)}`);
  expect(sprayTally).toEqual({ 401: 20, 429: 20 });
});

test("autosave versions: of parallel saves at one version through both instances exactly one wins", async () => {
  // A session made on one instance is good on the other: sessions live in the database.
  expect((await signIn(0, DEMO_USERS.technician.email, DEMO_PASSWORD, address(4))).status()).toBe(200);
  const vehicles = await (await client.get(`${on(1)}/api/vehicles`)).json();
  const created = await client.post(`${on(0)}/api/cases`, {
    data: { vehicleId: vehicles.vehicles[0].vehicleId, complaint: "Cold on the left vents only" },
  });
  expect(created.status()).toBe(201);
  const caseId: number = (await created.json()).case.id;
  expect((await readCase(caseId)).version).toBe(1);

  for (let round = 0; round < 3; round += 1) {
    const baseVersion = 1 + round;
    const saves = await Promise.all(
      Array.from({ length: 4 }, (_, i) =>
        client.put(`${on(i)}/api/cases/${caseId}/interview`, {
          data: {
            baseVersion,
            step: "complaint",
            answers: { complaint: { text: `round ${round}, screen ${i}` } },
          },
        }),
      ),
    );
    const codes = statuses(saves);
    expect(tally(codes), `round ${round}`).toEqual({ 200: 1, 409: 3 });
    const winner = saves[codes.indexOf(200)]!;
    expect((await winner.json()).version).toBe(baseVersion + 1);
    for (const loser of saves.filter((r) => r.status() === 409))
      expect((await loser.json()).error.code).toBe("conflict:case");
  }
  expect((await readCase(caseId)).version).toBe(4);
});
