import { describe, expect, it } from "vitest";
import { sayInUnits } from "@/lib/units/quantity";
import { unitsOfSystem } from "@/lib/units/reader";
import { createCylinderSchema } from "./cylinders";

const cylinder = {
  label: "REC-9",
  refrigerant: "R-134a",
  kind: "recovery",
  tareG: 7_250,
  capacityG: 22_680,
  initialNetG: 0,
};

function tareMessage(tareG: number): string {
  const result = createCylinderSchema.safeParse({ ...cylinder, tareG });
  expect(result.success).toBe(false);
  return result.error!.flatten().fieldErrors.tareG![0]!;
}

describe("createCylinderSchema's limits are said in the reader's unit", () => {
  it("says the smallest tare in grams or pounds (NIST SP 811: 1 lb = 453.59237 g)", () => {
    const message = tareMessage(400);
    expect(message).not.toMatch(/\d g\b/);
    expect(sayInUnits(message)).toBe("A tare under 500 g is not a refrigerant cylinder.");
    // 500 g = 1.10 lb.
    expect(sayInUnits(message, { ...unitsOfSystem("imperial"), mass: "lb" })).toBe(
      "A tare under 1.10 lb is not a refrigerant cylinder.",
    );
  });

  it("says the largest tare with its thousands separator (common practice)", () => {
    expect(sayInUnits(tareMessage(70_000))).toBe(
      "A tare over 60,000 g is not a refrigerant cylinder: check the unit.",
    );
  });
});
