import { expect, test, type Page } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { SignInPage } from "./pages/sign-in-page";
import { InterviewPage, openCase } from "./pages/interview-page";
import { readCase, type SavedCaseRow } from "./pages/db";
import { BASE_URL } from "./pages/e2e-env";
import { STEP_LABELS } from "@/lib/interview/steps";
import type { RefrigerantId } from "@/lib/refrigerants/catalog";
import { runningPhysics, type RunningReadings } from "@/lib/refrigerants/readings";

async function expectNoSeriousA11yIssues(page: Page, where: string) {
  // The WCAG A/AA rules, on the page's main content (the shared header is scanned on the sign-in and case pages).
  const results = await new AxeBuilder({ page })
    .include("main")
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  const serious = results.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => `${where}: ${v.id} (${v.nodes.length})`)).toEqual([]);
}

// Whole interviews with accessibility scans take longer than a page check.
test.describe.configure({ timeout: 300_000 });

test.beforeEach(async ({ page }) => {
  await new SignInPage(page).signInAs("technician");
});

test("a clear overcharge on a hot day: overcharge first, conclusion saved with the findings snapshot (common practice signature: high side high, subcooling high, recovered mass ~25 % over label)", async ({
  page,
}) => {
  const interview = new InterviewPage(page);
  await openCase(
    interview,
    /Honda CR-V/,
    "Cools a little on the highway, blows warm at lights; it was topped up at a quick-lube last month.",
  );
  await interview.expectStep(STEP_LABELS.system);
  await expectNoSeriousA11yIssues(page, "system");
  await expect(page.getByText(/mildly flammable|flammable/i).first()).toBeVisible();
  await interview.next();

  await interview.expectStep(STEP_LABELS.conditions);
  await interview.digits("35");
  await expectNoSeriousA11yIssues(page, "conditions");
  await interview.press("Enter");

  await interview.expectStep(STEP_LABELS.static);
  await interview.digits("800");
  await expect(page.getByText(/Saturation at 35.0 °C ambient/)).toBeVisible();
  await expectNoSeriousA11yIssues(page, "static");
  await interview.press("Enter");

  await interview.expectStep(STEP_LABELS.running);
  await interview.digits("2300");
  await interview.enter("Low side", "330");
  await interview.enter(/Liquid line/, "58");
  await interview.enter(/Suction line/, "12");
  await expect(page.getByText(/Condensing at/)).toBeVisible();
  await expect(page.getByText(/Subcooling \d+\.\d K/)).toBeVisible();
  await expect(page.getByText(/Superheat \d+\.\d K/)).toBeVisible();
  await expectNoSeriousA11yIssues(page, "running");
  await interview.press("Enter");

  await interview.expectStep(STEP_LABELS.behaviour);
  await interview.choose(/shuts off on high pressure/);
  await expectNoSeriousA11yIssues(page, "behaviour");
  await interview.next();

  await interview.expectStep(STEP_LABELS.identification);
  await interview.enter("Purity", "100");
  await interview.enter(/Air/, "0");
  await expectNoSeriousA11yIssues(page, "identification");
  await interview.next();

  await interview.expectStep(STEP_LABELS.chargeAudit);
  await interview.choose(/^Yes$/);
  await interview.enter("Mass recovered", "565");
  await expect(page.getByText(/\+115 g \(\+25\.6 %\) against the 450 g label/)).toBeVisible();
  await expectNoSeriousA11yIssues(page, "charge audit");
  await interview.next();

  await interview.expectStep(STEP_LABELS.findings);
  await expect(interview.suspects().first()).toContainText("Too much refrigerant (overcharge)");
  await expect(page.getByTestId("next-check")).not.toBeEmpty();
  await expectNoSeriousA11yIssues(page, "findings");
  await interview.waitUntilSaved();
  const caseId = interview.caseIdFromUrl();
  await page
    .getByLabel("Why, in a sentence or two")
    .fill("Recovered 565 g against a 450 g label after a top-off; high side and subcooling both high.");
  await page.getByRole("button", { name: "Submit the diagnosis" }).click();
  await expect(page).toHaveURL(new RegExp(`/cases/${caseId}$`));

  const saved = await readCase(caseId);
  expect(saved.status).toBe("signed_off");
  expect(saved.conclusion_cause).toBe("overcharge");
  expect(saved.findings?.suspects[0]?.cause).toBe("overcharge");
  expect(saved.engine_version).toBe(saved.findings?.engineVersion);
  expect(saved.answers.answers.running).toMatchObject({
    highKpaGauge: 2300,
    lowKpaGauge: 330,
    liquidLineC: 58,
    suctionLineC: 12,
  });
  expect(saved.answers.answers.chargeAudit).toMatchObject({ recovered: true, recoveredChargeG: 565 });
});

test("an empty system branches to the leak search, skips running tests and ranks undercharge first", async ({
  page,
}) => {
  const interview = new InterviewPage(page);
  await openCase(
    interview,
    /Silverado/,
    "No cold air at all since the spring; the compressor does not kick in.",
  );
  await interview.next();
  await interview.expectStep(STEP_LABELS.conditions);
  await interview.digits("24");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.static);
  await interview.digits("0");
  await interview.press("Enter");

  await interview.expectStep(STEP_LABELS.leakFinding);
  await expect(page.getByText("Do not run the compressor")).toBeVisible();
  await expect(
    page.getByRole("navigation", { name: "Interview steps" }).getByRole("button", { name: /Running/ }),
  ).toHaveCount(0);
  await expectNoSeriousA11yIssues(page, "leak search");
  await interview.choose("Electronic detector");
  await interview.choose("Condenser");
  await interview.next();

  await interview.expectStep(STEP_LABELS.findings);
  await expect(interview.suspects().first()).toContainText("Not enough refrigerant");
  await interview.waitUntilSaved();
  const saved = await readCase(interview.caseIdFromUrl());
  expect(saved.interview_step).toBe("findings");
  expect(saved.answers.answers.static).toEqual({ staticKpaGauge: 0 });
  expect(saved.answers.answers.leakFinding).toMatchObject({
    method: "electronic_detector",
    whereFound: "condenser",
  });
  expect(saved.answers.answers.running).toBeUndefined();
});

/** A stored case's running physics, as the screens compute it beside the readings (lib/refrigerants/readings.ts). */
function computedFrom(saved: SavedCaseRow) {
  const { system, conditions, running } = saved.answers.answers;
  return runningPhysics({
    ...(running as Omit<RunningReadings, "refrigerant">),
    refrigerant: system?.refrigerant as RefrigerantId,
    ambientC: conditions?.ambientC as number,
    altitudeM: conditions?.altitudeM as number | undefined,
  });
}

async function walkTwin(
  interview: InterviewPage,
  readings: { ambient: string; high: string; low: string; liquid: string; suction: string },
) {
  await interview.expectStep(STEP_LABELS.conditions);
  await interview.digits(readings.ambient);
  await interview.press("Enter");
  await interview.skip();
  await interview.expectStep(STEP_LABELS.running);
  await interview.digits(readings.high);
  await interview.enter("Low side", readings.low);
  await interview.enter(/Liquid line/, readings.liquid);
  await interview.enter(/Suction line/, readings.suction);
  await interview.press("Enter");
  await interview.next();
  await interview.skip();
  await interview.skip();
  await interview.expectStep(STEP_LABELS.findings);
  await interview.waitUntilSaved();
  return readCase(interview.caseIdFromUrl());
}

test("a case entered in imperial units gives the same computed values as its metric twin (1 psi = 6.894757 kPa, NIST SP 811)", async ({
  page,
}) => {
  const metric = new InterviewPage(page);
  await openCase(metric, /Silverado/, "Cooling is weak in the afternoon.");
  await metric.next();
  const metricCase = await walkTwin(metric, {
    ambient: "35",
    high: "1724",
    low: "276",
    liquid: "52",
    suction: "10",
  });

  const imperial = new InterviewPage(page);
  await openCase(imperial, /Silverado/, "Cooling is weak in the afternoon.");
  await imperial.next();
  await imperial.expectStep(STEP_LABELS.conditions);
  await imperial.setUnit("Air temperature at the condenser", "°F");
  // 95 °F = 35 °C; 250 psi = 1723.7 kPa; 40 psi = 275.8 kPa; 125.6 °F = 52 °C; 50 °F = 10 °C.
  await imperial.field("Air temperature at the condenser").fill("95");
  await imperial.press("Enter");
  await imperial.skip();
  await imperial.expectStep(STEP_LABELS.running);
  // Each field's unit button says what its digits mean, for that field alone.
  await imperial.setUnit("High side", "psi");
  await imperial.field("High side").fill("250");
  await imperial.setUnit("Low side", "psi");
  await imperial.field("Low side").fill("40");
  await imperial.setUnit("Liquid line at the condenser outlet", "°F");
  await imperial.field(/Liquid line/).fill("125.6");
  await imperial.setUnit("Suction line at the evaporator outlet", "°F");
  await imperial.field(/Suction line/).fill("50");
  await expect(page.getByText("= 1723.7 kPa · 17.24 bar")).toBeVisible();
  await imperial.press("Enter");
  await imperial.next();
  await imperial.skip();
  await imperial.skip();
  await imperial.expectStep(STEP_LABELS.findings);
  await imperial.waitUntilSaved();
  const imperialCase = await readCase(imperial.caseIdFromUrl());
  // What the screens show beside the readings, computed from what each case stored.
  const metricComputed = computedFrom(metricCase);
  const imperialComputed = computedFrom(imperialCase);

  for (const key of [
    "condensingC",
    "evaporatingC",
    "subcoolingK",
    "superheatK",
    "condensingApproachK",
  ] as const) {
    expect(metricComputed[key], key).toEqual(expect.any(Number));
    expect(imperialComputed[key], key).toBeCloseTo(metricComputed[key]!, 1);
  }
  expect(imperialCase.answers.answers.conditions?.ambientC).toBeCloseTo(35, 6);
});

test("a standard performance check reaches the findings in at most 25 taps and key presses besides the digits", async ({
  page,
}) => {
  const interview = new InterviewPage(page);
  await openCase(interview, /Ford Focus/, "Not as cold as it used to be.");
  await interview.next();
  await interview.expectStep(STEP_LABELS.conditions);
  await interview.digits("30");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.static);
  await interview.skip();
  await interview.expectStep(STEP_LABELS.running);
  await interview.digits("1500");
  await interview.enter("Low side", "200");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.behaviour);
  await interview.next();
  await interview.expectStep(STEP_LABELS.identification);
  await interview.skip();
  await interview.expectStep(STEP_LABELS.chargeAudit);
  await interview.skip();
  await interview.expectStep(STEP_LABELS.findings);
  await expect(interview.suspects().first()).toBeVisible();
  console.log(`performance check: ${interview.taps} taps and key presses besides digits`);
  expect(interview.taps).toBeLessThanOrEqual(25);
});

test("with the network cut mid-interview, answers wait on the device, reach the server when it returns, and a reload resumes at the same step", async ({
  page,
  context,
}) => {
  const interview = new InterviewPage(page);
  await openCase(interview, /Ford Focus/, "Warm air after ten minutes of driving.");
  await interview.next();
  await interview.expectStep(STEP_LABELS.conditions);
  await interview.waitUntilSaved();

  await context.setOffline(true);
  await interview.digits("28");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.static);
  await interview.digits("650");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.running);
  await interview.digits("1600");
  await interview.enter("Low side", "210");
  await expect(page.getByText(/No connection: \d+ changes? waiting on this device/)).toBeVisible();

  await context.setOffline(false);
  await interview.waitUntilSaved();
  const caseId = interview.caseIdFromUrl();
  const saved = await readCase(caseId);
  expect(saved.answers.answers.conditions).toMatchObject({ ambientC: 28 });
  expect(saved.answers.answers.static).toEqual({ staticKpaGauge: 650 });
  expect(saved.answers.answers.running).toMatchObject({ highKpaGauge: 1600, lowKpaGauge: 210 });
  expect(saved.interview_step).toBe("running");

  await page.reload();
  await interview.expectStep(STEP_LABELS.running);
  await expect(interview.field("High side")).toHaveValue("1600");
  await expect(interview.field("Low side")).toHaveValue("210");
});

test("an impossible reading gets a plain message beside the field and keeps what was typed", async ({
  page,
}) => {
  const interview = new InterviewPage(page);
  await openCase(interview, /Ford Focus/, "Hissing from the dash.");
  await interview.next();
  await interview.digits("25");
  await interview.press("Enter");
  await interview.skip();
  await interview.expectStep(STEP_LABELS.running);
  await interview.digits("300");
  await interview.enter("Low side", "900");
  await interview.press("Enter");
  // beside the field (the save banner names the same answer as the one that needs attention)
  await expect(page.locator("#f-lowKpaGauge-error")).toHaveText(
    "The low side reads above the high side — check the hose connections",
  );
  await interview.expectStep(STEP_LABELS.running);
  await expect(interview.field("Low side")).toHaveValue("900");
  await interview.field("High side").fill("12.5.3");
  await interview.press("Enter");
  await expect(page.locator("#f-highKpaGauge-error")).toHaveText("Could not read “12.5.3” as a number.");
  await expect(interview.field("High side")).toHaveValue("12.5.3");
});

test("two screens on one case: the second never silently overwrites the first, and another device resumes at the same step", async ({
  page,
  browser,
}) => {
  const first = new InterviewPage(page);
  await openCase(first, /Ford Focus/, "Cold on the left vents only.");
  await first.next();
  await first.expectStep(STEP_LABELS.conditions);
  await first.waitUntilSaved();
  const caseId = first.caseIdFromUrl();

  // The same technician on a second device opens the case where the first left it.
  const otherDevice = await browser.newContext({ baseURL: BASE_URL, viewport: { width: 412, height: 915 } });
  const otherPage = await otherDevice.newPage();
  await new SignInPage(otherPage).signInAs("technician");
  await otherPage.goto(`/cases/${caseId}/interview`);
  const second = new InterviewPage(otherPage);
  await second.expectStep(STEP_LABELS.conditions);

  await first.digits("27");
  await first.waitUntilSaved();
  await second.field("Air temperature at the condenser").fill("31");
  await expect(otherPage.getByRole("alert").filter({ hasText: "changed on another screen" })).toBeVisible();
  await expect(second.field("Air temperature at the condenser")).toHaveValue("31");

  const saved = await readCase(caseId);
  expect(saved.answers.answers.conditions).toMatchObject({ ambientC: 27 });
  await otherDevice.close();
});

test("a unit tapped after typing says what the digits mean and never changes them (1 psi = 6.894757 kPa, NIST SP 811)", async ({
  page,
}) => {
  const interview = new InterviewPage(page);
  await openCase(interview, /Ford Focus/, "Cooling comes and goes.");
  await interview.next();
  await interview.digits("30");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.static);
  // Read the gauge, type it, then say which unit it was in: the natural order.
  await interview.enter(/Static pressure/, "90");
  await interview.setUnit("Static pressure (either gauge)", "psi");
  await expect(interview.field(/Static pressure/)).toHaveValue("90");
  await expect(page.getByText("= 620.5 kPa · 6.21 bar")).toBeVisible();
  await interview.waitUntilSaved();
  const saved = await readCase(interview.caseIdFromUrl());
  expect(saved.answers.answers.static?.staticKpaGauge).toBeCloseTo(90 * 6.894757, 1);
});

test("the system step offers the spec-table rows for the vehicle and the technician picks the variant that applies", async ({
  page,
}) => {
  const interview = new InterviewPage(page);
  await openCase(interview, /Silverado/, "Rear vents blow warm, front is fine.");
  await interview.expectStep(STEP_LABELS.system);
  const offers = page.getByRole("region", { name: "From the shop's spec table" });
  await expect(offers.getByRole("button", { name: /front A\/C only/ })).toBeVisible();
  await interview.tap(offers.getByRole("button", { name: /front and rear A\/C/ }));
  await expect(interview.field("Label charge")).toHaveValue("1130");
  await interview.next();
  await interview.expectStep(STEP_LABELS.conditions);
  await interview.waitUntilSaved();
  const saved = await readCase(interview.caseIdFromUrl());
  expect(saved.answers.answers.system).toMatchObject({ refrigerant: "R-134a", oilType: "pag" });
  // The label charge is the vehicle's: stored there once, not in the answers.
  expect(saved.vehicle_label_charge_g).toBe(1130);
  expect(saved.answers.answers.system).not.toHaveProperty("labelChargeG");
});

test("an interview left open across an update still submits: the server's findings and a plain note, the chosen conclusion kept", async ({
  page,
}, testInfo) => {
  const interview = new InterviewPage(page);
  await openCase(
    interview,
    /Silverado/,
    "Blows warm since the weekend; a hiss from under the hood on Friday.",
  );
  await interview.next();
  await interview.expectStep(STEP_LABELS.conditions);
  await interview.digits("24");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.static);
  await interview.digits("0");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.leakFinding);
  await interview.choose("Electronic detector");
  await interview.choose("Condenser");
  await interview.next();
  await interview.expectStep(STEP_LABELS.findings);
  await interview.waitUntilSaved();
  const caseId = interview.caseIdFromUrl();

  // This screen's findings engine is made to look older than the server's, as after a deploy.
  await page.route(`**/api/cases/${caseId}/submit`, async (route) => {
    const body = JSON.parse(route.request().postData() ?? "{}");
    await route.continue({ postData: JSON.stringify({ ...body, engineVersion: "0.9.0+00000000" }) });
  });
  await page.getByLabel("The cause you conclude").selectOption("oil_loss");
  await page
    .getByLabel("Why, in a sentence or two")
    .fill("Hose split at the crimp; oil sprayed over the condenser.");
  await page.getByRole("button", { name: "Submit the diagnosis" }).click();

  const note = page.getByTestId("findings-updated");
  await expect(note).toContainText("updated while this interview was open");
  await expect(note).toContainText("Your conclusion is kept as you chose it");
  await expect(page.getByRole("alert").filter({ hasText: /version|Reload|submit again/ })).toHaveCount(0);
  await expect(page.getByTestId("kept-conclusion")).toHaveText("Low or wrong compressor oil");
  await expect(interview.suspects().first()).toContainText("Not enough refrigerant");
  await expectNoSeriousA11yIssues(page, "findings after an update");
  await page.screenshot({ path: testInfo.outputPath("findings-updated-phone.png") });

  const saved = await readCase(caseId);
  expect(saved.status).toBe("signed_off");
  expect(saved.conclusion_cause).toBe("oil_loss");
  expect(saved.engine_version).toBe(saved.findings?.engineVersion);
  expect(saved.engine_version).not.toBe("0.9.0+00000000");

  await page.getByRole("link", { name: "Open the case" }).click();
  await expect(page).toHaveURL(new RegExp(`/cases/${caseId}$`));
});
