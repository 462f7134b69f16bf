import { expect, type Page } from "@playwright/test";

/** The casebook screen as a technician works it on a phone. */
export class CasebookPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Casebook" }).click();
    await expect(this.page.getByRole("heading", { name: "Casebook", level: 1 })).toBeVisible();
  }

  searchBox() {
    return this.page.getByLabel("Search the shop's cases");
  }

  /** Types the words one key at a time, as a thumb would. */
  async typeWords(words: string) {
    await this.searchBox().click();
    await this.searchBox().pressSequentially(words, { delay: 40 });
  }

  count() {
    return this.page.getByTestId("casebook-count");
  }

  cards() {
    return this.page.getByRole("list", { name: "Cases found" }).getByRole("listitem");
  }

  async openFilters() {
    const summary = this.page.locator("summary", { hasText: "Filters" });
    if (!(await this.page.locator("details[open]").count())) await summary.click();
  }

  async choose(label: string, option: string | RegExp) {
    await this.openFilters();
    const select = this.page.getByLabel(label, { exact: true });
    const value = await select.locator("option", { hasText: option }).first().getAttribute("value");
    await select.selectOption(value ?? "");
  }
}
