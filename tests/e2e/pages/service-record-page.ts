import { expect, type Page } from "@playwright/test";

/** The step-by-step service record on a case, as a technician uses it on a phone. */
export class ServiceRecordPage {
  constructor(private readonly page: Page) {}

  async goto(caseId: number) {
    await this.page.goto(`/cases/${caseId}/service`);
    await expect(this.page.getByRole("heading", { name: /^Service record:/ })).toBeVisible();
  }

  field(label: string) {
    return this.page.getByLabel(label, { exact: true });
  }

  async fill(values: Record<string, string>) {
    for (const [label, value] of Object.entries(values)) await this.field(label).fill(value);
  }

  async chooseCylinder(label: string, cylinder: string) {
    const select = this.field(label);
    const value = await select.locator("option", { hasText: cylinder }).getAttribute("value");
    await select.selectOption(value ?? "");
  }

  async saveAndExpect(stepTitle: string) {
    await this.page.getByRole("button", { name: /^Save/ }).click();
    await expect(this.page.getByRole("status")).toContainText(`${stepTitle} saved.`);
  }

  result(testId: string) {
    return this.page.getByTestId(testId);
  }

  /** The form's own alert (Next.js keeps an empty route announcer with role=alert on every page). */
  alert() {
    return this.page.locator("form").getByRole("alert");
  }
}
