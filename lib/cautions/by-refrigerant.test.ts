import { describe, expect, it } from "vitest";
import { REFRIGERANT_IDS, refrigerantInfo } from "@/lib/refrigerants";
import { refrigerantCautions } from "./by-refrigerant";

describe("safety cautions", () => {
  it("every refrigerant carries eye protection, pressure, and deferral to local codes and the manufacturer; all but R-744 the venting ban (40 CFR 82.154(a))", () => {
    for (const id of REFRIGERANT_IDS) {
      const ids = refrigerantCautions(id).map((c) => c.id);
      expect(ids).toEqual(expect.arrayContaining(["eye_and_skin", "system_pressure", "defer_to_procedure"]));
      // The catalogues used to disagree here; one rule now: an R-744 charge is released by the maker's procedure.
      if (id === "R-744") expect(ids).not.toContain("never_vent");
      else expect(ids).toContain("never_vent");
      expect(new Set(ids).size).toBe(ids.length);
    }
  });

  it("a flammable refrigerant leads with its flammability warning (ASHRAE 34 A2L)", () => {
    for (const id of REFRIGERANT_IDS) {
      const first = refrigerantCautions(id)[0]!;
      if (refrigerantInfo(id).flammable) {
        expect(first.id).toBe("flammable_r1234yf");
        expect(first.text).toMatch(new RegExp(refrigerantInfo(id).safetyClass));
      } else {
        expect(refrigerantCautions(id).some((c) => c.id === "flammable_r1234yf")).toBe(false);
      }
    }
  });

  it("R-744 warns of its pressure and of suffocation in low spaces", () => {
    expect(refrigerantCautions("R-744").map((c) => c.id)).toEqual(
      expect.arrayContaining(["r744_pressure", "co2_asphyxiation"]),
    );
  });
});
