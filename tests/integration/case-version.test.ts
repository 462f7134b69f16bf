import { OptimisticLockError } from "sequelize";
import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { updateCaseAtVersion } from "@/lib/db/versioned-update";
import { getModels } from "@/models";
import { createShopWithCase } from "./fixtures";
import "./helpers";

afterAll(() => closeSequelize());

describe("case version (optimistic concurrency)", () => {
  it("starts at 1 and goes up by one on every save of the model", async () => {
    const { serviceCase } = await createShopWithCase(getModels());
    expect(serviceCase.version).toBe(1);
    serviceCase.interviewStep = "static_check";
    await serviceCase.save();
    serviceCase.answers = { staticTaken: true };
    await serviceCase.save();
    const stored = await getModels().Case.findByPk(serviceCase.id);
    expect(stored?.version).toBe(3);
    expect(stored?.answers).toEqual({ staticTaken: true });
  });

  it("refuses to save a stale copy and keeps the newer write", async () => {
    const models = getModels();
    const { serviceCase } = await createShopWithCase(models);
    const phone = await models.Case.findByPk(serviceCase.id);
    const tablet = await models.Case.findByPk(serviceCase.id);
    if (!phone || !tablet) throw new Error("fixture case missing");
    phone.answers = { from: "phone" };
    await phone.save();
    tablet.answers = { from: "tablet" };
    await expect(tablet.save()).rejects.toBeInstanceOf(OptimisticLockError);
    expect((await models.Case.findByPk(serviceCase.id))?.answers).toEqual({ from: "phone" });
  });

  it("updateCaseAtVersion applies only at the expected version, in the case's own shop", async () => {
    const models = getModels();
    const { shop, serviceCase } = await createShopWithCase(models);
    const other = await createShopWithCase(models);

    const v2 = await updateCaseAtVersion({
      shopId: shop.id,
      caseId: serviceCase.id,
      expectedVersion: 1,
      changes: { interviewStep: "conditions" },
    });
    expect(v2).toBe(2);
    const stale = await updateCaseAtVersion({
      shopId: shop.id,
      caseId: serviceCase.id,
      expectedVersion: 1,
      changes: { interviewStep: "complaint" },
    });
    expect(stale).toBeNull();
    const wrongShop = await updateCaseAtVersion({
      shopId: other.shop.id,
      caseId: serviceCase.id,
      expectedVersion: 2,
      changes: { complaint: "hijacked" },
    });
    expect(wrongShop).toBeNull();

    const stored = await models.Case.findByPk(serviceCase.id);
    expect(stored?.version).toBe(2);
    expect(stored?.interviewStep).toBe("conditions");
    expect(stored?.complaint).toBe(serviceCase.complaint);
  });
});

describe("concurrent writers", () => {
  it("lets exactly one of several simultaneous writes at the same version through", async () => {
    const models = getModels();
    const { shop, serviceCase } = await createShopWithCase(models);
    const devices = ["phone", "tablet", "bench", "office", "spare"];
    const results = await Promise.all(
      devices.map((device) =>
        updateCaseAtVersion({
          shopId: shop.id,
          caseId: serviceCase.id,
          expectedVersion: 1,
          changes: { answers: { from: device } },
        }),
      ),
    );
    expect(results.filter((v) => v === 2)).toHaveLength(1);
    expect(results.filter((v) => v === null)).toHaveLength(devices.length - 1);
    const winner = devices[results.indexOf(2)];
    const stored = await models.Case.findByPk(serviceCase.id);
    expect(stored?.version).toBe(2);
    expect(stored?.answers).toEqual({ from: winner });
  });
});

describe("append-only tables", () => {
  it("refuses edits to sign-offs and audit events through the models", async () => {
    const models = getModels();
    const { shop, serviceCase, technician } = await createShopWithCase(models);
    const verdict = await models.SignOff.create({
      shopId: shop.id,
      caseId: serviceCase.id,
      reviewerId: technician.id,
      verdict: "sent_back",
      comment: "Check the fan",
    });
    verdict.comment = "rewritten";
    await expect(verdict.save()).rejects.toThrow(/append-only/);
    await expect(
      models.SignOff.update({ comment: "rewritten" }, { where: { id: verdict.id } }),
    ).rejects.toThrow(/append-only/);
    const event = await models.AuditEvent.create({
      shopId: shop.id,
      actorId: technician.id,
      entity: "case",
      entityId: String(serviceCase.id),
      action: "sent_back",
    });
    await expect(
      models.AuditEvent.update({ action: "signed_off" }, { where: { id: event.id } }),
    ).rejects.toThrow(/append-only/);
    expect((await models.SignOff.findByPk(verdict.id))?.comment).toBe("Check the fan");
  });
});
