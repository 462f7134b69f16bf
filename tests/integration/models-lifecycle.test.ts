import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize, getSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import "./helpers";

afterAll(() => closeSequelize());

describe("getModels", () => {
  it("returns the same models while the connection lives", () => {
    expect(getModels()).toBe(getModels());
    expect(getModels().sequelize).toBe(getSequelize());
  });

  it("binds the models to a fresh connection after closeSequelize()", async () => {
    const first = getModels();
    expect(await first.Shop.count()).toBeGreaterThan(0);
    await closeSequelize();
    const second = getModels();
    expect(second.sequelize).not.toBe(first.sequelize);
    expect(await second.Shop.count()).toBeGreaterThan(0);
    const withTechnician = await second.Case.findOne({ include: [{ model: second.User, as: "technician" }] });
    expect(withTechnician?.get("technician")).toBeTruthy();
  });
});
