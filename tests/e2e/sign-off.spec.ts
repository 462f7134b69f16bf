import { expect, test, type APIRequestContext } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { signedInClient } from "./pages/api-client";
import { readCase } from "./pages/db";
import { DEMO_USERS, SignInPage } from "./pages/sign-in-page";

/** An apprentice's case of our own, submitted through the API so it waits for a senior. */
async function apprenticeCaseWaitingForSignOff(apprentice: APIRequestContext): Promise<number> {
  // A customer and vehicle of its own, so no other spec finds this case by its vehicle.
  const created = await apprentice.post("/api/cases", {
    data: {
      newCustomer: { name: "Imogen Vasquez-Thorne" },
      newVehicle: {
        year: 2016,
        make: "Subaru",
        model: "Outback",
        refrigerant: "R-134a",
        expansionDevice: "txv",
      },
      complaint: "Blows cool at idle, warm once the car is moving.",
    },
  });
  expect(created.status()).toBe(201);
  const caseId: number = (await created.json()).case.id;
  const { case: detail } = await (await apprentice.get(`/api/cases/${caseId}`)).json();
  const saved = await apprentice.put(`/api/cases/${caseId}/interview`, {
    data: {
      baseVersion: detail.version,
      step: "findings",
      answers: {
        ...detail.answers.answers,
        conditions: { ambientC: 30, relativeHumidityPct: 50, engineRpm: 1500 },
      },
    },
  });
  expect(saved.status()).toBe(200);
  const submitted = await apprentice.post(`/api/cases/${caseId}/submit`, {
    data: {
      baseVersion: (await saved.json()).version,
      engineVersion: "e2e",
      conclusionCause: "condenser_airflow",
      conclusionNotes:
        "Cool at idle and warm when moving sounds backwards for airflow; checking the fan anyway.",
    },
  });
  expect(submitted.status()).toBe(200);
  expect((await submitted.json()).status).toBe("awaiting_signoff");
  return caseId;
}

test("a senior sends an apprentice's case back with a comment: the form asks for one first and keeps it", async ({
  page,
}, testInfo) => {
  const apprentice = await signedInClient(DEMO_USERS.apprentice.email);
  const caseId = await apprenticeCaseWaitingForSignOff(apprentice);
  await apprentice.dispose();

  await new SignInPage(page).signInAs("senior");
  await page.goto(`/cases/${caseId}`);
  const form = page.getByRole("form", { name: "Your sign-off" });
  await expect(form).toBeVisible();
  const axe = await new AxeBuilder({ page })
    .include("main")
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  expect(axe.violations.map((v) => `${v.id} (${v.nodes.length})`)).toEqual([]);

  // Sending back without a word is refused on the phone, before anything is sent.
  await form.getByRole("button", { name: "Send back" }).click();
  const comment = form.getByLabel("Comment for the apprentice");
  await expect(form.getByText("Say what to look at again when you send a case back.")).toBeVisible();
  await expect(comment).toHaveAttribute("aria-invalid", "true");
  expect((await readCase(caseId)).status).toBe("awaiting_signoff");
  await page.screenshot({ path: testInfo.outputPath("sign-off-refused-phone.png") });

  await comment.pressSequentially("Check the fan at idle before blaming the condenser.");
  await form.getByRole("button", { name: "Send back" }).click();
  await expect(page.getByText("Sent back by")).toBeVisible();
  await expect(page.getByText("Check the fan at idle before blaming the condenser.")).toBeVisible();
  await expect(form).toHaveCount(0);
  expect((await readCase(caseId)).status).toBe("sent_back");
});

test("nobody is offered the sign-off of their own case, and a technician none at all", async ({ page }) => {
  const apprentice = await signedInClient(DEMO_USERS.apprentice.email);
  const caseId = await apprenticeCaseWaitingForSignOff(apprentice);
  await apprentice.dispose();

  for (const role of ["apprentice", "technician"] as const) {
    await page.context().clearCookies();
    await new SignInPage(page).signInAs(role);
    await page.goto(`/cases/${caseId}`);
    await expect(page.getByRole("heading", { name: new RegExp(`Case ${caseId}`) })).toBeVisible();
    await expect(page.getByRole("form", { name: "Your sign-off" })).toHaveCount(0);
  }
});
