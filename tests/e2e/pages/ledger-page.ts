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

  /** The add-a-cylinder form, its masses typed one key at a time in the ledger's mass unit. */
  async addCylinder(opts: { label: string; tare: string; capacity: string; initial: string }) {
    const form = this.addCylinderForm();
    await form.getByLabel("Label on the cylinder").fill(opts.label);
    for (const [name, text] of [
      ["Tare (stamped on the collar)", opts.tare],
      ["Refrigerant capacity", opts.capacity],
      ["Refrigerant in it now", opts.initial],
    ] as const) {
      const field = form.getByLabel(name);
      await field.fill("");
      await field.pressSequentially(text, { delay: 30 });
    }
    await form.getByRole("button", { name: "Add the cylinder" }).click();
  }

  addCylinderForm() {
    return this.page.locator("form").filter({ hasText: "Add a cylinder" });
  }

  netMass(label: string) {
    return this.page.getByTestId(`cylinder-${label}`).getByTestId("cylinder-net");
  }

  line(text: RegExp | string) {
    return this.page.getByTestId("movement-list").getByRole("listitem").filter({ hasText: text });
  }
}
