import { expect, type Locator, type Page } from "@playwright/test";

/**
 * The interview as a technician drives it. Every tap and every key press other than the digits of a
 * reading is counted, so a test can hold the interview to its tap budget.
 */
export class InterviewPage {
  taps = 0;

  constructor(readonly page: Page) {}

  heading(name: string | RegExp) {
    return this.page.getByRole("heading", { level: 1, name });
  }

  async expectStep(name: string | RegExp) {
    await expect(this.heading(name)).toBeVisible();
  }

  field(name: string | RegExp): Locator {
    return this.page.getByRole("textbox", { name });
  }

  async tap(locator: Locator) {
    this.taps += 1;
    await locator.click();
  }

  async press(key: string) {
    this.taps += 1;
    await this.page.keyboard.press(key);
  }

  /** Types the digits of a reading into the focused field; digits are not counted. */
  async digits(text: string) {
    if (!/^[0-9]+$/.test(text)) throw new Error(`digits() takes digits only, got ${text}`);
    await this.page.keyboard.type(text);
  }

  /** Taps a field, then types a reading into it. */
  async enter(name: string | RegExp, value: string) {
    await this.tap(this.field(name));
    await this.field(name).fill("");
    await this.digits(value);
  }

  next() {
    return this.tap(this.page.getByRole("button", { name: "Next", exact: true }));
  }

  skip() {
    return this.tap(this.page.getByRole("button", { name: "Skip", exact: true }));
  }

  back() {
    return this.tap(this.page.getByRole("button", { name: "Back", exact: true }));
  }

  choose(name: string | RegExp) {
    return this.tap(this.page.getByRole("button", { name }));
  }

  async setUnit(fieldLabel: string, unit: string) {
    await this.tap(
      this.page
        .getByRole("group", { name: `Unit for ${fieldLabel.toLowerCase()}` })
        .getByRole("button", { name: unit, exact: true }),
    );
  }

  async waitUntilSaved() {
    await expect(this.page.getByText("All answers saved")).toBeVisible({ timeout: 20_000 });
  }

  /** The leading causes in rank order, each with its full name and its strongest reasons. */
  suspects() {
    return this.page.getByRole("region", { name: /^Why (this cause|these causes)$/ }).getByRole("article");
  }

  /** The leading causes' rows in the ranking, each with its share. */
  leadingRows() {
    return this.page.getByTestId("leading-causes").getByRole("listitem");
  }

  caseIdFromUrl(): number {
    const match = /\/cases\/(\d+)\/interview/.exec(this.page.url());
    if (!match) throw new Error(`not on an interview page: ${this.page.url()}`);
    return Number(match[1]);
  }
}

/** Opens a new case for a listed vehicle and lands in the interview. */
export async function openCase(interview: InterviewPage, vehicle: RegExp, complaint: string) {
  const { page } = interview;
  await page.goto("/cases");
  await interview.tap(page.getByRole("link", { name: "New case" }));
  await interview.tap(page.getByRole("button", { name: vehicle }).first());
  await interview.tap(page.getByLabel("The complaint, in the owner's words"));
  // The complaint is the owner's sentence, dictated or typed once: counted as one entry.
  interview.taps += 1;
  await page.getByLabel("The complaint, in the owner's words").fill(complaint);
  await interview.tap(page.getByRole("button", { name: "Start the interview" }));
  await expect(page).toHaveURL(/\/cases\/\d+\/interview$/);
}
