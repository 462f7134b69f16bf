import { expect, test, type Page } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { BASE_URL, signedInClient } from "./pages/api-client";
import { readCase } from "./pages/db";
import { InterviewPage, openCase } from "./pages/interview-page";
import { DEMO_USERS, SignInPage, type DemoRole } from "./pages/sign-in-page";
import { STEP_LABELS } from "@/lib/interview/steps";

// The review loop from the first answer to a closed and reopened case, on a phone (Pixel 7 viewport in
// playwright.config.ts; this spec holds it to 390 × 844). An invented scenario: a hatchback that cools
// less than it did, worse at idle.

test.use({ viewport: { width: 390, height: 844 } });
test.describe.configure({ timeout: 300_000 });

async function as(page: Page, role: DemoRole) {
  await page.context().clearCookies();
  await new SignInPage(page).signInAs(role);
}

async function expectNoA11yViolations(page: Page, where: string) {
  const results = await new AxeBuilder({ page })
    .include("main")
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  expect(results.violations.map((v) => `${where}: ${v.id} (${v.nodes.length})`)).toEqual([]);
}

const SEND_BACK_COMMENT = "Check the condenser fan at idle before you settle on a cause.";
const REOPEN_REASON = "Owner says it is warm at idle again: look at the fan relay.";

test("apprentice submits, senior sends back, apprentice resubmits, senior signs off, the case is closed, summarised and reopened", async ({
  page,
}, testInfo) => {
  // 1. The apprentice fills the interview on the phone and sends it for sign-off.
  await as(page, "apprentice");
  const interview = new InterviewPage(page);
  await openCase(interview, /Ford Focus/, "Not as cold as it used to be, worst at idle.");
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
  await interview.choose(/Cooling worse at idle/);
  await interview.next();
  await interview.expectStep(STEP_LABELS.identification);
  await interview.skip();
  await interview.expectStep(STEP_LABELS.chargeAudit);
  await interview.skip();
  await interview.expectStep(STEP_LABELS.findings);
  await expect(interview.suspects().first()).toBeVisible();
  const caseId = interview.caseIdFromUrl();
  await interview.waitUntilSaved();
  await page.getByRole("button", { name: "It leads the findings" }).click();
  await page.getByRole("button", { name: "Send to a senior for sign-off" }).click();
  await expect(page).toHaveURL(new RegExp(`/cases/${caseId}$`));
  expect((await readCase(caseId)).status).toBe("awaiting_signoff");

  // 2. The senior sends it back with a comment.
  await as(page, "senior");
  await page.goto(`/cases/${caseId}`);
  const signOff = page.getByRole("form", { name: "Your sign-off" });
  await signOff.getByLabel("Comment for the apprentice").pressSequentially(SEND_BACK_COMMENT);
  await signOff.getByRole("button", { name: "Send back" }).click();
  await expect(signOff).toHaveCount(0);
  expect((await readCase(caseId)).status).toBe("sent_back");

  // 3. The apprentice sees the comment where they work, and resubmits.
  await as(page, "apprentice");
  await page.goto(`/cases/${caseId}/interview`);
  const note = page.getByTestId("sent-back-note");
  await expect(note).toContainText(SEND_BACK_COMMENT);
  await page.screenshot({ path: testInfo.outputPath("1-sent-back-note.png") });
  await interview.expectStep(STEP_LABELS.findings);
  await expect(page.getByTestId("review-thread")).toContainText(SEND_BACK_COMMENT);
  await page.getByRole("button", { name: "It leads the findings" }).click();
  await page
    .getByLabel("Anything to add (optional)")
    .pressSequentially("Fan runs at idle; the condenser face is clogged.");
  await page.getByRole("button", { name: "Send to a senior for sign-off" }).click();
  await expect(page).toHaveURL(new RegExp(`/cases/${caseId}$`));
  expect((await readCase(caseId)).status).toBe("awaiting_signoff");

  // 4. The senior signs it off, and records the repair's service work (apprentices read the record only).
  await as(page, "senior");
  await page.goto(`/cases/${caseId}`);
  await page.getByRole("form", { name: "Your sign-off" }).getByRole("button", { name: "Sign off" }).click();
  await expect(page.getByRole("form", { name: "Your sign-off" })).toHaveCount(0);
  expect((await readCase(caseId)).status).toBe("signed_off");
  const senior = await signedInClient(DEMO_USERS.senior.email);
  const cylinders: { id: number; refrigerant: string; kind: string; retired: boolean; netG: number }[] = (
    await (await senior.get("/api/cylinders")).json()
  ).cylinders;
  const usable = (kind: string) =>
    cylinders.find((c) => c.refrigerant === "R-134a" && c.kind === kind && !c.retired && c.netG >= 600);
  const saved = await senior.put(`/api/cases/${caseId}/service`, {
    data: {
      baseVersion: 0,
      step: "final",
      labelChargeG: 570,
      recoveredChargeG: 510,
      recoveryCylinderId: cylinders.find(
        (c) => c.refrigerant === "R-134a" && c.kind === "recovery" && !c.retired,
      )?.id,
      oilRemovedMl: 15,
      deepestKpaAbs: 0.1,
      holdStartKpaAbs: 0.1,
      holdEndKpaAbs: 0.11,
      holdMinutes: 15,
      oilAddedType: "PAG 46",
      oilAddedMl: 15,
      chargedG: 570,
      chargeCylinderId: (usable("virgin") ?? usable("recycled"))?.id,
    },
  });
  expect(saved.status(), await saved.text()).toBe(200);
  await senior.dispose();

  // 5. The case's technician closes it with the confirmed cause and the repair; a first try without a
  //    cause is refused on the phone and keeps the note.
  await as(page, "apprentice");
  await page.goto(`/cases/${caseId}`);
  const close = page.getByRole("form", { name: "Close the case" });
  await expect(close).toBeVisible();
  await expectNoA11yViolations(page, "case page, signed off");
  for (const box of await close.getByRole("group", { name: "Confirmed cause" }).getByRole("checkbox").all())
    await box.uncheck();
  const repairNote = "Cleaned the condenser face; fan relay tested good.";
  await close.getByLabel("Note on the repair (optional)").pressSequentially(repairNote);
  await close.getByRole("button", { name: "Close the case" }).click();
  await expect(close.getByText("Pick at least one confirmed cause, or none found.")).toBeVisible();
  await expect(close.getByLabel("Note on the repair (optional)")).toHaveValue(repairNote);
  expect((await readCase(caseId)).status).toBe("signed_off");
  await page.screenshot({ path: testInfo.outputPath("2-close-refused.png"), fullPage: true });
  // The findings' leading causes and the likely repairs are in view; the rest fold under one line each.
  const airflow = close.getByRole("checkbox", { name: /Poor airflow through the condenser/ });
  if (!(await airflow.isVisible())) await close.getByText(/^More causes/).click();
  await airflow.check();
  const cleaned = close.getByRole("checkbox", { name: /Clean condenser face/ });
  if (!(await cleaned.isVisible())) await close.getByText(/^More repairs/).click();
  await cleaned.check();
  await close.getByRole("button", { name: "Close the case" }).click();
  await expect(close).toHaveCount(0);
  expect((await readCase(caseId)).status).toBe("closed");

  // 6. The case page shows the outcome and the service summary, in the reader's units, no "?" anywhere.
  const outcome = page.getByRole("region", { name: /^Outcome, closed/ });
  await expect(outcome.getByTestId("confirmed-causes")).toContainText("Poor airflow through the condenser");
  await expect(outcome.getByTestId("repairs-done")).toContainText("Clean condenser face");
  await expect(outcome).toContainText(repairNote);
  const summary = page.getByTestId("service-summary");
  await expect(summary).toContainText("510 g against the 570 g label");
  await expect(summary).toContainText("15 mL");
  await expect(summary).toContainText("570 g against a 570 g target");
  await expect(page.getByTestId("case-symptoms")).toContainText("Cooling worse at idle than at road speed");
  await expect(page.locator("main")).not.toContainText(/\?\s*(g|mL|oz|kPa|psi)\b/);
  // The same summary for a reader who works in imperial units (1 oz = 28.349523125 g,
  // 1 US fl oz = 29.5735295625 mL, NIST SP 811); the apprentice's own units are put back after.
  const units = (system: "imperial" | null) =>
    page.request.put("/api/me/profile", {
      headers: { origin: BASE_URL },
      data: {
        system,
        pressure: null,
        temperature: null,
        mass: null,
        volume: null,
        vacuum: null,
        locale: null,
      },
    });
  expect((await units("imperial")).status()).toBe(200);
  try {
    await page.reload();
    await expect(summary).toContainText("18.0 oz against the 20.1 oz label");
    await expect(summary).toContainText("0.5 fl oz");
    await expect(page.locator("main")).not.toContainText(/\?\s*(g|mL|oz|fl oz|kPa|psi)\b/);
  } finally {
    expect((await units(null)).status()).toBe(200);
  }
  await page.reload();
  await expectNoA11yViolations(page, "case page, closed");
  await page.screenshot({ path: testInfo.outputPath("3-closed-case.png"), fullPage: true });

  // 7. A senior reopens it with a reason; the reason shows on the case page.
  await as(page, "senior");
  await page.goto(`/cases/${caseId}`);
  const reopen = page.getByRole("form", { name: "Reopen the case" });
  await reopen.getByRole("button", { name: "Reopen the case" }).click();
  await expect(reopen.getByText("Say why the case is reopened: the technician reads it.")).toBeVisible();
  await reopen.getByLabel("Reason for reopening").pressSequentially(REOPEN_REASON);
  await reopen.getByRole("button", { name: "Reopen the case" }).click();
  await expect(page.getByTestId("outcome-history")).toContainText(REOPEN_REASON);
  await expect(reopen).toHaveCount(0);
  expect((await readCase(caseId)).status).toBe("signed_off");
  await expectNoA11yViolations(page, "case page, reopened");
  await page.screenshot({ path: testInfo.outputPath("4-reopened.png"), fullPage: true });
});
