import { expect, test, type Page } from "@playwright/test";
import { SignInPage } from "./pages/sign-in-page";
import { InterviewPage, openCase } from "./pages/interview-page";
import { ServiceRecordPage } from "./pages/service-record-page";
import { createTechnician } from "./pages/people-fixtures";
import { STEP_LABELS } from "@/lib/interview/steps";
import type { ServiceRecordResponse } from "@/lib/contracts/service-records";

// A figure is typed once: the recovered mass typed in the interview is the service record's, and a
// change on the record is what the interview shows next, in metric and in US customary units.
test.describe.configure({ timeout: 240_000 });

const PASSWORD = "figures-typed-once-2026";

/** The figures the service record starts from, read through the API as the screen reads them. */
async function recordFigures(page: Page, caseId: number) {
  const response = await page.request.get(`/api/cases/${caseId}/service`);
  expect(response.status()).toBe(200);
  return ((await response.json()) as ServiceRecordResponse).case.figures;
}

/** A technician of our own, so the unit system set here never reaches another spec's account. */
async function signInFresh(page: Page) {
  const person = await createTechnician(PASSWORD);
  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signIn(person.email, PASSWORD);
  await expect(page).toHaveURL(/\/cases$/);
}

async function useImperial(page: Page) {
  await page.goto("/profile");
  await page.getByRole("group", { name: "Unit system" }).getByRole("button", { name: "Imperial" }).click();
  await page.getByRole("button", { name: "Save my units" }).click();
  await expect(page.getByText(/Saved\. Every field/)).toBeVisible();
}

/** From a new case on the demo Focus (R-134a) to the charge audit, the optional readings skipped. */
async function toChargeAudit(interview: InterviewPage, complaint: string) {
  await openCase(interview, /Ford Focus/, complaint);
  await interview.expectStep(STEP_LABELS.system);
  await interview.next();
  await interview.expectStep(STEP_LABELS.conditions);
  await interview.digits("30");
  await interview.press("Enter");
  for (const step of [
    STEP_LABELS.static,
    STEP_LABELS.running,
    STEP_LABELS.behaviour,
    STEP_LABELS.identification,
  ]) {
    await interview.expectStep(step);
    await interview.skip();
  }
  await interview.expectStep(STEP_LABELS.chargeAudit);
  await interview.choose(/^Yes$/);
}

for (const run of [
  {
    name: "metric",
    imperial: false,
    typed: "430",
    storedG: 430,
    recordShows: "430 g",
    changedTo: "450 g",
    changedG: 450,
    interviewShows: "450",
  },
  {
    // 15.2 oz = 430.9 g, kept as 431 g; 16 oz = 453.6 g, kept as 454 g (NIST SP 811: 1 oz = 28.349523 g).
    name: "imperial (oz)",
    imperial: true,
    typed: "15.2",
    storedG: 431,
    recordShows: "15.2 oz",
    changedTo: "16 oz",
    changedG: 454,
    interviewShows: "16.01",
  },
] as const) {
  test(`the recovered mass typed in the interview is the service record's, and back (${run.name})`, async ({
    page,
  }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    await signInFresh(page);
    if (run.imperial) await useImperial(page);
    const interview = new InterviewPage(page);
    await toChargeAudit(interview, `Warm air after a short drive (${run.name} check).`);
    const caseId = interview.caseIdFromUrl();

    const recovered = interview.field("Mass recovered");
    await recovered.click();
    await recovered.pressSequentially(run.typed, { delay: 60 });
    await recovered.blur();
    await interview.waitUntilSaved();
    await expect.poll(async () => (await recordFigures(page, caseId)).recoveredChargeG).toBe(run.storedG);

    // The service record, not yet started, begins from it.
    const record = new ServiceRecordPage(page);
    await record.goto(caseId);
    await page.getByRole("button", { name: "2. Recovery" }).click();
    await expect(record.field("Recovered mass")).toHaveValue(run.recordShows);
    await page.screenshot({
      path: `test-results/figures-record-${run.imperial ? "oz" : "g"}.png`,
      fullPage: true,
    });

    // Changed there: the record keeps it, the ledger posts it once.
    await record.fill({ "Recovered mass": run.changedTo });
    await record.chooseCylinder("Recovered into cylinder", "HL-REC-1");
    await record.saveAndExpect("Recovery");
    await expect(page.getByRole("status")).toContainText("1 ledger entry posted");
    expect((await recordFigures(page, caseId)).recoveredChargeG).toBe(run.changedG);

    // Back in the interview, the new value.
    await page.goto(`/cases/${caseId}/interview`);
    await interview.expectStep(STEP_LABELS.chargeAudit);
    await expect(interview.field("Mass recovered")).toHaveValue(run.interviewShows);
    await page.screenshot({
      path: `test-results/figures-interview-${run.imperial ? "oz" : "g"}.png`,
      fullPage: true,
    });
  });
}
