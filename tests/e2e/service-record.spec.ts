import { expect, test } from "@playwright/test";
import { signedInClient } from "./pages/api-client";
import { DEMO_USERS, SignInPage } from "./pages/sign-in-page";
import { ServiceRecordPage } from "./pages/service-record-page";

// The demo RAV4 case (R-1234yf, electric compressor) belongs to the demo technician and has no service record yet.
async function rav4CaseId(): Promise<number> {
  const client = await signedInClient(DEMO_USERS.technician.email);
  const { cases } = (await (await client.get("/api/cases")).json()) as {
    cases: { id: number; vehicle: string | null }[];
  };
  await client.dispose();
  const found = cases.find((c) => c.vehicle?.includes("RAV4"));
  if (!found) throw new Error("the demo RAV4 case is missing");
  return found.id;
}

test("a technician completes a service record on the phone and the ledger shows the movements", async ({
  page,
}) => {
  const caseId = await rav4CaseId();
  await new SignInPage(page).signInAs("technician");
  const record = new ServiceRecordPage(page);
  await record.goto(caseId);

  // 1. Identify: the spec table offers the matching row; the label charge comes from the vehicle.
  await page.getByRole("radio", { name: /RAV4 Hybrid/ }).check();
  await expect(record.field("Label charge (under-hood label)")).toHaveValue("480 g");
  await record.fill({ "Identifier: purity %": "99.6", "Identifier: air %": "0.2" });
  await record.saveAndExpect("Identification");

  // 2. Recovery, typed in pounds and ounces: 1 lb 2 oz = 510 g (NIST SP 811), 30 g over a 480 g label.
  await record.fill({ "Recovered mass": "lots" });
  await page.getByRole("button", { name: /^Save/ }).click();
  await expect(record.alert()).toContainText("could not be read");
  await expect(record.field("Recovered mass")).toHaveValue("lots");
  await expect(page.getByText("Could not read “lots” as a mass.", { exact: false })).toBeVisible();
  await record.fill({ "Recovered mass": "1 lb 2 oz", "Oil drained into the machine's bottle": "10 mL" });
  await record.chooseCylinder("Recovered into cylinder", "HL-REC-YF");
  await expect(record.result("recovered-vs-label")).toContainText(
    "30 g (6.3 %) over — more than the machine's accuracy and recovery can explain: an overcharge",
  );
  await expect(page.getByText(/R-1234yf is mildly flammable/)).toBeVisible();
  await record.saveAndExpect("Recovery");
  await expect(page.getByRole("status")).toContainText("1 ledger entry posted");

  // 3. Evacuation and hold: 0.2 inHg lost in 10 min is inside the 2 inHg / 5 min field limit.
  await record.fill({
    "Deepest vacuum reached": "29.6 inHg",
    "Vacuum at the start of the hold": "29.6 inHg",
    "Vacuum at the end of the hold": "29.4 inHg",
    "Hold time, minutes": "10",
  });
  await expect(record.result("hold-verdict")).toContainText("Hold passed");
  await record.saveAndExpect("Evacuation and hold");

  // 4. Oil: the record asks for the 10 mL drained.
  await expect(record.result("oil-add-back")).toContainText("Add back 10 mL");
  await record.fill({ "Oil added": "10 mL" });
  await record.saveAndExpect("Oil");

  // 5. Recharge: 20 g over the 480 g target is outside ±15 g (SAE J2843 ½ oz, from memory), 6 g is inside.
  await record.fill({ "Charged mass (machine display)": "500 g" });
  await expect(record.result("charge-check")).toContainText("outside");
  await record.fill({ "Charged mass (machine display)": "486 g" });
  await expect(record.result("charge-check")).toContainText("inside");
  await record.chooseCylinder("Charged from cylinder", "HL-SUP-YF");
  await record.saveAndExpect("Recharge");

  // 6. Final reading.
  await record.fill({
    "Ambient temperature": "26",
    "Centre vent temperature": "7",
    "High side (gauge)": "1300",
    "Low side (gauge)": "230",
  });
  await record.saveAndExpect("Final reading");

  await page
    .getByRole("navigation", { name: "Main" })
    .getByRole("link", { name: "Ledger", exact: true })
    .click();
  await expect(page.getByRole("heading", { name: "Refrigerant ledger" })).toBeVisible();
  const movements = page.getByTestId("movement-list");
  await expect(
    movements
      .getByRole("listitem")
      .filter({ hasText: `case ${caseId}` })
      .filter({ hasText: "Recovered into HL-REC-YF" }),
  ).toContainText("510 g");
  await expect(
    movements
      .getByRole("listitem")
      .filter({ hasText: `case ${caseId}` })
      .filter({ hasText: "Charged from HL-SUP-YF" }),
  ).toContainText("486 g");
  // HL-REC-YF started the demo holding 880 g (invented), so it now holds 880 + 510 g.
  await expect(page.getByTestId("cylinder-HL-REC-YF").getByTestId("cylinder-net")).toHaveText("1,390 g");
});

test("an apprentice can read the service record but not enter it", async ({ page }) => {
  const caseId = await rav4CaseId();
  await new SignInPage(page).signInAs("apprentice");
  await new ServiceRecordPage(page).goto(caseId);
  await expect(page.getByText("Your role can read this record")).toBeVisible();
  // The way back to the case is a tap target of at least 44 px (WCAG 2.5.5), as every other.
  const back = await page.getByRole("link", { name: `← Case ${caseId}` }).boundingBox();
  expect(back?.height).toBeGreaterThanOrEqual(44);
  await expect(page.getByRole("button", { name: /^Save/ })).toHaveCount(0);
});
