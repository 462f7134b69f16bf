import { expect, test, type Page } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { InterviewPage, openCase } from "./pages/interview-page";
import { ServiceRecordPage } from "./pages/service-record-page";
import { signInImperialTechnician } from "./pages/imperial-reader";
import { readCase } from "./pages/db";
import { STEP_LABELS } from "@/lib/interview/steps";

// An imperial technician reads every number in their own units: the findings, the case page, the
// service record and the ledger, on a phone. Conversions: NIST SP 811 App. B (1 oz = 28.349523125 g,
// 1 lb = 453.59237 g, 1 psi = 6.894757 kPa, 1 US fl oz = 29.5735295625 mL, °F = °C × 1.8 + 32).
test.describe.configure({ timeout: 300_000 });
test.use({ viewport: { width: 390, height: 844 } });

/** Metric units a reader of psi, °F, oz, fl oz and microns must not meet. */
const METRIC = /kPa|°C|\d g\b| g | mL\b|\bmL /;

/**
 * The main content's visible text, less the lines that cite a source (a citation states the
 * standard's own figure, "1 inHg = 3.386389 kPa", which is not a reading said to this reader) and
 * less what people typed in their own words.
 */
async function readableText(page: Page): Promise<string> {
  const text = await page.locator("main").innerText();
  return (
    text
      .split("\n")
      .filter((line) => !/^\s*Source:/.test(line))
      // A correction's reason is a person's own words (another spec's "Typed 4 kg; the scale showed 400 g").
      .map((line) => line.replace(/reason: .*$/, "reason: …"))
      .join("\n")
  );
}

async function expectNoMetric(page: Page, where: string) {
  const text = await readableText(page);
  const found = text.split("\n").filter((line) => METRIC.test(line));
  expect(found, `${where} shows metric units`).toEqual([]);
}

async function expectNoSeriousA11yIssues(page: Page, where: string) {
  const results = await new AxeBuilder({ page })
    .include("main")
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  const serious = results.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => `${where}: ${v.id} (${v.nodes.length})`)).toEqual([]);
}

test("an imperial technician reads the findings, the case, the service record and the ledger in psi, °F, oz and microns", async ({
  page,
}) => {
  await signInImperialTechnician(page, { vacuum: "microns" });

  // 1. The interview, typed in the profile's units.
  const interview = new InterviewPage(page);
  await openCase(interview, /Ford Focus/, "Blows cool in the morning, warm by the afternoon.");
  await interview.expectStep(STEP_LABELS.system);
  // The label read off the car in ounces (another spec may have changed the vehicle's stored label).
  await interview.field("Label charge").fill("20.1");
  await interview.next();
  await interview.expectStep(STEP_LABELS.conditions);
  await interview.field("Air temperature at the condenser").fill("90");
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.static);
  await interview.skip();
  await interview.expectStep(STEP_LABELS.running);
  await interview.field("High side").fill("180");
  await interview.field("Low side").fill("25");
  await interview.field(/Liquid line/).fill("105");
  await interview.field(/Suction line/).fill("55");
  // The fields show the other system beside what was typed (a check, by design); the readouts are the reader's.
  await expect(page.getByText(/Condensing at \d+\.\d °F/)).toBeVisible();
  await interview.press("Enter");
  await interview.expectStep(STEP_LABELS.behaviour);
  await interview.next();
  await interview.expectStep(STEP_LABELS.identification);
  await interview.field("Purity").fill("99.5");
  await interview.field(/Air/).fill("0.3");
  await interview.next();
  await interview.expectStep(STEP_LABELS.chargeAudit);
  await interview.choose(/^Yes$/);
  // 16 oz = 453.6 g against the 20.1 oz (569.8 g) label: 116.2 g = 4.1 oz short.
  await interview.field("Mass recovered").fill("16");
  await expect(page.getByText(/−4\.1 oz \(−20\.4 %\) against the 20\.1 oz label/)).toBeVisible();
  await interview.next();

  await interview.expectStep(STEP_LABELS.findings);
  await interview.waitUntilSaved();
  await expect(interview.suspects().first()).toBeVisible();
  await expectNoMetric(page, "findings");
  await page.screenshot({ path: "test-results/reader-units-findings.png", fullPage: true });
  const caseId = interview.caseIdFromUrl();
  await page
    .getByLabel("Why, in a sentence or two")
    .fill("Recovered well short of the label and the low side reads low: undercharged.");
  await page.getByRole("button", { name: "Submit the diagnosis" }).click();
  await expect(page).toHaveURL(new RegExp(`/cases/${caseId}$`));

  // 2. The case page.
  const readings = page.getByRole("region", { name: "Readings" });
  // 180 psi; 90 °F; 16 oz recovered.
  await expect(readings).toContainText("180 psig");
  await expect(readings).toContainText("90.0 °F");
  await expect(readings).toContainText("16.0 oz");
  await expectNoMetric(page, "case page");
  await expectNoSeriousA11yIssues(page, "case page");
  await page.screenshot({ path: "test-results/reader-units-case.png", fullPage: true });

  // 3. The service record, step by step.
  const record = new ServiceRecordPage(page);
  await record.goto(caseId);
  await expect(record.field("Label charge (under-hood label)")).toHaveValue("20.11 oz");
  await record.fill({ "Identifier: purity %": "99.5", "Identifier: air %": "0.3" });
  await expectNoMetric(page, "service record: identification");
  await record.saveAndExpect("Identification");

  await record.fill({ "Recovered mass": "16 oz", "Oil drained into the machine's bottle": "0.5 fl oz" });
  await record.chooseCylinder("Recovered into cylinder", "HL-REC-1");
  // 16 oz = 453.6 g, 4.1 oz (20.4 %) under the 20.1 oz label.
  await expect(record.result("recovered-vs-label")).toContainText(
    "Recovered 16.0 oz against a label charge of 20.1 oz: 4.1 oz (20.4 %) under",
  );
  await expectNoMetric(page, "service record: recovery");
  await record.saveAndExpect("Recovery");

  // 500 microns and 29.8 inHg, typed as the two gauges show them; 0.1 inHg lost in 10 min passes 2 inHg / 5 min.
  await record.fill({
    "Deepest vacuum reached": "500 microns",
    "Vacuum at the start of the hold": "29.8 inHg",
    "Vacuum at the end of the hold": "29.7 inHg",
    "Hold time, minutes": "10",
  });
  await expect(record.result("hold-verdict")).toContainText("Hold passed");
  await expect(record.result("hold-verdict")).toContainText(/rose \d[\d,]* microns in 10 min/);
  await expectNoMetric(page, "service record: evacuation");
  await page.screenshot({ path: "test-results/reader-units-evacuation.png" });
  await record.saveAndExpect("Evacuation and hold");

  await expect(record.result("oil-add-back")).toContainText("Add back 0.5 fl oz");
  await record.fill({ "Oil added": "0.5 fl oz" });
  await expectNoMetric(page, "service record: oil");
  await record.saveAndExpect("Oil");

  await record.fill({ "Charged mass (machine display)": "20.1 oz" });
  await record.chooseCylinder("Charged from cylinder", "HL-SUP-134A");
  await expect(record.result("charge-check")).toContainText("inside the ±0.5 oz");
  await expectNoMetric(page, "service record: recharge");
  await record.saveAndExpect("Recharge");

  await record.fill({
    "Ambient temperature": "86",
    "Centre vent temperature": "45",
    "High side (gauge)": "190",
    "Low side (gauge)": "32",
  });
  await expect(page.getByText("In °F.").first()).toBeVisible();
  await expect(page.getByText("In psi gauge.").first()).toBeVisible();
  await expectNoMetric(page, "service record: final reading");
  await record.saveAndExpect("Final reading");
  await page.screenshot({ path: "test-results/reader-units-service.png", fullPage: true });

  // What was typed comes back as it was typed, after a reload.
  await record.goto(caseId);
  await page
    .getByRole("button", { name: /Evacuation and hold/ })
    .first()
    .click();
  await expect(record.field("Deepest vacuum reached")).toHaveValue("500 microns");
  await expect(record.field("Vacuum at the start of the hold")).toHaveValue("29.8 inHg");

  // 4. The ledger: cylinders weighed in pounds by a reader of ounces.
  await page.goto("/ledger");
  await expect(page.getByRole("heading", { name: "Refrigerant ledger" })).toBeVisible();
  const movements = page.getByTestId("movement-list");
  // 16 oz = 1.00 lb; 20.1 oz = 1.26 lb.
  await expect(
    movements
      .getByRole("listitem")
      .filter({ hasText: `case ${caseId}` })
      .filter({ hasText: "Recovered into HL-REC-1" }),
  ).toContainText("1.00 lb");
  await expect(page.getByTestId("cylinder-HL-REC-1").getByTestId("cylinder-net")).toHaveText(/ lb$/);
  await expectNoMetric(page, "ledger");
  await page.screenshot({ path: "test-results/reader-units-ledger.png", fullPage: true });

  const csv = await (await page.request.get("/api/ledger/report?format=csv")).text();
  expect(csv.replace(/^\uFEFF/, "").split("\r\n")[0]).toBe(
    "month,technician,refrigerant,recovered_lb,recycled_lb,charged_lb,sent_out_lb,adjustment_lb,corrections",
  );
});

test("an imperial technician types a new vehicle's label charge in ounces; words that are not a mass get a plain message and stay", async ({
  page,
}) => {
  await signInImperialTechnician(page, {
    // Every unit button is a tap target of at least 44 × 44 px (WCAG 2.5.5), "g" and "lb" included.
    onProfile: async () => {
      for (const button of await page.locator("main fieldset").getByRole("button").all()) {
        const box = await button.boundingBox();
        expect(Math.min(box?.width ?? 0, box?.height ?? 0), await button.innerText()).toBeGreaterThanOrEqual(
          44,
        );
      }
    },
  });

  await page.goto("/cases/new");
  await page.getByRole("button", { name: "A vehicle not listed here" }).click();
  await page.getByLabel("Customer name").fill("Marisol Quennell");
  await page.getByLabel("Model year").fill("2015");
  await page.getByLabel("Make", { exact: true }).fill("Subaru");
  await page.getByLabel("Model", { exact: true }).fill("Outback");
  await page.getByRole("button", { name: "Blows warm air" }).click();
  const label = page.getByLabel("Label charge, oz (optional)");

  await label.fill("about a pound");
  await page.getByRole("button", { name: "Start the interview" }).click();
  await expect(page.getByText(/Could not read “about a pound” as a mass/)).toBeVisible();
  await expect(label).toHaveValue("about a pound");
  await expect(page).toHaveURL(/\/cases\/new$/);

  // Typed one key at a time, as read off the under-hood label: 20 oz = 566.99 g (NIST SP 811).
  await label.fill("");
  await label.pressSequentially("20");
  await page.getByRole("button", { name: "Start the interview" }).click();
  await expect(page).toHaveURL(/\/cases\/\d+\/interview$/);
  const interview = new InterviewPage(page);
  await interview.expectStep(STEP_LABELS.system);
  const saved = await readCase(interview.caseIdFromUrl());
  expect(saved.vehicle_label_charge_g).toBe(567);
  await expect(interview.field("Label charge")).toHaveValue("20");
});
