import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Browser, type Page } from "@playwright/test";
import { BASE_URL } from "./pages/e2e-env";
import { createTechnician } from "./pages/people-fixtures";
import { SignInPage } from "./pages/sign-in-page";

test.use({ viewport: { width: 390, height: 844 } });

async function axe(page: Page) {
  const results = await new AxeBuilder({ page })
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(" ")}`)).toEqual([]);
}

/** A second phone: its own browser context, signed in as `email`. */
async function phone(browser: Browser, email: string, password: string) {
  const context = await browser.newContext({
    baseURL: BASE_URL,
    viewport: { width: 390, height: 844 },
    isMobile: true,
  });
  const page = await context.newPage();
  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signIn(email, password);
  await expect(page).toHaveURL(/\/cases$/);
  return { context, page };
}

test("the owner resets a person's password; the person signs in with it and must choose their own", async ({
  page,
  browser,
}) => {
  // Several argon2id hashes (sign-ins, the reset, the change): on a loaded machine it needs more than the default minute.
  test.slow();
  const person = await createTechnician("first-own-password-1");
  const before = await phone(browser, person.email, "first-own-password-1");

  await new SignInPage(page).signInAs("owner");
  await page.goto("/settings/users");
  await page.getByRole("button", { name: `Reset the password of ${person.name}` }).click();
  const dialog = page.getByRole("dialog", { name: `Reset the password of ${person.name}?` });
  await expect(dialog).toContainText("signed out on every device");
  await axe(page);
  await dialog.getByRole("button", { name: "Reset the password" }).click();
  const shown = page.getByRole("region", { name: `Temporary password for ${person.name}` });
  await expect(shown).toContainText("One device was signed out.");
  const temporary = (await shown.getByTestId("temporary-password").textContent())?.trim() ?? "";
  expect(temporary).toMatch(/^[a-z2-9]{4}(-[a-z2-9]{4}){3}$/);
  await shown.screenshot({ path: "test-results/people-temporary-password.png" });
  await axe(page);
  await shown.getByRole("button", { name: "Done: hide it" }).click();
  await expect(page.getByText(temporary)).toHaveCount(0);

  // The person's open session ended with the reset.
  await before.page.reload();
  await expect(before.page).toHaveURL(/\/sign-in/);
  await before.context.close();

  const after = await phone(browser, person.email, temporary);
  await expect(after.page.getByRole("heading", { name: "Choose your own password" })).toBeVisible();
  await expect(after.page.getByRole("navigation", { name: "Main" }).getByRole("link")).toHaveCount(0);
  await axe(after.page);
  await after.page
    .getByLabel("Temporary password from the shop owner")
    .pressSequentially(temporary, { delay: 10 });
  await after.page
    .getByLabel("New password", { exact: true })
    .pressSequentially("slate-fan-belt-42", { delay: 10 });
  await after.page.getByLabel("New password again").pressSequentially("slate-fan-belt-42", { delay: 10 });
  await after.page.getByRole("button", { name: "Change my password" }).click();
  await expect(after.page.getByRole("heading", { name: "Choose your own password" })).toBeHidden();
  await expect(
    after.page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Cases" }),
  ).toBeVisible();
  await after.context.close();

  // The temporary password no longer works; the chosen one does.
  const check = await browser.newContext({ baseURL: BASE_URL });
  const refused = await check.request.post("/api/session", {
    data: { email: person.email, password: temporary },
    headers: { origin: BASE_URL },
  });
  expect(refused.status()).toBe(401);
  await check.close();
  const chosen = await phone(browser, person.email, "slate-fan-belt-42");
  await chosen.context.close();
});

test("a person changes their own password; their other phone is signed out, this one stays", async ({
  page,
  browser,
}) => {
  const person = await createTechnician("first-own-password-2");
  const other = await phone(browser, person.email, "first-own-password-2");

  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signIn(person.email, "first-own-password-2");
  await expect(page).toHaveURL(/\/cases$/);
  await page.getByTestId("signed-in-as").click();
  await expect(page.getByRole("heading", { name: "Your password" })).toBeVisible();
  await axe(page);

  const form = page.getByRole("form", { name: "Change your password" });
  await form.getByLabel("Current password").pressSequentially("not-my-password", { delay: 10 });
  await form.getByLabel("New password", { exact: true }).pressSequentially("rowan-cable-tie", { delay: 10 });
  await form.getByLabel("New password again").pressSequentially("rowan-cable-tie", { delay: 10 });
  await form.getByRole("button", { name: "Change my password" }).click();
  await expect(form.getByText("That is not your current password.").first()).toBeVisible();
  await expect(form.getByLabel("New password", { exact: true })).toHaveValue("rowan-cable-tie");

  await form.getByLabel("Current password").fill("first-own-password-2");
  await form.getByRole("button", { name: "Change my password" }).click();
  await expect(form.getByRole("status")).toHaveText(
    "Your password is changed. One other device was signed out.",
  );
  await page.screenshot({ path: "test-results/password-phone.png", fullPage: true });

  await other.page.reload();
  await expect(other.page).toHaveURL(/\/sign-in/);
  await other.context.close();
  await page.goto("/cases");
  await expect(page).toHaveURL(/\/cases$/);
});
