import { expect, test } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { SignInPage } from "./pages/sign-in-page";

test("anyone can open the credits from the sign-in page: reference papers and every package with its licence", async ({
  page,
}, testInfo) => {
  await new SignInPage(page).goto();
  await page.getByRole("link", { name: "Credits and licences" }).click();
  await expect(page).toHaveURL(/\/credits$/);
  await expect(page.getByRole("heading", { name: "Credits and licences", level: 1 })).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath("credits-phone.png") });

  const papers = page.getByRole("list", { name: "Publications behind the saturation tables" });
  await expect(papers).toContainText("Tillner-Roth, R. & Baehr, H. D. (1994)");
  await expect(papers).toContainText("Span, R. & Wagner, W. (1996)");

  const direct = page.getByRole("list", { name: "Packages Chillwright depends on" });
  const zod = direct.getByRole("listitem").filter({ hasText: /^zod/ });
  await expect(zod).toContainText("MIT");
  await expect(direct.getByRole("listitem").filter({ hasText: "psychrolib" })).toContainText("MIT");

  const included = page.getByRole("list", { name: "Packages the dependencies bring with them" });
  await expect(included).toBeHidden();
  await page.getByText(/packages they bring with them/).click();
  await expect(included).toBeVisible();

  const results = await new AxeBuilder({ page })
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  const serious = results.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => `${v.id} (${v.nodes.length})`)).toEqual([]);
});

test("a signed-in technician reaches the credits from the footer of every shop page", async ({ page }) => {
  await new SignInPage(page).signInAs("technician");
  await page.getByRole("contentinfo").getByRole("link", { name: "Credits and licences" }).click();
  await expect(page).toHaveURL(/\/credits$/);
  await page.getByRole("link", { name: "Back to Chillwright" }).click();
  await expect(page).toHaveURL(/\/cases$/);
});
