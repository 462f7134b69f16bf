import { expect, type Page } from "@playwright/test";

export const DEMO_PASSWORD = "chill-demo-2026";

export const DEMO_USERS = {
  owner: { email: "owner@harbourline.test", name: "owner" },
  senior: { email: "senior@harbourline.test", name: "senior" },
  technician: { email: "tech@harbourline.test", name: "technician" },
  apprentice: { email: "apprentice@harbourline.test", name: "apprentice" },
} as const;
export type DemoRole = keyof typeof DEMO_USERS;

export class SignInPage {
  constructor(private readonly page: Page) {}

  async goto() {
    await this.page.goto("/sign-in");
    await expect(this.page.getByRole("heading", { name: "Sign in" })).toBeVisible();
  }

  async signIn(email: string, password = DEMO_PASSWORD) {
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByLabel("Password").fill(password);
    await this.page.getByRole("button", { name: "Sign in" }).click();
  }

  async signInAs(role: DemoRole) {
    await this.goto();
    await this.signIn(DEMO_USERS[role].email);
    await expect(this.page).toHaveURL(/\/cases$/);
  }

  /** The form's own alert (Next.js keeps an empty route announcer with the same role). */
  alert() {
    return this.page.getByRole("alert").filter({ hasText: /\S/ });
  }
}
