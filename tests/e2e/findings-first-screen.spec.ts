import { expect, test, type APIRequestContext, type Page, type TestInfo } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { signedInClient } from "./pages/api-client";
import { InterviewPage } from "./pages/interview-page";
import { createTechnician } from "./pages/people-fixtures";
import { SignInPage } from "./pages/sign-in-page";
import { STEP_LABELS } from "@/lib/interview/steps";

// The phone the findings are read on at the vehicle.
const PHONE = { width: 390, height: 844 };
test.use({ viewport: PHONE });
test.describe.configure({ timeout: 180_000 });

/*
 * An invented case: an orifice-tube R-134a car on a warm afternoon, with a starved evaporator (very high
 * superheat, a low side below its band) and a high side inside its band, so more than one cause leads.
 */
const STARVED_EVAPORATOR = {
  conditions: { ambientC: 29, relativeHumidityPct: 50, engineRpm: 1500 },
  static: { staticKpaGauge: 690 },
  running: { highKpaGauge: 1300, lowKpaGauge: 150, liquidLineC: 44, suctionLineC: 16, ventC: 16 },
  behaviour: { symptoms: [] },
};

/** A case of our own, with the readings saved up to the given step, through the API. */
async function caseWithReadings(
  client: APIRequestContext,
  step: string,
  answers: Record<string, unknown>,
  skipped: string[] = [],
): Promise<number> {
  const created = await client.post("/api/cases", {
    data: {
      newCustomer: { name: "Tamsin Okafor-Lindqvist" },
      newVehicle: {
        year: 2013,
        make: "Mazda",
        model: "3",
        refrigerant: "R-134a",
        expansionDevice: "orifice_tube",
      },
      complaint: "Cool for the first few minutes, then only a little cooler than outside.",
    },
  });
  expect(created.status()).toBe(201);
  const caseId: number = (await created.json()).case.id;
  const { case: detail } = await (await client.get(`/api/cases/${caseId}`)).json();
  const saved = await client.put(`/api/cases/${caseId}/interview`, {
    data: {
      baseVersion: detail.version,
      step,
      answers: { ...detail.answers.answers, ...answers },
      skipped,
    },
  });
  expect(saved.status()).toBe(200);
  return caseId;
}

/** The box of an element on the first screen, the page not scrolled. */
async function firstScreenBox(page: Page, testId: string) {
  const box = await page.getByTestId(testId).first().boundingBox();
  expect(box, testId).not.toBeNull();
  return box!;
}

/**
 * The leading cause's row and the next check inside the first screen, nothing scrolled. The whole
 * instruction must fit, except a repair path (do-not-run), where its first lines do after the warning.
 */
async function expectOnFirstScreen(
  page: Page,
  whole: "whole instruction" | "its start" = "whole instruction",
) {
  expect(await page.evaluate(() => window.scrollY)).toBe(0);
  const leader = await firstScreenBox(page, "leading-cause");
  const nextCheck = page.getByRole("region", { name: "Next check" });
  const next = await nextCheck.boundingBox();
  expect(next).not.toBeNull();
  const instruction = await firstScreenBox(page, "next-check");
  console.log(
    `first screen: leading cause ${Math.round(leader.y)}–${Math.round(leader.y + leader.height)} px, next check ${Math.round(next!.y)}–${Math.round(instruction.y + instruction.height)} px of ${PHONE.height}`,
  );
  expect(leader.y).toBeGreaterThanOrEqual(0);
  expect(leader.y + leader.height).toBeLessThanOrEqual(PHONE.height);
  expect(next!.y).toBeGreaterThanOrEqual(0);
  if (whole === "whole instruction")
    expect(instruction.y + instruction.height).toBeLessThanOrEqual(PHONE.height);
  // three lines of it at least
  else expect(instruction.y + 3 * 24).toBeLessThanOrEqual(PHONE.height);
}

/** The whole percents the ranking shows: the leading causes and the rest. */
async function shownShares(page: Page): Promise<number[]> {
  const ranking = page.getByRole("region", { name: "Likely causes" });
  const texts = await ranking.getByTestId("share").allInnerTexts();
  return texts.map((t) => {
    const match = /^(\d+)\s%$/.exec(t.trim());
    expect(match, t).not.toBeNull();
    return Number(match![1]);
  });
}

async function expectNothingFocusedToType(page: Page) {
  const focused = await page.evaluate(() => {
    const el = document.activeElement;
    return el ? { tag: el.tagName, editable: (el as HTMLElement).isContentEditable } : null;
  });
  expect(focused?.tag === "BODY" || !["INPUT", "TEXTAREA", "SELECT"].includes(focused?.tag ?? "")).toBe(true);
  expect(focused?.editable ?? false).toBe(false);
}

async function expectNoA11yIssues(page: Page, where: string) {
  const results = await new AxeBuilder({ page })
    .include("main")
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  expect(results.violations.map((v) => `${where}: ${v.id} (${v.nodes.length})`)).toEqual([]);
}

/** Opens the case at its last step before the findings and goes on to them, as the technician does. */
async function arriveAtFindings(page: Page, caseId: number) {
  const interview = new InterviewPage(page);
  await page.goto(`/cases/${caseId}/interview`);
  await interview.expectStep(STEP_LABELS.chargeAudit);
  await interview.skip();
  await interview.expectStep(STEP_LABELS.findings);
  await expect(interview.suspects().first()).toBeVisible();
  return interview;
}

async function checkFirstScreen(page: Page, testInfo: TestInfo, name: string) {
  await page.screenshot({ path: testInfo.outputPath(`${name}-first-screen.png`) });
  await page.screenshot({ path: testInfo.outputPath(`${name}-whole.png`), fullPage: true });
  await expectOnFirstScreen(page);
  const shares = await shownShares(page);
  console.log(`${name}: shares shown ${shares.join(" + ")} = ${shares.reduce((a, b) => a + b, 0)}`);
  expect(shares.length).toBeGreaterThanOrEqual(2);
  expect(shares.reduce((a, b) => a + b, 0)).toBe(100);
  await expectNothingFocusedToType(page);
}

test("metric: the leading causes with one share each, the next check and nothing focused on the first screen", async ({
  page,
}, testInfo) => {
  const technician = await signedInClient("tech@harbourline.test");
  const caseId = await caseWithReadings(technician, "chargeAudit", STARVED_EVAPORATOR, ["identification"]);
  await technician.dispose();

  await new SignInPage(page).signInAs("technician");
  const interview = await arriveAtFindings(page, caseId);
  await checkFirstScreen(page, testInfo, "metric");

  // One number per leading cause: the cards that say why repeat no percentage.
  const why = page.getByRole("region", { name: /^Why (this|these) causes?$/ });
  await expect(why.getByRole("article").first()).toBeVisible();
  await expect(why.getByRole("article").first()).not.toContainText("%");
  const leaders = await interview.leadingRows().count();
  expect(leaders).toBeGreaterThanOrEqual(1);
  expect(leaders).toBeLessThanOrEqual(3);
  await expect(why.getByRole("article")).toHaveCount(leaders);
  // Two or three reasons each way, in the reader's units (metric here).
  const firstWhy = why.getByRole("article").first();
  const forReasons = await firstWhy.getByRole("list").first().getByRole("listitem").count();
  expect(forReasons).toBeGreaterThanOrEqual(2);
  expect(forReasons).toBeLessThanOrEqual(3);
  const whyText = await why.innerText();
  expect(whyText).toMatch(/kPa gauge|°C/);
  expect(whyText).not.toMatch(/psig|°F/);

  // The other causes are one line until tapped.
  const others = page.getByTestId("other-causes");
  await expect(others.getByRole("article").first()).toBeHidden();
  const othersLine = others.locator(":scope > summary");
  await expect(othersLine).toHaveText(new RegExp(`^${13 - leaders} other causes together\\s*\\d+\\s%$`));
  await othersLine.click();
  await expect(others.getByRole("article").first()).toBeVisible();
  await expect(others.getByRole("article")).toHaveCount(13 - leaders);
  await expectNoA11yIssues(page, "findings, metric");
  await page.screenshot({ path: testInfo.outputPath("metric-others-open.png"), fullPage: true });

  // Reading the findings puts no keyboard up: the conclusion is further down and waits to be tapped.
  await expect(page.getByLabel("The cause you conclude")).not.toBeFocused();
});

test("imperial: the same first screen with the evidence in psi and °F for a technician whose profile says so", async ({
  page,
}, testInfo) => {
  const password = "findings-in-psi-2026";
  const person = await createTechnician(password);
  const technician = await signedInClient(person.email, password);
  const profile = await technician.put("/api/me/profile", {
    data: {
      system: "imperial",
      pressure: null,
      temperature: null,
      mass: null,
      volume: null,
      vacuum: null,
      locale: null,
    },
  });
  expect(profile.status()).toBe(200);
  const caseId = await caseWithReadings(technician, "chargeAudit", STARVED_EVAPORATOR, ["identification"]);
  await technician.dispose();

  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signIn(person.email, password);
  await expect(page).toHaveURL(/\/cases$/);
  await arriveAtFindings(page, caseId);
  await checkFirstScreen(page, testInfo, "imperial");

  const why = page.getByRole("region", { name: /^Why (this|these) causes?$/ });
  const whyText = await why.innerText();
  expect(whyText).toMatch(/psig/);
  expect(whyText).toMatch(/°F/);
  expect(whyText).not.toMatch(/kPa|°C/);
  await page.getByTestId("other-causes").locator(":scope > summary").click();
  const othersText = await page.getByTestId("other-causes").innerText();
  expect(othersText).not.toMatch(/kPa|°C/);
  await expectNoA11yIssues(page, "findings, imperial");
});

test("an empty system: the next check says not to run it, first thing on the screen, and its caution stays open though read before", async ({
  page,
}, testInfo) => {
  const technician = await signedInClient("tech@harbourline.test");
  const caseId = await caseWithReadings(technician, "leakFinding", {
    conditions: { ambientC: 24 },
    static: { staticKpaGauge: 0 },
    leakFinding: { method: "electronic_detector", whereFound: "condenser" },
  });
  await technician.dispose();

  await new SignInPage(page).signInAs("technician");
  await page.goto(`/cases/${caseId}/interview`);
  const interview = new InterviewPage(page);
  await interview.expectStep(STEP_LABELS.leakFinding);
  await expect(page.getByText("Do not run the compressor")).toBeVisible();
  await interview.next();
  await interview.expectStep(STEP_LABELS.findings);
  await expect(interview.suspects().first()).toContainText("Not enough refrigerant");

  await page.screenshot({ path: testInfo.outputPath("do-not-run-first-screen.png") });
  await page.screenshot({ path: testInfo.outputPath("do-not-run-whole.png"), fullPage: true });
  await expectOnFirstScreen(page, "its start");
  const nextCheck = page.getByTestId("do-not-run");
  await expect(nextCheck).toContainText(/^Next check\s*Do not run the system: /);
  const said = await nextCheck.getByText(/^Do not run the system: /).boundingBox();
  expect(said!.y + said!.height).toBeLessThanOrEqual(PHONE.height);
  // Shown at the leak search already, the do-not-run caution is still open here, not folded away.
  const caution = page.getByText("Do not run the compressor", { exact: false }).first();
  await expect(caution).toBeVisible();
  await expect(page.getByTestId("folded-cautions")).not.toContainText("Do not run the compressor");
  const shares = await shownShares(page);
  expect(shares.reduce((a, b) => a + b, 0)).toBe(100);
  await expectNothingFocusedToType(page);
  await expectNoA11yIssues(page, "findings, do not run");
});
