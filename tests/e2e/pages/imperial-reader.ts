import { expect, type Page } from "@playwright/test";
import { DEMO_PASSWORD, SignInPage } from "./sign-in-page";
import { createTechnician } from "./people-fixtures";

/**
 * A technician of the demo shop made for one test (so their units never change what another spec's people
 * see), signed in, who then reads in imperial units: chosen and saved on Your units. `onProfile` runs on
 * that page before the choice; `vacuum` picks a vacuum unit besides.
 */
export async function signInImperialTechnician(
  page: Page,
  { vacuum, onProfile }: { vacuum?: string; onProfile?: () => Promise<void> } = {},
) {
  const person = await createTechnician(DEMO_PASSWORD);
  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signIn(person.email);
  await expect(page).toHaveURL(/\/cases$/);
  await page.goto("/profile");
  await onProfile?.();
  await page.getByRole("group", { name: "Unit system" }).getByRole("button", { name: "Imperial" }).click();
  if (vacuum) await page.getByRole("group", { name: "Vacuum" }).getByRole("button", { name: vacuum }).click();
  await page.getByRole("button", { name: "Save my units" }).click();
  await expect(page.getByText(/Saved\. Every field/)).toBeVisible();
  return person;
}
