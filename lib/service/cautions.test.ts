import { describe, expect, it } from "vitest";
import { SERVICE_CAUTIONS, cautionsFor } from "./cautions";

const ids = (ctx: Parameters<typeof cautionsFor>[0]) => cautionsFor(ctx).map((c) => c.id);

describe("SERVICE_CAUTIONS", () => {
  it("has unique ids, a source for every caution, and ends with the local-rules line", () => {
    expect(new Set(SERVICE_CAUTIONS.map((c) => c.id)).size).toBe(SERVICE_CAUTIONS.length);
    for (const c of SERVICE_CAUTIONS) expect(c.source.length).toBeGreaterThan(5);
    expect(SERVICE_CAUTIONS.at(-1)?.id).toBe("defer_to_procedure");
  });
});

describe("cautionsFor", () => {
  it("asks for slow recovery on an orifice-tube system only (common practice; SAE J2762)", () => {
    expect(ids({ step: "recovery", refrigerant: "R-134a", expansionDevice: "orifice_tube" })).toContain(
      "recover_slowly_accumulator",
    );
    expect(ids({ step: "recovery", refrigerant: "R-134a", expansionDevice: "txv" })).not.toContain(
      "recover_slowly_accumulator",
    );
  });

  it("brings R-1234yf equipment and flammability cautions only for R-1234yf (SAE J2843 / J3030)", () => {
    expect(ids({ step: "recharge", refrigerant: "R-1234yf" })).toContain("flammable_r1234yf");
    expect(ids({ step: "recharge", refrigerant: "R-134a" })).not.toContain("flammable_r1234yf");
  });

  it("forbids venting for HFC/HFO/CFC systems (CAA §608(c)) and gives R-744 its own pressure caution", () => {
    expect(ids({ step: "recovery", refrigerant: "R-134a" })).toContain("never_vent");
    const co2 = ids({ step: "recovery", refrigerant: "R-744" });
    expect(co2).not.toContain("never_vent");
    expect(co2).toContain("r744_pressure");
  });

  it("shows high-voltage and dielectric-oil cautions only when the compressor is electric", () => {
    expect(ids({ step: "oil", electricCompressor: true })).toEqual(
      expect.arrayContaining(["high_voltage_compressor", "dielectric_oil"]),
    );
    expect(ids({ step: "oil", electricCompressor: false })).not.toContain("dielectric_oil");
    expect(ids({ step: "oil" })).not.toContain("high_voltage_compressor");
  });

  it("always includes eye and skin protection and ends with the deferral to local rules", () => {
    for (const step of ["identify", "recovery", "oil", "evacuation", "recharge"] as const) {
      const list = ids({ step, refrigerant: "R-134a" });
      expect(list).toContain("eye_and_skin");
      expect(list.at(-1)).toBe("defer_to_procedure");
    }
  });

  it("keeps the 80 % recovery-cylinder caution with recovery", () => {
    expect(ids({ step: "recovery", refrigerant: "R-134a" })).toContain("recovery_cylinder_fill");
    expect(ids({ step: "recharge", refrigerant: "R-134a" })).not.toContain("recovery_cylinder_fill");
  });
});

describe("cautionsFor while the job is not fully known", () => {
  it("keeps the refrigerant's and the device's cautions on screen until they are entered (better once too often than missed)", () => {
    const unknown = ids({ step: "recovery" });
    for (const id of ["recover_slowly_accumulator", "r744_pressure", "flammable_r1234yf"] as const)
      expect(unknown, id).toContain(id);
  });

  it("gives the R-744 pressure caution to R-744 only once the refrigerant is known", () => {
    expect(ids({ step: "recovery", refrigerant: "R-744" })).toContain("r744_pressure");
    expect(ids({ step: "recovery", refrigerant: "R-134a" })).not.toContain("r744_pressure");
    expect(ids({ step: "recovery", refrigerant: "R-1234yf" })).not.toContain("r744_pressure");
  });
});
