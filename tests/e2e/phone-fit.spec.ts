import { expect, test, type Locator, type Page } from "@playwright/test";
import { SignInPage } from "./pages/sign-in-page";

// The shop's screens read on a 390 px phone: nothing scrolls the page sideways, nothing a person must
// read is cut off with an ellipsis, a button says its label on one line, and every tap target is at
// least 44 px (WCAG 2.1 success criterion 2.5.5).
test.use({ viewport: { width: 390, height: 844 } });

const TAP = 44;

async function noSidewaysScroll(page: Page) {
  const { scroll, client } = await page.evaluate(() => ({
    scroll: document.documentElement.scrollWidth,
    client: document.documentElement.clientWidth,
  }));
  expect(scroll, "the page scrolls sideways").toBeLessThanOrEqual(client);
}

/** The text is shown whole: no part hidden behind an ellipsis or clipped at the box's edge. */
async function shownWhole(line: Locator) {
  await expect(line).toBeVisible();
  const { scroll, client } = await line.evaluate((el) => ({
    scroll: el.scrollWidth,
    client: el.clientWidth,
  }));
  expect(scroll, `"${await line.innerText()}" is cut off`).toBeLessThanOrEqual(client);
}

async function atLeastATap(target: Locator) {
  const box = await target.boundingBox();
  expect(box, "the target is laid out").not.toBeNull();
  expect(box!.height).toBeGreaterThanOrEqual(TAP);
  expect(box!.width).toBeGreaterThanOrEqual(TAP);
}

test("an owner's spec table, with its CSV import, stays inside the phone's width", async ({ page }) => {
  await new SignInPage(page).signInAs("owner");
  await page.goto("/specs");
  await expect(page.getByLabel("Choose a file")).toBeVisible();
  await noSidewaysScroll(page);
});

test("a senior with a long name reads the sign-out button's label on one line", async ({ page }) => {
  await new SignInPage(page).signInAs("senior");
  const signOut = page.getByRole("banner").getByRole("button", { name: "Sign out" });
  const box = await signOut.boundingBox();
  const lineHeight = await signOut.evaluate((el) => parseFloat(getComputedStyle(el).lineHeight));
  expect(box!.height).toBeLessThan(TAP + lineHeight);
});

test("an owner reads each person's whole e-mail address and when an invitation's link runs out", async ({
  page,
}) => {
  const address = `long-address-for-a-new-hand-${Date.now()}@harbourline.test`;
  await new SignInPage(page).signInAs("owner");
  await page.goto("/settings/users");
  const form = page.getByRole("region", { name: "Invite a person" });
  await form.getByLabel("Name").fill("Rosalind Achterberg");
  await form.getByLabel("E-mail").fill(address);
  await form.getByRole("button", { name: "Send invitation" }).click();
  const invitations = page.getByRole("region", { name: "Open invitations" });
  const line = invitations.locator("p").filter({ hasText: address });
  await expect(line).toContainText("link valid until");
  await shownWhole(line);
  const people = page.getByRole("region", { name: "The shop's people" });
  await shownWhole(people.locator("p").filter({ hasText: "senior@harbourline.test" }));
});

test("the ledger's link to a service record and the profile's unit buttons are big enough to tap", async ({
  page,
}) => {
  await new SignInPage(page).signInAs("senior");
  await page.goto("/ledger");
  await atLeastATap(page.getByRole("link", { name: /From the service record of case/ }).first());
  await page.goto("/profile");
  const mass = page.getByRole("group", { name: "Refrigerant mass" });
  for (const unit of ["g", "kg", "oz", "lb"])
    await atLeastATap(mass.getByRole("button", { name: unit, exact: true }));
});

test("a case's comeback link and a service record's way back to its case are big enough to tap", async ({
  page,
}) => {
  await new SignInPage(page).signInAs("senior");
  await page.goto("/casebook?comeback=1");
  await page
    .getByRole("list", { name: "Cases found" })
    .getByRole("link")
    .filter({ hasText: "Comeback after case" })
    .first()
    .click();
  await expect(page).toHaveURL(/\/cases\/\d+$/);
  await atLeastATap(page.getByRole("link", { name: /^Comeback after case \d+$/ }));
  await page.goto("/ledger");
  await page
    .getByRole("link", { name: /From the service record of case/ })
    .first()
    .click();
  await expect(page).toHaveURL(/\/cases\/\d+\/service$/);
  await atLeastATap(page.getByRole("link", { name: /^← Case \d+$/ }));
});

test.describe("on a desktop", () => {
  test.use({ viewport: { width: 1280, height: 900 } });

  test("the casebook's table keeps each date on one line, and a page button that cannot be used looks it", async ({
    page,
  }) => {
    await new SignInPage(page).signInAs("senior");
    await page.goto("/casebook");
    const table = page.getByRole("table");
    await expect(table).toBeVisible();
    const firstDate = table.getByRole("row").nth(1).getByRole("cell").nth(1);
    await expect(firstDate).toHaveText(/^\d{4}-\d{2}-\d{2}$/);
    const { height, lineHeight } = await firstDate.evaluate((el) => {
      const range = document.createRange();
      range.selectNodeContents(el);
      return {
        height: range.getBoundingClientRect().height,
        lineHeight: parseFloat(getComputedStyle(el).lineHeight),
      };
    });
    expect(height, "the date wraps").toBeLessThan(1.5 * lineHeight);

    // A status says its words on one line inside its badge ("In progress", "Waiting for sign-off").
    for (const badge of await table.getByText(/^(In progress|Waiting for sign-off)$/).all()) {
      const lineHeight = await badge.evaluate((el) => parseFloat(getComputedStyle(el).lineHeight));
      const box = await badge.boundingBox();
      expect(box!.height, `"${await badge.innerText()}" wraps in its badge`).toBeLessThan(2 * lineHeight);
    }

    const previous = page
      .getByRole("navigation", { name: "Pages" })
      .getByRole("button", { name: "Previous page" });
    await expect(previous).toBeDisabled();
    const opacity = await previous.evaluate((el) => Number(getComputedStyle(el).opacity));
    expect(opacity, "a disabled button looks like one that works").toBeLessThan(1);
  });
});
