import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { signedInClient } from "./pages/api-client";
import { caseIdByVehicle, phonePhoto } from "./pages/owner-fixtures";
import { SignInPage } from "./pages/sign-in-page";

test.use({ viewport: { width: 390, height: 844 } });

async function axe(page: Page) {
  const results = await new AxeBuilder({ page })
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(" ")}`)).toEqual([]);
}

test("deleting a spec row asks first, and the spec form says what is wrong in plain words", async ({
  page,
}) => {
  // An invented row for this test alone; the figures are nobody's specification.
  const model = `Testline ${Date.now().toString(36)}`;
  const owner = await signedInClient("owner@harbourline.test");
  const created = await owner.post("/api/specs", {
    data: {
      yearFrom: 2011,
      yearTo: 2014,
      make: "Nordvik",
      model,
      variant: "",
      rearAc: false,
      refrigerant: "R-134a",
      labelChargeG: 600,
      oilType: "PAG 46",
      totalOilMl: null,
    },
  });
  expect(created.status()).toBe(201);
  await owner.dispose();

  await new SignInPage(page).signInAs("owner");
  await page.goto("/specs");
  await page.getByLabel("Search by make, model, variant or year").fill(model);
  const name = `2011–2014 Nordvik ${model}`;
  await page.getByRole("button", { name: `Delete ${name}` }).click();
  const dialog = page.getByRole("dialog", { name: `Delete ${name}?` });
  await expect(dialog).toContainText("label charge 600 g");
  await axe(page);
  await dialog.getByRole("button", { name: "Go back" }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByText(name)).toBeVisible();
  await page.getByRole("button", { name: `Delete ${name}` }).click();
  await dialog.getByRole("button", { name: "Delete the row" }).click();
  await expect(page.getByRole("status").filter({ hasText: `Deleted the row for ${name}.` })).toBeVisible();
  await expect(page.getByText("No row matches.")).toBeVisible();

  // Plain messages, typed one key at a time.
  await page.getByRole("button", { name: "Add a row" }).click();
  const form = page.getByRole("form", { name: "New spec row" });
  await form.getByLabel("Year from").pressSequentially("2019", { delay: 20 });
  await form.getByLabel("Year to").pressSequentially("2016", { delay: 20 });
  await form.getByLabel("Label charge").pressSequentially("9 lb", { delay: 20 });
  await form.getByRole("button", { name: "Add the row" }).click();
  await expect(form.getByText("Make is missing.")).toBeVisible();
  await expect(form.getByText("Model is missing.")).toBeVisible();
  await expect(form.getByText("The first year is after the last.")).toBeVisible();
  // 9 lb = 4082 g (NIST SP 811), past the 3000 g a car or light truck takes (common practice).
  await expect(form.getByText(/4082 g is outside the label charges of cars and light trucks/)).toBeVisible();
  await expect(form.getByLabel("Label charge")).toHaveValue("9 lb");
});

test("clearing an oil allowance asks first, and going back saves nothing", async ({ page }) => {
  await new SignInPage(page).signInAs("owner");
  await page.goto("/specs");
  const form = page.getByRole("form", { name: "Oil carried out by replaced parts" });
  const hose = form.getByLabel("Hose or line");
  const before = await hose.inputValue();
  expect(before).not.toBe("");
  await hose.fill("");
  await form.getByRole("button", { name: "Save the allowances" }).click();
  const dialog = page.getByRole("dialog", { name: "Clear the figure for hose or line?" });
  await expect(dialog).toContainText(`Hose or line: ${before}`);
  await expect(dialog).toContainText("drain and measure this part instead");
  await axe(page);
  await dialog.getByRole("button", { name: "Go back" }).click();
  await expect(dialog).toBeHidden();
  await page.reload();
  await expect(
    page.getByRole("form", { name: "Oil carried out by replaced parts" }).getByLabel("Hose or line"),
  ).toHaveValue(before);
});

test("deactivating a person asks first; Escape and Go back leave everyone as they were", async ({ page }) => {
  await new SignInPage(page).signInAs("owner");
  await page.goto("/settings/users");
  const button = page.getByRole("button", { name: /^Deactivate .*/ }).first();
  const label = (await button.getAttribute("aria-label")) ?? "";
  const person = label.replace(/^Deactivate /, "");
  await button.click();
  const dialog = page.getByRole("dialog", { name: `Deactivate ${person}?` });
  await expect(dialog).toContainText("can no longer sign in");
  await axe(page);
  await page.keyboard.press("Escape");
  await expect(dialog).toBeHidden();
  await expect(button).toBeFocused();
  await button.click();
  await dialog.getByRole("button", { name: "Go back" }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByText(`${person} (inactive)`)).toHaveCount(0);
});

test("removing a photo from a case asks first", async ({ page }) => {
  const tech = await signedInClient("tech@harbourline.test");
  const caseId = await caseIdByVehicle(tech, "CX-5");
  const caption = `Condenser fins, test ${Date.now().toString(36)}`;
  const upload = await tech.post(`/api/cases/${caseId}/attachments`, {
    multipart: {
      file: { name: "fins.jpg", mimeType: "image/jpeg", buffer: await phonePhoto() },
      kind: "damage",
      caption,
      shareable: "false",
    },
  });
  expect(upload.ok()).toBe(true);
  const photoId = (await upload.json()).attachment.id as number;
  await tech.dispose();

  await new SignInPage(page).signInAs("technician");
  await page.goto(`/cases/${caseId}`);
  const photos = page.getByRole("region", { name: "Photos" });
  await photos.getByRole("button", { name: `Remove photo ${photoId}` }).click();
  const dialog = page.getByRole("dialog", { name: `Remove photo ${photoId}?` });
  await expect(dialog).toContainText(caption);
  await dialog.getByRole("button", { name: "Go back" }).click();
  await expect(photos.getByRole("img", { name: caption })).toBeVisible();
  await photos.getByRole("button", { name: `Remove photo ${photoId}` }).click();
  await dialog.getByRole("button", { name: "Remove the photo" }).click();
  await expect(photos.getByRole("img", { name: caption })).toHaveCount(0);
});

test("withdrawing an invitation asks first; Go back keeps its link", async ({ page }) => {
  const owner = await signedInClient("owner@harbourline.test");
  const email = `new-hand-${Date.now().toString(36)}@harbourline.test`;
  const invited = await owner.post("/api/invitations", {
    data: { email, name: "Noor Vasquez", role: "apprentice" },
  });
  expect(invited.ok()).toBe(true);
  await owner.dispose();

  await new SignInPage(page).signInAs("owner");
  await page.goto("/settings/users");
  const open = page.getByRole("region", { name: "Open invitations" });
  const button = open.getByRole("button", { name: `Withdraw the invitation to ${email}` });
  await button.click();
  const dialog = page.getByRole("dialog", { name: `Withdraw the invitation to ${email}?` });
  await expect(dialog).toContainText("Noor Vasquez");
  await axe(page);
  await dialog.getByRole("button", { name: "Go back" }).click();
  await expect(dialog).toBeHidden();
  await expect(button).toBeFocused();
  await expect(open.getByText(`${email} · link valid until`)).toBeVisible();
  await button.click();
  await dialog.getByRole("button", { name: "Withdraw the invitation" }).click();
  await expect(open.getByRole("status")).toHaveText("Invitation withdrawn; its link no longer works.");
  await expect(button).toHaveCount(0);
});
