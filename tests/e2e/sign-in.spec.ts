import { expect, test } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { DEMO_USERS, SignInPage, type DemoRole } from "./pages/sign-in-page";

const EXPECTED_NAV: Record<DemoRole, string[]> = {
  owner: ["Cases", "Sign-off", "Casebook", "Spec table", "Ledger", "People"],
  senior: ["Cases", "Sign-off", "Casebook", "Spec table", "Ledger"],
  technician: ["Cases", "Casebook", "Spec table", "Ledger"],
  apprentice: ["Cases", "Casebook", "Spec table"],
};
const ALL_NAV = ["Cases", "Sign-off", "Casebook", "Spec table", "Ledger", "People"];
const REFUSED_PAGES: Record<DemoRole, string[]> = {
  owner: [],
  senior: ["/settings/users"],
  technician: ["/settings/users", "/signoff"],
  apprentice: ["/settings/users", "/signoff", "/ledger"],
};

for (const role of Object.keys(DEMO_USERS) as DemoRole[]) {
  test(`${role} signs in, sees the navigation for the role, is refused other pages, signs out`, async ({
    page,
  }) => {
    const signIn = new SignInPage(page);
    await signIn.signInAs(role);
    const nav = page.getByRole("navigation", { name: "Main" });
    for (const label of ALL_NAV) {
      const link = nav.getByRole("link", { name: label, exact: true });
      if (EXPECTED_NAV[role].includes(label)) await expect(link).toBeVisible();
      else await expect(link).toHaveCount(0);
    }
    for (const path of REFUSED_PAGES[role]) {
      const response = await page.goto(path);
      expect(response?.status(), path).toBe(403);
      await expect(page.getByRole("heading", { name: "Not open to your role" })).toBeVisible();
    }
    await page.goto("/cases");
    await page.getByRole("button", { name: "Sign out" }).click();
    await expect(page).toHaveURL(/\/sign-in$/);
    await page.goto("/cases");
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fcases$/);
  });
}

test("a wrong password gets a clear message and keeps the e-mail typed", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signIn(DEMO_USERS.technician.email, "not-the-password");
  await expect(signIn.alert()).toContainText("do not match an active account");
  await expect(page.getByLabel("E-mail")).toHaveValue(DEMO_USERS.technician.email);
});

test("bad input is explained beside the field before anything is sent", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signIn("not-an-email", "");
  await expect(page.getByText("Enter a valid e-mail address.")).toBeVisible();
  await expect(page.getByText("Enter your password.")).toBeVisible();
  await expect(page).toHaveURL(/\/sign-in$/);
});

test("the sign-in page has no serious accessibility violations (axe)", async ({ page }) => {
  await new SignInPage(page).goto();
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => `${v.id}: ${v.help}`)).toEqual([]);
});
