import { expect, test } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { mailTo } from "./pages/mail-catcher";
import { SignInPage } from "./pages/sign-in-page";

async function invitationLinkFor(address: string): Promise<string> {
  const mail = await mailTo(address);
  const link = /https?:\/\/\S+\/invitation\/[A-Za-z0-9_-]{43}/.exec(mail.text)?.[0];
  if (!link) throw new Error(`no invitation link in the mail to ${address}`);
  return link;
}

test("an owner invites a technician, who sets a password from the mailed link and is signed in", async ({
  page,
  browser,
}, testInfo) => {
  const address = `new-hand-${Date.now()}@harbourline.test`;
  await new SignInPage(page).signInAs("owner");
  await page.goto("/settings/users");
  const form = page.getByRole("region", { name: "Invite a person" });
  await form.getByLabel("Name").pressSequentially("Dana Okafor");
  await form.getByLabel("E-mail").pressSequentially(address);
  await form.getByLabel("Role").selectOption("technician");
  await form.getByRole("button", { name: "Send invitation" }).click();
  await expect(form.getByRole("status")).toContainText(`Invitation sent to ${address}.`);
  const open = page.getByRole("region", { name: "Open invitations" });
  await expect(open).toContainText(address);

  // The person opens the link on their own phone.
  const phone = await browser.newContext({ ...testInfo.project.use });
  const invited = await phone.newPage();
  await invited.goto(await invitationLinkFor(address));
  await expect(invited.getByRole("heading", { name: /^Join Harbourline/ })).toBeVisible();
  const axe = await new AxeBuilder({ page: invited }).withTags(["wcag2a", "wcag2aa"]).analyze();
  expect(axe.violations.map((v) => `${v.id}: ${v.help}`)).toEqual([]);
  await invited.getByLabel("New password", { exact: true }).pressSequentially("condenser-fan-42");
  await invited.getByLabel("New password again").pressSequentially("condenser-fan-4");
  await invited.getByRole("button", { name: "Set password and sign in" }).click();
  await expect(invited.getByText("The two passwords differ.")).toBeVisible();
  await invited.getByLabel("New password again").press("2");
  await invited.screenshot({ path: testInfo.outputPath("invitation.png") });
  await invited.getByRole("button", { name: "Set password and sign in" }).click();
  await expect(invited).toHaveURL(/\/cases$/);
  await expect(invited.getByRole("navigation", { name: "Main" })).toBeVisible();

  // The link works once; the owner's list no longer shows it; the person is one of the shop's people.
  await invited.goto(await invitationLinkFor(address));
  await expect(invited.getByRole("heading", { name: "This link no longer works" })).toBeVisible();
  await phone.close();
  await page.reload();
  await expect(page.getByRole("region", { name: "The shop's people" })).toContainText(address);
  // Other specs may leave invitations of their own open; this address must not be among them.
  // Other specs may leave invitations of their own open: this address shows once, as one of the people.
  await expect(page.getByText(address)).toHaveCount(1);
});
