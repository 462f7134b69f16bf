import { expect, test, type Page } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { SignInPage } from "./pages/sign-in-page";
import { CasebookPage } from "./pages/casebook-page";

// The demo's casebook cases (scripts/demo/casebook-cases.ts): a courier van closed with a failed fan relay,
// the same van back within the window with the same readings, a pickup and a saloon with condenser-airflow
// outcomes, and a Ridgeback pickup with the same readings that Harbourline must never see.
test.use({ viewport: { width: 390, height: 844 } });

async function caseIdFor(page: Page, words: string): Promise<number> {
  const res = await page.request.get(`/api/casebook?q=${encodeURIComponent(words)}`);
  const body = (await res.json()) as { rows: { caseId: number }[] };
  expect(body.rows.length, words).toBeGreaterThan(0);
  return body.rows[0]!.caseId;
}

async function axe(page: Page, include?: string) {
  const builder = new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"]);
  const results = await (include ? builder.include(include) : builder).analyze();
  expect(
    results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`),
  ).toEqual([]);
}

test("finds a case by a word of its complaint, typed one key at a time, and keeps the search in the address", async ({
  page,
}) => {
  await new SignInPage(page).signInAs("technician");
  const casebook = new CasebookPage(page);
  await casebook.open();
  await casebook.typeWords("delivery");
  await expect(page).toHaveURL(/\/casebook\?q=delivery$/);
  await expect(casebook.count()).toHaveText(/^1 case/);
  await expect(casebook.cards()).toHaveCount(1);
  await expect(casebook.cards().first()).toContainText("2018 Ford Transit");
  await expect(casebook.cards().first()).toContainText("Comeback after case");
  await page.screenshot({ path: "test-results/casebook-phone-words.png", fullPage: true });
  await axe(page);

  // The address is the search: opened afresh, it shows the same result.
  await page.goto(page.url());
  await expect(casebook.searchBox()).toHaveValue("delivery");
  await expect(casebook.cards()).toHaveCount(1);
});

test("finds cases by a symptom and by the confirmed cause, and filters for comebacks", async ({ page }) => {
  await new SignInPage(page).signInAs("senior");
  const casebook = new CasebookPage(page);
  await casebook.open();
  await casebook.choose("Symptom", "Condenser fan not running with A/C on");
  await expect(page).toHaveURL(/symptoms=condenser_fan_not_running/);
  await expect(casebook.count()).toHaveText(/^2 cases/);
  for (const card of await casebook.cards().all()) await expect(card).toContainText("Ford Transit");
  await page.getByRole("button", { name: /Remove filter Condenser fan not running/ }).click();

  await casebook.choose("Confirmed cause", "Poor airflow through the condenser");
  await expect(page).toHaveURL(/cause=condenser_airflow/);
  await expect(casebook.count()).toHaveText(/^3 cases/);
  const text = (await casebook.cards().allTextContents()).join("\n");
  expect(text).toContain("Ford Transit");
  expect(text).toContain("GMC Sierra 1500");
  expect(text).toContain("Chevrolet Malibu");
  expect(text).not.toContain("Tacoma"); // the other shop's pickup
  await page.screenshot({ path: "test-results/casebook-phone-cause.png", fullPage: true });
  await axe(page);

  await page.getByRole("button", { name: "Clear all filters" }).click();
  await casebook.openFilters();
  await page.getByLabel(/Comebacks only/).check();
  await expect(page).toHaveURL(/comeback=1/);
  await expect(casebook.count()).toHaveText(/^2 cases/);
  const comebacks = (await casebook.cards().allTextContents()).join("\n");
  expect(comebacks).toMatch(/Comeback after case \d+/);
  expect(comebacks).toMatch(/Came back as case \d+/);
});

test("a search keeps its last results and says so when the network drops", async ({ page, context }) => {
  await new SignInPage(page).signInAs("technician");
  const casebook = new CasebookPage(page);
  await casebook.open();
  await casebook.typeWords("warm");
  await expect(page).toHaveURL(/q=warm/);
  // The count of "warm" itself, not the previous search's while this one loads.
  await expect(casebook.count()).not.toContainText("updating");
  const before = await casebook.count().textContent();
  await context.setOffline(true);
  await casebook.typeWords(" grille");
  // The page's own alert, not the router's announcement of the page title.
  await expect(page.getByRole("main").getByRole("alert")).toContainText("The last results stay in view");
  await expect(casebook.count()).toHaveText(before ?? "");
  await expect(casebook.searchBox()).toHaveValue("warm grille");
  await context.setOffline(false);
});

test("the case page flags a comeback on both cases and lists the nearest seeded neighbour", async ({
  page,
}) => {
  await new SignInPage(page).signInAs("technician");
  const back = await caseIdFor(page, "delivery");
  const before = await caseIdFor(page, "courier");
  await page.goto(`/cases/${back}`);
  await expect(page.getByText(`Comeback after case ${before}`)).toBeVisible();
  const panel = page.getByRole("region", { name: "Similar closed cases" });
  await expect(panel.getByTestId("similar-summary")).toHaveText(
    "3 of the 4 nearest closed cases were confirmed as poor condenser airflow.",
  );
  const nearest = panel.getByRole("list", { name: /Nearest closed cases/ }).getByRole("listitem");
  await expect(nearest.first()).toContainText(`Case ${before}`);
  await expect(nearest.first()).toContainText("2018 Ford Transit");
  await expect(nearest.first()).toContainText("Repair condenser fan, relay or circuit");
  await expect(nearest.first()).toContainText("Distance 0.00");
  // The links that open the other case are tap targets of at least 44 px (WCAG 2.5.5).
  for (const link of [
    page.getByRole("link", { name: `Comeback after case ${before}` }),
    nearest.first().getByRole("link", { name: `Case ${before}` }),
  ])
    expect((await link.boundingBox())?.height).toBeGreaterThanOrEqual(44);
  await expect(panel).not.toContainText("Tacoma");
  await panel.scrollIntoViewIfNeeded();
  await page.screenshot({ path: "test-results/casebook-similar-panel.png", fullPage: true });
  await axe(page, "#main");

  await page.goto(`/cases/${before}`);
  await expect(page.getByText(`Came back as case ${back}`)).toBeVisible();
});

test("the other shop's owner sees only the pickup, never Harbourline's cases", async ({ page }) => {
  await new SignInPage(page).goto();
  await new SignInPage(page).signIn("owner@ridgeback.test");
  await expect(page).toHaveURL(/\/cases$/);
  const casebook = new CasebookPage(page);
  await casebook.open();
  await casebook.typeWords("warm idle");
  await expect(casebook.count()).toHaveText(/^1 case/);
  await expect(casebook.cards().first()).toContainText("Toyota Tacoma");
});
