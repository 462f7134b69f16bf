import { afterAll, afterEach, describe, expect, it, vi } from "vitest";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { exampleAnswers } from "@/lib/interview/example-answers";
import { createCase, submitCase } from "@/lib/server/cases";
import { getModels } from "@/models";
import { createShopWithCylinders } from "./service-fixtures";
import "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});
afterEach(() => vi.restoreAllMocks());

describe("case changes and their audit rows", () => {
  it("open no case when its audit row cannot be written (failed before: audited after the commit)", async () => {
    const models = getModels();
    const { shop, vehicle, technician } = await createShopWithCylinders(getModels());
    const before = await models.Case.count({ where: { shopId: shop.id } });
    vi.spyOn(models.AuditEvent, "create").mockRejectedValueOnce(new Error("audit trail unavailable"));
    await expect(
      createCase({
        shopId: shop.id,
        technicianId: technician.id,
        input: { vehicleId: vehicle.id, complaint: "Cold at idle, warm on the highway" },
      }),
    ).rejects.toThrow("audit trail unavailable");
    expect(await models.Case.count({ where: { shopId: shop.id } })).toBe(before);
  });

  it("leave a case unsubmitted when the submission's audit row cannot be written (failed before: audited after it)", async () => {
    const models = getModels();
    const { serviceCase, user } = await createShopWithCylinders(getModels());
    await serviceCase.update({
      interviewStep: "findings",
      answers: { answers: exampleAnswers, drafts: {}, skipped: [], visited: [] },
    });
    const stored = await models.Case.findByPk(serviceCase.id, { raw: true });
    vi.spyOn(models.AuditEvent, "create").mockRejectedValueOnce(new Error("audit trail unavailable"));
    await expect(
      submitCase({
        user,
        caseId: serviceCase.id,
        input: {
          baseVersion: stored!.version,
          conclusionCause: "overcharge",
          conclusionNotes: "High side well above the band for the ambient.",
          engineVersion: "any",
        },
      }),
    ).rejects.toThrow("audit trail unavailable");
    const after = await models.Case.findByPk(serviceCase.id, { raw: true });
    expect(after).toMatchObject({ status: "draft", version: stored!.version, conclusionCause: null });
  });
});
