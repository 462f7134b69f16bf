import { expect, test } from "@playwright/test";
import { SignInPage } from "./pages/sign-in-page";
import { signInImperialTechnician } from "./pages/imperial-reader";

// Invented rows for this test; the charges are nobody's specification.
const CSV = [
  "year_from,year_to,make,model,variant,rear_ac,refrigerant,label_charge_oz,oil_type,total_oil_ml",
  "2015,2019,Subaru,Outback,2.5 L,no,R-134a,19.4,PAG 46,130",
  "2015,2019,Subaru,Outback,2.5 L,maybe,R-134a,19.4,PAG 46,130",
].join("\n");

test("an owner previews a CSV import, sees the bad row's problem before saving, and saves the good row", async ({
  page,
}) => {
  await new SignInPage(page).signInAs("owner");
  await page
    .getByRole("navigation", { name: "Main" })
    .getByRole("link", { name: "Spec table", exact: true })
    .click();
  await expect(page.getByRole("heading", { name: "Spec table", level: 1 })).toBeVisible();
  await page.getByLabel("Or paste the CSV text").fill(CSV);
  await page.getByRole("button", { name: "Preview the import" }).click();
  const preview = page.getByTestId("import-preview");
  await expect(preview.getByText(/Line 2:.*ready/)).toBeVisible();
  await expect(preview.getByText(/Line 3:.*rear_ac "maybe"/)).toBeVisible();
  await page.getByRole("button", { name: "Save 1 row without problems" }).click();
  await expect(page.getByText("Saved 1 row; 1 with problems left out.")).toBeVisible();
  await page.getByLabel("Search by make, model, variant or year").fill("Outback");
  // 19.4 oz = 550 g (NIST SP 811: 1 oz = 28.349523125 g).
  await expect(page.getByText(/Front A\/C only · R-134a · 550 g/)).toBeVisible();
});

test("a technician reads the spec table but has no edit controls", async ({ page }) => {
  await new SignInPage(page).signInAs("technician");
  await page.goto("/specs");
  await expect(page.getByText(/Silverado 1500/).first()).toBeVisible();
  await expect(page.getByRole("button", { name: "Add a row" })).toHaveCount(0);
  await expect(page.getByRole("button", { name: "Preview the import" })).toHaveCount(0);
});

test("a technician who reads in imperial units reads the metric shop's spec table in ounces and fluid ounces", async ({
  page,
}) => {
  await signInImperialTechnician(page);

  await page.goto("/specs");
  await page.getByLabel("Search by make, model, variant or year").fill("Focus");
  // The demo's Focus row: 570 g and 150 mL are 20.1 oz and 5.1 fl oz (NIST SP 811: 1 oz = 28.349523125 g,
  // 1 US fl oz = 29.5735295625 mL).
  await expect(page.getByText(/Ford Focus/)).toBeVisible();
  await expect(page.getByText(/R-134a · 20\.1 oz · PAG 46 · 5\.1 fl oz oil/)).toBeVisible();
  const allowances = page.getByRole("form", { name: "Oil carried out by replaced parts" });
  await expect(allowances).toContainText(/Condenser:\s*\d+\.\d fl oz/);
  await expect(allowances).not.toContainText(/\d mL\b/);
});
