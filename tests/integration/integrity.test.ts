import { ForeignKeyConstraintError, UniqueConstraintError } from "sequelize";
import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { createShopWithCase } from "./fixtures";
import "./helpers";

afterAll(() => closeSequelize());

describe("foreign keys and cascades", () => {
  it("refuses a reading set for a case that does not exist", async () => {
    const models = getModels();
    const { shop } = await createShopWithCase(models);
    await expect(
      models.ReadingSet.create({ shopId: shop.id, caseId: 2_000_000_000, kind: "static" }),
    ).rejects.toBeInstanceOf(ForeignKeyConstraintError);
  });

  it("deletes a case's reading sets and sign-offs with it, and keeps its audit trail", async () => {
    const models = getModels();
    const { shop, serviceCase, technician } = await createShopWithCase(models);
    const reviewer = await models.User.create({
      id: `${technician.id.slice(0, 12)}-rev`,
      shopId: shop.id,
      email: `rev-${technician.email}`,
      name: "Fixture Reviewer",
      passwordHash: "x",
      role: "senior",
    });
    await models.ReadingSet.create({
      shopId: shop.id,
      caseId: serviceCase.id,
      kind: "static",
      staticKpaGauge: 560,
    });
    await models.ReadingSet.create({
      shopId: shop.id,
      caseId: serviceCase.id,
      kind: "running",
      highKpaGauge: 1400,
    });
    await models.SignOff.create({
      shopId: shop.id,
      caseId: serviceCase.id,
      reviewerId: reviewer.id,
      verdict: "sent_back",
    });
    await models.AuditEvent.create({
      shopId: shop.id,
      actorId: technician.id,
      entity: "case",
      entityId: String(serviceCase.id),
      action: "created",
    });

    expect(await models.ReadingSet.count({ where: { caseId: serviceCase.id } })).toBe(2);
    await serviceCase.destroy();
    expect(await models.ReadingSet.count({ where: { caseId: serviceCase.id } })).toBe(0);
    expect(await models.SignOff.count({ where: { caseId: serviceCase.id } })).toBe(0);
    expect(
      await models.AuditEvent.count({ where: { shopId: shop.id, entityId: String(serviceCase.id) } }),
    ).toBe(1);
  });

  it("refuses to delete a customer who still has vehicles, or a shop that has data", async () => {
    const models = getModels();
    const { shop, customer } = await createShopWithCase(models);
    await expect(customer.destroy()).rejects.toBeInstanceOf(ForeignKeyConstraintError);
    await expect(shop.destroy()).rejects.toBeInstanceOf(ForeignKeyConstraintError);
  });
});

describe("one shop never points at another shop's rows", () => {
  it("refuses a case in shop B on shop A's vehicle, customer or technician", async () => {
    const models = getModels();
    const a = await createShopWithCase(models);
    const b = await createShopWithCase(models);
    const base = {
      shopId: b.shop.id,
      customerId: b.customer.id,
      vehicleId: b.vehicle.id,
      technicianId: b.technician.id,
      complaint: "x",
    };
    await expect(models.Case.create(base)).resolves.toBeDefined();
    await expect(models.Case.create({ ...base, vehicleId: a.vehicle.id })).rejects.toBeInstanceOf(
      ForeignKeyConstraintError,
    );
    await expect(models.Case.create({ ...base, customerId: a.customer.id })).rejects.toBeInstanceOf(
      ForeignKeyConstraintError,
    );
    await expect(models.Case.create({ ...base, technicianId: a.technician.id })).rejects.toBeInstanceOf(
      ForeignKeyConstraintError,
    );
  });

  it("refuses a reading set or sign-off in shop B on shop A's case", async () => {
    const models = getModels();
    const a = await createShopWithCase(models);
    const b = await createShopWithCase(models);
    await expect(
      models.ReadingSet.create({ shopId: b.shop.id, caseId: a.serviceCase.id, kind: "static" }),
    ).rejects.toBeInstanceOf(ForeignKeyConstraintError);
    await expect(
      models.SignOff.create({
        shopId: b.shop.id,
        caseId: a.serviceCase.id,
        reviewerId: b.technician.id,
        verdict: "signed_off",
      }),
    ).rejects.toBeInstanceOf(ForeignKeyConstraintError);
    await expect(
      models.SignOff.create({
        shopId: a.shop.id,
        caseId: a.serviceCase.id,
        reviewerId: b.technician.id,
        verdict: "signed_off",
      }),
    ).rejects.toBeInstanceOf(ForeignKeyConstraintError);
  });

  it("refuses a vehicle in shop B for shop A's customer", async () => {
    const models = getModels();
    const a = await createShopWithCase(models);
    const b = await createShopWithCase(models);
    await expect(
      models.Vehicle.create({
        shopId: b.shop.id,
        customerId: a.customer.id,
        year: 2012,
        make: "Nissan",
        model: "Leaf",
        refrigerant: "R-134a",
        expansionDevice: "txv",
        electricCompressor: true,
      }),
    ).rejects.toBeInstanceOf(ForeignKeyConstraintError);
  });
});

describe("column rules the database enforces", () => {
  it("stores e-mail lower-cased, refuses upper case written around the model, and keeps it unique", async () => {
    const models = getModels();
    const { shop, technician } = await createShopWithCase(models);
    const user = await models.User.create({
      id: `${technician.id.slice(0, 12)}-case`,
      shopId: shop.id,
      email: `  Mixed.Case-${technician.id}@Fixture.TEST `,
      name: "Mixed Case",
      passwordHash: "x",
      role: "apprentice",
    });
    expect(user.email).toBe(`mixed.case-${technician.id}@fixture.test`);
    await expect(
      models.sequelize.query("UPDATE `user` SET email = UPPER(email) WHERE id = ?", {
        replacements: [user.id],
      }),
    ).rejects.toThrow(/CONSTRAINT .*user_email_lower_case/);
    await expect(
      models.User.create({
        id: `${technician.id.slice(0, 12)}-dup`,
        shopId: shop.id,
        email: user.email,
        name: "Dup",
        passwordHash: "x",
        role: "apprentice",
      }),
    ).rejects.toBeInstanceOf(UniqueConstraintError);
  });

  it("refuses answers that are not JSON and statuses outside the list", async () => {
    const models = getModels();
    const { serviceCase } = await createShopWithCase(models);
    await expect(
      models.sequelize.query("UPDATE service_case SET answers = 'not json {' WHERE id = ?", {
        replacements: [serviceCase.id],
      }),
    ).rejects.toThrow(/CONSTRAINT/);
    await expect(
      models.sequelize.query("UPDATE service_case SET status = 'finished' WHERE id = ?", {
        replacements: [serviceCase.id],
      }),
    ).rejects.toThrow(/Data truncated|status/);
    const reloaded = await models.Case.findByPk(serviceCase.id);
    expect(reloaded?.status).toBe("draft");
    expect(reloaded?.answers).toEqual({});
  });
});

describe("indexes", () => {
  // Sign-in looks a user up by e-mail before the shop is known; the audit actor key exists for its foreign key.
  const notShopScoped = new Set(["user.PRIMARY", "user.user_email_unique", "audit_event.actor_id"]);
  const shopTables = [
    "user",
    "customer",
    "vehicle",
    "service_case",
    "reading_set",
    "sign_off",
    "audit_event",
  ];

  it("lead with shop_id on every shop-scoped table", async () => {
    const [rows] = await getModels().sequelize.query(
      `SELECT table_name AS tableName, index_name AS indexName, column_name AS firstColumn, index_type AS indexType
         FROM information_schema.statistics
        WHERE table_schema = DATABASE() AND seq_in_index = 1 AND index_name <> 'PRIMARY'`,
    );
    const scoped = (
      rows as { tableName: string; indexName: string; firstColumn: string; indexType: string }[]
    ).filter(
      (r) =>
        shopTables.includes(r.tableName) &&
        r.indexType !== "FULLTEXT" &&
        !notShopScoped.has(`${r.tableName}.${r.indexName}`),
    );
    expect(scoped.length).toBeGreaterThanOrEqual(shopTables.length * 2);
    for (const index of scoped)
      expect(index.firstColumn, `${index.tableName}.${index.indexName}`).toBe("shop_id");
  });
});
