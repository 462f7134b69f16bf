import { expect, type Page } from "@playwright/test";

/** The refrigerant ledger screen as a technician uses it. */
export class LedgerPage {
  constructor(private readonly page: Page) {}

  async goto() {
    await this.page.goto("/ledger");
    await expect(this.page.getByRole("heading", { name: "Refrigerant ledger" })).toBeVisible();
  }

  /** Fill the hand-posted movement form, typing the mass one key at a time. */
  async post(opts: { cylinder: string; what: string; mass: string; destination?: string; note?: string }) {
    const form = this.page.locator("form").filter({ hasText: "Post recycling, a shipment" });
    const select = form.getByLabel("Cylinder");
    const value = await select.locator("option", { hasText: `${opts.cylinder} (` }).getAttribute("value");
    await select.selectOption(value ?? "");
    await form.getByLabel("What happened").selectOption({ label: opts.what });
    const mass = form.getByLabel("Mass");
    await mass.fill("");
    await mass.pressSequentially(opts.mass, { delay: 30 });
    if (opts.destination !== undefined) await form.getByLabel("Sent to (facility)").fill(opts.destination);
    if (opts.note !== undefined) await form.getByLabel(/Note|Why the weighed mass differs/).fill(opts.note);
    await form.getByRole("button", { name: "Post to the ledger" }).click();
  }

  status() {
    return this.page.getByTestId("movement-form-status");
  }

  netMass(label: string) {
    return this.page.getByTestId(`cylinder-${label}`).getByTestId("cylinder-net");
  }

  line(text: RegExp | string) {
    return this.page.getByTestId("movement-list").getByRole("listitem").filter({ hasText: text });
  }
}
