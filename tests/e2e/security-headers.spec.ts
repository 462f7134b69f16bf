import { expect, test, type APIResponse } from "@playwright/test";
import { apiClient, BASE_URL, signedInClient } from "./pages/api-client";
import { caseIdByVehicle } from "./pages/owner-fixtures";
import { DEMO_USERS, SignInPage } from "./pages/sign-in-page";

// What every answer carries, whatever produced it: a page, the sign-in page, an API answer,
// the proxy's own redirect, a built file.
function expectCommonHeaders(response: APIResponse) {
  const h = response.headers();
  expect(h["x-frame-options"]).toBe("DENY");
  expect(h["x-content-type-options"]).toBe("nosniff");
  expect(h["referrer-policy"]).toBe("same-origin");
  expect(h["permissions-policy"]).toContain("camera=(self)");
  expect(h["permissions-policy"]).toContain("microphone=()");
  expect(h["permissions-policy"]).toContain("geolocation=()");
}

function pagePolicy(response: APIResponse): Map<string, string[]> {
  const csp = response.headers()["content-security-policy"] ?? "";
  return new Map(
    csp.split(";").map((d) => {
      const [name = "", ...values] = d.trim().split(/\s+/);
      return [name, values];
    }),
  );
}

function expectPagePolicy(response: APIResponse): string {
  const policy = pagePolicy(response);
  const scripts = policy.get("script-src") ?? [];
  const nonce = scripts.find((v) => v.startsWith("'nonce-"))?.slice(7, -1) ?? "";
  expect(nonce).toMatch(/^[A-Za-z0-9+/]{22}==$/);
  expect(scripts).toEqual(["'self'", `'nonce-${nonce}'`, "'strict-dynamic'"]);
  expect(policy.get("frame-ancestors")).toEqual(["'none'"]);
  expect(policy.get("object-src")).toEqual(["'none'"]);
  expect(policy.get("img-src")).toEqual(["'self'", "blob:", "data:"]);
  return nonce;
}

test.describe("security headers", () => {
  test("the sign-in page: CSP with a fresh nonce on every one of Next's scripts", async () => {
    const client = await apiClient();
    const first = await client.get("/sign-in");
    expect(first.status()).toBe(200);
    expectCommonHeaders(first);
    const nonce = expectPagePolicy(first);
    const html = await first.text();
    const scriptTags = html.match(/<script\b[^>]*>/g) ?? [];
    expect(scriptTags.length).toBeGreaterThan(0);
    for (const tag of scriptTags) expect(tag).toContain(`nonce="${nonce}"`);

    const second = await client.get("/sign-in");
    expect(expectPagePolicy(second)).not.toBe(nonce);
    await client.dispose();
  });

  test("a signed-in page, the proxy's redirect and a built file", async () => {
    const owner = await signedInClient(DEMO_USERS.owner.email);
    const cases = await owner.get("/cases");
    expect(cases.status()).toBe(200);
    expectCommonHeaders(cases);
    expectPagePolicy(cases);

    const anonymous = await apiClient();
    const redirect = await anonymous.get("/ledger", { maxRedirects: 0 });
    expect(redirect.status()).toBe(307);
    // Next.js writes a redirect to its own origin as a path.
    expect(redirect.headers()["location"]).toBe("/sign-in?next=%2Fledger");
    expectCommonHeaders(redirect);
    expectPagePolicy(redirect);

    const chunk = /src="(\/_next\/static\/[^"]+\.js)"/.exec(await cases.text())?.[1];
    expect(chunk).toBeTruthy();
    const file = await anonymous.get(chunk!);
    expect(file.status()).toBe(200);
    expectCommonHeaders(file);
    await owner.dispose();
    await anonymous.dispose();
  });

  test("API answers: no caching, a policy that loads nothing, the same headers on errors", async () => {
    const owner = await signedInClient(DEMO_USERS.owner.email);
    const anonymous = await apiClient();
    for (const response of [
      await owner.get("/api/me"),
      await owner.get("/api/cases"),
      await anonymous.get("/api/me"),
      await anonymous.post("/api/session", { data: { email: "x" } }),
    ]) {
      expectCommonHeaders(response);
      expect(response.headers()["cache-control"]).toBe("no-store");
      expect(response.headers()["content-security-policy"]).toBe(
        "default-src 'none'; frame-ancestors 'none'; base-uri 'none'",
      );
    }
    await owner.dispose();
    await anonymous.dispose();
  });
});

test.describe("the session cookie", () => {
  test("lives as long as the session (30 days), HttpOnly, SameSite=Lax; no Secure on local http", async () => {
    const client = await apiClient();
    const response = await client.post("/api/session", {
      data: { email: DEMO_USERS.technician.email, password: "chill-demo-2026" },
    });
    expect(response.status()).toBe(200);
    const cookie = response.headersArray().find((h) => h.name.toLowerCase() === "set-cookie")?.value ?? "";
    expect(cookie).toMatch(/^cw_session=[^;]+;/);
    expect(cookie).toContain("Max-Age=2592000");
    expect(cookie).toContain("HttpOnly");
    expect(cookie).toContain("SameSite=Lax");
    expect(cookie).toContain("Path=/");
    // APP_ORIGIN is http://127.0.0.1 here; every other origin gets Secure (unit-tested in lib/security).
    expect(cookie).not.toContain("Secure");
    await client.dispose();
  });
});

test.describe("the origin check on state-changing requests", () => {
  const credentials = { email: DEMO_USERS.owner.email, password: "chill-demo-2026" };

  test("accepts exactly APP_ORIGIN and refuses the wrong scheme, a spoofed X-Forwarded-Host or none", async () => {
    const client = await apiClient();
    const post = (headers: Record<string, string>) =>
      client.post("/api/session", { data: credentials, headers });
    const wrongScheme = BASE_URL.replace("http://", "https://");

    expect((await post({ origin: BASE_URL })).status()).toBe(200);
    const refused: Record<string, string>[] = [
      { origin: wrongScheme },
      { origin: "http://evil.example", "x-forwarded-host": "evil.example" },
      { origin: "http://evil.example", "x-forwarded-host": new URL(BASE_URL).host },
      { origin: "http://evil.example", host: "evil.example" },
      { origin: wrongScheme, "x-forwarded-proto": "https" },
      { origin: "null" },
    ];
    for (const headers of refused) {
      const response = await post(headers);
      expect(response.status(), JSON.stringify(headers)).toBe(403);
      expect((await response.json()).error.code).toBe("forbidden:origin");
    }
    await client.dispose();
  });

  test("refuses a request without Origin, and a cross-site POST to a page", async ({ playwright }) => {
    const bare = await playwright.request.newContext({ baseURL: BASE_URL });
    expect((await bare.post("/api/session", { data: credentials })).status()).toBe(403);
    expect(
      (await bare.post("/cases", { form: { x: "1" }, headers: { origin: "http://evil.example" } })).status(),
    ).toBe(403);
    await bare.dispose();
  });
});

test.describe("the redirect after sign-in", () => {
  const attempts: [string, string][] = [
    ["/%5Cevil.example", "/cases"],
    ["/%09/evil.example", "/cases"],
    ["//evil.example", "/cases"],
    ["%2F%2Fevil.example", "/cases"],
    ["/%2F%2Fevil.example", "/cases"],
    ["https://evil.example", "/cases"],
    ["javascript:alert(1)", "/cases"],
    ["/%0d%0aLocation:%20http://evil.example", "/cases"],
    ["/..//evil.example", "/cases"],
    ["/ledger", "/ledger"],
    ["/specs%3Fq%3Dcorolla", "/specs?q=corolla"],
  ];

  test("a signed-in visit to /sign-in?next=… answers 307 to a same-origin path only", async () => {
    const owner = await signedInClient(DEMO_USERS.owner.email);
    for (const [next, expected] of attempts) {
      const response = await owner.get(`/sign-in?next=${next}`, { maxRedirects: 0 });
      expect(response.status(), next).toBe(307);
      expect(response.headers()["location"], next).toBe(expected);
    }
    await owner.dispose();
  });

  test("signing in through the form with a hostile next lands on the case list", async ({ page }) => {
    await page.goto("/sign-in?next=/%5Cevil.example");
    await new SignInPage(page).signIn(DEMO_USERS.senior.email);
    await expect(page).toHaveURL(`${BASE_URL}/cases`);
  });
});

test("the app runs under its CSP: no violation on any main page", async ({ page }) => {
  test.slow(); // walks every main page and a dozen cases: minutes on a busy two-core machine
  await page.addInitScript(() => {
    const seen: string[] = [];
    (window as unknown as { cspViolations: string[] }).cspViolations = seen;
    document.addEventListener("securitypolicyviolation", (e) =>
      seen.push(`${e.violatedDirective} ${e.blockedURI} ${e.sourceFile}:${e.lineNumber}`),
    );
  });
  const refused: string[] = [];
  page.on("console", (m) => {
    if (/Content Security Policy|Permissions-Policy|Refused to/i.test(m.text())) refused.push(m.text());
  });
  const violations = async () =>
    page.evaluate(() => (window as unknown as { cspViolations: string[] }).cspViolations);

  // Public pages first.
  await page.goto("/credits");
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  expect(await violations(), "/credits").toEqual([]);
  await new SignInPage(page).signInAs("owner");
  for (const path of [
    "/cases",
    "/cases/new",
    "/casebook",
    "/casebook?q=warm&status=closed",
    "/specs",
    "/ledger",
    "/signoff",
    "/settings/users",
    "/profile",
  ]) {
    await page.goto(path);
    await expect(page.getByRole("navigation", { name: "Main" })).toBeVisible();
    expect(await violations(), path).toEqual([]);
  }
  // Every case of the demo shop (findings, readouts, sign-off), and the first few interviews.
  await page.goto("/cases");
  const caseLinks = await page
    .locator("a[href]")
    .evaluateAll((links) =>
      links.map((a) => a.getAttribute("href") ?? "").filter((h) => /^\/cases\/\d+$/.test(h)),
    );
  expect(caseLinks.length).toBeGreaterThan(2);
  const cases = [...new Set(caseLinks)];
  for (const [i, href] of cases.entries()) {
    for (const path of i < 3 ? [href, `${href}/interview`] : [href]) {
      await page.goto(path);
      await expect(page.getByRole("navigation", { name: "Main" })).toBeVisible();
      expect(await violations(), path).toEqual([]);
    }
  }

  // The owner page a share link opens, with its photos, as the vehicle's owner sees it.
  const caseId = await caseIdByVehicle(page.request, "CX-5");
  const made = await page.request.post(`/api/cases/${caseId}/share-links`, {
    data: {},
    headers: { origin: BASE_URL },
  });
  expect(made.ok()).toBe(true);
  const ownerPage = new URL((await made.json()).link.url).pathname;
  await page.context().clearCookies();
  await page.goto(ownerPage);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  expect(await violations(), ownerPage).toEqual([]);
  expect(refused).toEqual([]);
});
