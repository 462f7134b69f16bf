import { describe, expect, it } from "vitest";
import { REFRIGERANT_IDS, refrigerantCautions, refrigerantInfo } from "./index";

describe("safety cautions", () => {
  it("every refrigerant carries eye protection, no venting, pressure, and deferral to local codes and the manufacturer", () => {
    for (const id of REFRIGERANT_IDS) {
      const ids = refrigerantCautions(id).map((c) => c.id);
      expect(ids).toEqual(expect.arrayContaining(["eyes_skin", "no_venting", "pressure", "defer"]));
      expect(new Set(ids).size).toBe(ids.length);
    }
  });

  it("a flammable refrigerant leads with its flammability warning (ASHRAE 34 A2L)", () => {
    for (const id of REFRIGERANT_IDS) {
      const first = refrigerantCautions(id)[0]!;
      if (refrigerantInfo(id).flammable) {
        expect(first.id).toBe("flammable");
        expect(first.text).toMatch(new RegExp(refrigerantInfo(id).safetyClass));
      } else {
        expect(refrigerantCautions(id).some((c) => c.id === "flammable")).toBe(false);
      }
    }
  });

  it("R-744 warns of its pressure and of suffocation in low spaces", () => {
    expect(refrigerantCautions("R-744").map((c) => c.id)).toEqual(
      expect.arrayContaining(["very_high_pressure", "asphyxiation"]),
    );
  });
});
