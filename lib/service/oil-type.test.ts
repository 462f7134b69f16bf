import { describe, expect, it } from "vitest";
import { oilFamily, oilSuitsCompressor } from "./oil-type";

describe("oilFamily", () => {
  it.each([
    ["PAG 46", "PAG"],
    ["pag100", "PAG"],
    ["page", "unknown"],
    ["POE 80", "POE"],
    ["Polyol ester", "POE"],
    ["Mineral 525", "mineral"],
    ["", "unknown"],
  ])("%s → %s", (name, family) => {
    expect(oilFamily(name)).toBe(family);
  });
});

describe("oilSuitsCompressor", () => {
  it("flags PAG in an electric compressor as a danger (SAE J2788H; ~1 % PAG compromises insulation — both from memory)", () => {
    const r = oilSuitsCompressor({ compressorDrive: "electric", oilAdded: "PAG 46" });
    expect(r.suits).toBe(false);
    expect(r.warnings[0]?.id).toBe("pag_in_electric");
    expect(r.warnings[0]?.level).toBe("danger");
  });

  it("accepts POE in an electric compressor that calls for it", () => {
    expect(
      oilSuitsCompressor({ compressorDrive: "electric", oilAdded: "POE 80", specOilType: "POE" }),
    ).toEqual({ suits: true, warnings: [] });
  });

  it("asks to confirm an oil of unknown kind in an electric compressor", () => {
    const r = oilSuitsCompressor({ compressorDrive: "electric", oilAdded: "house blend" });
    expect(r.suits).toBe(true);
    expect(r.warnings.map((w) => w.id)).toEqual(["unconfirmed_dielectric"]);
  });

  it("flags an oil that differs from the spec on a belt-driven compressor", () => {
    const r = oilSuitsCompressor({ compressorDrive: "belt", oilAdded: "POE", specOilType: "PAG 46" });
    expect(r.suits).toBe(false);
    expect(r.warnings.map((w) => w.id)).toEqual(["differs_from_spec"]);
    expect(
      oilSuitsCompressor({ compressorDrive: "belt", oilAdded: "PAG 46", specOilType: "PAG 46" }).warnings,
    ).toEqual([]);
  });

  it("cautions against mineral oil with R-134a (from memory: not miscible)", () => {
    const r = oilSuitsCompressor({ compressorDrive: "belt", oilAdded: "mineral", refrigerant: "R-134a" });
    expect(r.warnings.map((w) => w.id)).toContain("mineral_with_hfc");
  });
});
