import AxeBuilder from "@axe-core/playwright";
import { expect, test, type APIRequestContext } from "@playwright/test";
import { signedInClient } from "./pages/api-client";
import { LedgerPage } from "./pages/ledger-page";
import { SignInPage } from "./pages/sign-in-page";

test.use({ viewport: { width: 390, height: 844 } });

/** A recovery cylinder of the signed-in owner's shop, made for this test alone (an invented label). */
async function newCylinder(client: APIRequestContext, label: string, initialNetG: number) {
  const response = await client.post("/api/cylinders", {
    data: { label, refrigerant: "R-134a", kind: "recovery", tareG: 7_300, capacityG: 22_680, initialNetG },
  });
  expect(response.status()).toBe(201);
}

async function axe(page: import("@playwright/test").Page) {
  const results = await new AxeBuilder({ page })
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(" ")}`)).toEqual([]);
}

test("a technician is refused a shipment bigger than the cylinder holds, with the numbers, and cancels a wrong line", async ({
  page,
}) => {
  const label = `E2E-REC-${Date.now().toString(36)}`;
  const owner = await signedInClient("owner@harbourline.test");
  await newCylinder(owner, label, 4_660);
  await owner.dispose();

  await new SignInPage(page).signInAs("technician");
  const ledger = new LedgerPage(page);
  await ledger.goto();
  await expect(ledger.netMass(label)).toHaveText("4,660 g");

  // 5 kg out of 4,660 g: refused before it posts, with both figures.
  await ledger.post({
    cylinder: label,
    what: "Sent out for reclaim or destruction",
    mass: "5 kg",
    destination: "Valley Reclaim",
  });
  await expect(ledger.status()).toContainText(
    `Refused: ${label} would go below empty. It holds 4,660 g and this takes out 5,000 g.`,
  );
  await expect(ledger.status()).toContainText("what you typed is kept");
  await expect(page.getByLabel("Mass")).toHaveValue("5 kg");
  await expect(ledger.netMass(label)).toHaveText("4,660 g");

  // 999 kg: a plain message, not "Enter the mass".
  await ledger.post({ cylinder: label, what: "Sent out for reclaim or destruction", mass: "999 kg" });
  await expect(
    page.getByText("999 kg is more than any cylinder here holds. Check the figure and its unit."),
  ).toBeVisible();

  // A wrong line goes in, then is cancelled with a reason; both lines stay.
  await ledger.post({
    cylinder: label,
    what: "Sent out for reclaim or destruction",
    mass: "4 kg",
    destination: "Valley Reclaim",
  });
  await expect(ledger.status()).toHaveText("Posted to the ledger.");
  await expect(ledger.netMass(label)).toHaveText("660 g");
  const wrong = ledger.line(`Sent out from ${label}`).filter({ hasNotText: "Correction cancelling" });
  await wrong.getByRole("button", { name: /Cancel line #\d+ with a correction/ }).click();
  const dialog = page.getByRole("dialog", { name: /Cancel line #\d+\?/ });
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText("The line stays in the ledger.");
  await page.screenshot({ path: "test-results/ledger-dialog.png" });
  await axe(page);
  await dialog.getByRole("button", { name: "Post the correction" }).click();
  await expect(dialog.getByRole("alert")).toHaveText("Why is this line wrong?: a few words, please.");
  await dialog
    .getByLabel("Why is this line wrong?")
    .pressSequentially("Typed 4 kg; the scale showed 400 g", { delay: 10 });
  await dialog.getByRole("button", { name: "Post the correction" }).click();
  await expect(dialog).toBeHidden();
  await expect(
    page.getByText(/Line #\d+ is cancelled by correction #\d+\. Both stay in the ledger\./),
  ).toBeVisible();
  await expect(ledger.netMass(label)).toHaveText("4,660 g");
  const correction = ledger.line(`Correction cancelling`).filter({ hasText: label });
  await expect(correction).toContainText("reason: Typed 4 kg; the scale showed 400 g");
  await expect(wrong).toContainText(/cancelled by #\d+/);
  await expect(wrong.getByRole("button", { name: /Cancel line/ })).toHaveCount(0);

  // The on-screen report nets the correction the way the CSV does.
  const report = page.getByTestId("ledger-report");
  await expect(report).toContainText("1 netted in");
  const csv = await (await page.request.get("/api/ledger/report?format=csv")).text();
  expect(csv.split("\r\n")[0]).toContain("corrections");
  await page.screenshot({ path: "test-results/ledger-phone.png", fullPage: true });
  await axe(page);
});

test("an imperial shop reads the refusal in pounds, and retiring a cylinder asks first", async ({ page }) => {
  const label = `E2E-RB-${Date.now().toString(36)}`;
  const owner = await signedInClient("owner@ridgeback.test");
  await newCylinder(owner, label, 1_200);
  await owner.dispose();

  await new SignInPage(page).goto();
  await new SignInPage(page).signIn("owner@ridgeback.test");
  await expect(page).toHaveURL(/\/cases$/);
  const ledger = new LedgerPage(page);
  await ledger.goto();
  // 1,200 g = 2.65 lb; 3 lb = 1,361 g (NIST SP 811: 1 lb = 453.59237 g).
  await expect(ledger.netMass(label)).toHaveText("2.65 lb");
  await ledger.post({
    cylinder: label,
    what: "Sent out for reclaim or destruction",
    mass: "3",
    destination: "Prairie Reclaim",
  });
  await expect(ledger.status()).toContainText("It holds 2.65 lb and this takes out 3.00 lb.");

  // The server's limit is said in pounds too: 500 g = 1.10 lb (NIST SP 811: 1 lb = 453.59237 g).
  await ledger.addCylinder({ label: `${label}-T`, tare: "0.5", capacity: "50", initial: "0" });
  await expect(ledger.addCylinderForm()).toContainText("A tare under 1.10 lb is not a refrigerant cylinder.");
  await expect(ledger.addCylinderForm()).not.toContainText(/\b500 g\b|\{\{/);

  const card = page.getByTestId(`cylinder-${label}`);
  await card.getByRole("button", { name: `Retire ${label}` }).click();
  const dialog = page.getByRole("dialog", { name: `Retire ${label}?` });
  await expect(dialog).toContainText("It still holds refrigerant");
  await dialog.getByRole("button", { name: "Go back" }).click();
  await expect(dialog).toBeHidden();
  await expect(card).not.toContainText("(retired)");
  await card.getByRole("button", { name: `Retire ${label}` }).click();
  await page.keyboard.press("Escape");
  await expect(dialog).toBeHidden();
  await expect(card.getByRole("button", { name: `Retire ${label}` })).toBeFocused();
  await card.getByRole("button", { name: `Retire ${label}` }).click();
  await dialog.getByRole("button", { name: "Retire the cylinder" }).click();
  await expect(card).toContainText("(retired)");
});

test("an apprentice cannot open the ledger", async ({ page }) => {
  await new SignInPage(page).signInAs("apprentice");
  const response = await page.goto("/ledger");
  expect(response?.status()).toBe(403);
});

test("a ledger line's time reads in the shop's own locale and clock, with its year, like the rest of the shop's screens", async ({
  page,
}) => {
  // Harbourline keeps its clock in English (Canada): 12-hour times with a.m. and p.m. (scripts/demo/people.ts).
  await new SignInPage(page).signInAs("senior");
  await page.goto("/ledger");
  const movements = page.getByRole("region", { name: "Movements" });
  const firstLine = movements.getByText(/^#\d+ · /).first();
  await expect(firstLine).toHaveText(/^#\d+ · [A-Z][a-z]{2} \d{1,2}, \d{4}, \d{1,2}:\d{2}\s[ap]\.m\. · /);
});

test("every mass field of the ledger says what unit a number alone is read in", async ({ page }) => {
  await new SignInPage(page).signInAs("senior");
  await page.goto("/ledger");
  for (const label of [
    "Tare (stamped on the collar)",
    "Refrigerant capacity",
    "Refrigerant in it now",
    "Mass",
  ])
    await expect(page.getByLabel(label, { exact: true })).toHaveAccessibleDescription(
      /Type grams or add a unit/,
    );
});
