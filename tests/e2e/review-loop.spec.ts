import { expect, test, type Page } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { signedInClient } from "./pages/api-client";
import { readCase } from "./pages/db";
import { DEMO_USERS, SignInPage } from "./pages/sign-in-page";

// The review loop on a phone: an apprentice submits, a senior sends the case back with a comment,
// the apprentice reads it where they work and resubmits, and a senior signs it off.
test.describe.configure({ timeout: 240_000 });

async function expectAccessible(page: Page, where: string) {
  const results = await new AxeBuilder({ page })
    .include("main")
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  expect(results.violations.map((v) => `${where}: ${v.id} (${v.nodes.length})`)).toEqual([]);
}

async function as(page: Page, role: "apprentice" | "senior") {
  await page.context().clearCookies();
  await new SignInPage(page).signInAs(role);
}

test("apprentice submits, senior sends back with a comment, the apprentice sees it in the interview and resubmits, and a senior signs off", async ({
  page,
}) => {
  // The apprentice's own invented customer and vehicle, with the interview filled in up to the findings.
  const api = await signedInClient(DEMO_USERS.apprentice.email);
  const created = await api.post("/api/cases", {
    data: {
      newCustomer: { name: "Teodora Halvorsen-Achebe" },
      newVehicle: { year: 2015, make: "Mazda", model: "CX-3", refrigerant: "R-134a", expansionDevice: "txv" },
      complaint: "Cold at first, then warm after twenty minutes on the highway.",
    },
  });
  expect(created.status()).toBe(201);
  const caseId: number = (await created.json()).case.id;
  const { case: detail } = await (await api.get(`/api/cases/${caseId}`)).json();
  const saved = await api.put(`/api/cases/${caseId}/interview`, {
    data: {
      baseVersion: detail.version,
      step: "findings",
      answers: {
        ...detail.answers.answers,
        system: { ...detail.answers.answers.system, labelChargeG: 500 },
        conditions: { ambientC: 32, relativeHumidityPct: 45, engineRpm: 1500 },
        running: { highKpaGauge: 2350, lowKpaGauge: 340 },
      },
    },
  });
  expect(saved.status()).toBe(200);
  await api.dispose();

  // 1. The apprentice arrives at the findings: nothing has focus, the leader is in the first screen.
  await as(page, "apprentice");
  await page.goto(`/cases/${caseId}/interview`);
  await expect(page.getByRole("heading", { level: 1, name: "Findings" })).toBeVisible();
  const leader = page.getByRole("region", { name: "Likely causes" }).getByRole("article").first();
  await expect(leader).toBeVisible();
  const focused = await page.evaluate(() => document.activeElement?.tagName ?? "");
  expect(["INPUT", "TEXTAREA", "SELECT"]).not.toContain(focused);
  expect((await leader.boundingBox())!.y).toBeLessThan(844);
  // A bare conclusion is refused on the phone before anything is sent.
  await page.getByRole("button", { name: "Send to a senior for sign-off" }).click();
  await expect(page.getByText(/Pick at least one reason/)).toBeVisible();
  await page.getByRole("button", { name: "The pressures point to it" }).click();
  await page.getByRole("button", { name: "Send to a senior for sign-off" }).click();
  await expect(page).toHaveURL(new RegExp(`/cases/${caseId}$`));
  const firstCause = (await readCase(caseId)).conclusion_cause;
  expect((await readCase(caseId)).status).toBe("awaiting_signoff");

  // 2. The senior's queue says how many wait and for how long; the senior sends the case back.
  await as(page, "senior");
  await expect(page.getByTestId("work-counts")).toContainText("Waiting for my sign-off");
  await page.goto("/signoff");
  await expect(page.getByTestId("queue-summary")).toContainText(/cases? waits?/);
  await expect(page.getByRole("link", { name: new RegExp(`Case ${caseId}`) })).toContainText("waiting");
  await expectAccessible(page, "sign-off queue");
  await page.screenshot({ path: test.info().outputPath("sign-off-queue-phone.png"), fullPage: true });
  await page.getByRole("link", { name: new RegExp(`Case ${caseId}`) }).click();
  const form = page.getByRole("form", { name: "Your sign-off" });
  await form
    .getByLabel("Comment for the apprentice")
    .pressSequentially("Weigh the charge before calling it.");
  await form.getByRole("button", { name: "Send back" }).click();
  await expect(page.getByText("Weigh the charge before calling it.")).toBeVisible();

  // 3. The apprentice sees it counted at home, then on top of the interview, with the earlier conclusion kept.
  await as(page, "apprentice");
  await expect(page.getByTestId("work-counts")).toContainText("Sent back to me");
  await page.goto(`/cases/${caseId}/interview`);
  await expect(page.getByTestId("sent-back-note")).toContainText("Weigh the charge before calling it.");
  await expect(page.getByLabel("The cause you conclude")).toHaveValue(firstCause!);
  await expect(page.getByTestId("review-thread")).toContainText("Sent back by");
  await expectAccessible(page, "sent-back findings");
  await page.screenshot({ path: test.info().outputPath("sent-back-findings-phone.png"), fullPage: true });
  await page.getByRole("button", { name: "The recovered charge against the label" }).click();
  await page.getByRole("button", { name: "Send to a senior for sign-off" }).click();
  await expect(page).toHaveURL(new RegExp(`/cases/${caseId}$`));
  expect((await readCase(caseId)).status).toBe("awaiting_signoff");

  // 4. A senior signs it off.
  await as(page, "senior");
  await page.goto(`/cases/${caseId}`);
  await page.getByRole("form", { name: "Your sign-off" }).getByRole("button", { name: "Sign off" }).click();
  await expect.poll(async () => (await readCase(caseId)).status).toBe("signed_off");
});
