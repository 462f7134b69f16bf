import { describe, expect, it } from "vitest";
import { interviewAnswersSchema, stepIds } from "@/lib/interview";
import { demoCases } from "./cases";
import { demoCustomers, demoShops } from "./people";
import { newUserId } from "./seed-demo";
import { demoVehicles } from "./vehicles";
import { CONFIRMED_CAUSE_IDS } from "@/lib/contracts/casebook";
import { REPAIR_IDS } from "@/lib/repairs/catalog";

// The demo must hang together: the seed refuses bad references at run time, these catch them before.

describe("demo data", () => {
  it("points every vehicle at a customer, and every case at a vehicle and a user of the same shop", () => {
    for (const v of demoVehicles)
      expect(
        demoCustomers.some((c) => c.key === v.customerKey),
        v.key,
      ).toBe(true);
    for (const c of demoCases) {
      const vehicle = demoVehicles.find((v) => v.key === c.vehicleKey);
      const customer = demoCustomers.find((x) => x.key === vehicle?.customerKey);
      const shop = demoShops.find((s) => s.key === c.shopKey);
      expect(customer?.shopKey, c.key).toBe(c.shopKey);
      expect(
        shop?.users.some((u) => u.key === c.technicianKey),
        c.key,
      ).toBe(true);
      for (const s of c.signOffs) {
        const reviewer = shop?.users.find((u) => u.key === s.reviewerKey);
        expect(["senior", "owner"], c.key).toContain(reviewer?.role);
      }
    }
  });

  it("answers each case's system questions as its vehicle is recorded", () => {
    for (const c of demoCases) {
      const vehicle = demoVehicles.find((v) => v.key === c.vehicleKey);
      expect(c.answers.system, c.key).toMatchObject({
        refrigerant: vehicle?.refrigerant,
        expansionDevice: vehicle?.expansionDevice,
        compressorType: vehicle?.compressorType,
        labelChargeG: vehicle?.labelChargeG,
      });
    }
  });

  it("keeps answers valid for the interview and readings in step with them", () => {
    for (const c of demoCases) {
      expect(interviewAnswersSchema.safeParse(c.answers).success, c.key).toBe(true);
      expect(stepIds, c.key).toContain(c.interviewStep);
      const staticSet = c.readingSets.find((r) => r.kind === "static");
      expect(staticSet?.staticKpaGauge, c.key).toBe(c.answers.static?.staticKpaGauge);
      const firstRunning = c.readingSets.find((r) => r.kind === "running");
      if (c.answers.running) expect(firstRunning, c.key).toMatchObject(c.answers.running);
      expect(c.diagnosed, c.key).toBe(c.interviewStep === "findings");
      expect(c.status === "draft", c.key).toBe(c.submittedMinutesIn === null);
      expect(c.status === "closed", c.key).toBe(c.closedMinutesIn !== undefined);
    }
  });

  it("closes every closed case with confirmed causes and repairs from the lists, and no other", () => {
    for (const c of demoCases) {
      expect(c.outcome !== undefined, c.key).toBe(c.status === "closed");
      for (const cause of c.outcome?.causes ?? []) expect(CONFIRMED_CAUSE_IDS, c.key).toContain(cause);
      for (const repair of c.outcome?.repairIds ?? []) expect(REPAIR_IDS, c.key).toContain(repair);
    }
  });

  it("has a case from an apprentice waiting for sign-off", () => {
    const waiting = demoCases.filter((c) => c.status === "awaiting_signoff");
    const apprentices = demoShops.flatMap((s) =>
      s.users.filter((u) => u.role === "apprentice").map((u) => `${s.key}/${u.key}`),
    );
    expect(waiting.some((c) => apprentices.includes(`${c.shopKey}/${c.technicianKey}`))).toBe(true);
  });

  it("makes user ids in Lucia's shape: 16 lower-case base32 characters, different each time", () => {
    const ids = Array.from({ length: 200 }, newUserId);
    for (const id of ids) expect(id).toMatch(/^[a-z2-7]{16}$/);
    expect(new Set(ids).size).toBe(ids.length);
  });
});
