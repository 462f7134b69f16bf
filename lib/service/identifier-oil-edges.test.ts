import { describe, expect, it } from "vitest";
import { identifierCheck } from "./identifier";
import { oilFamily, oilSuitsCompressor } from "./oil-type";
import { SERVICE_SOURCES } from "./sources";

// The edges of the identifier's verdict (SAE J2099 / SAE J2912: 98 % purity) and of the oil check:
// the ends of each accepted range, each sentence, and each warning as the record stores it.
describe("identifierCheck: the ends of its ranges and its sentences", () => {
  it("takes purity and air from 0 to 100 % and refuses the rest by name", () => {
    expect(identifierCheck({ purityPct: 0 }).pass).toBe(false);
    expect(identifierCheck({ purityPct: 100, airPct: 0 }).pass).toBe(true);
    expect(identifierCheck({ purityPct: 100, airPct: 100 }).pass).toBe(true);
    for (const bad of [-0.1, 100.1, Number.NaN])
      expect(() => identifierCheck({ purityPct: bad }), String(bad)).toThrow(
        `purity must be 0–100 %, got ${bad}`,
      );
    for (const bad of [100.5, Number.NaN])
      expect(() => identifierCheck({ purityPct: 99, airPct: bad }), String(bad)).toThrow(
        `air must be 0–100 %, got ${bad}`,
      );
  });

  it("says a pass with the air when it was read, and names the standards", () => {
    expect(identifierCheck({ purityPct: 99.5 }).message).toBe(
      "Purity 99.5 %: pure enough to recover into the shop's machine.",
    );
    expect(identifierCheck({ purityPct: 99.5, airPct: 0.4 }).message).toBe(
      "Purity 99.5 % (air 0.4 %): pure enough to recover into the shop's machine.",
    );
    expect(identifierCheck({ purityPct: 99.5 }).source).toBe("SAE J2099 and SAE J2912: 98 % purity");
  });
});

describe("oil: families and warnings as the record keeps them", () => {
  it("reads PAO by its abbreviation or its name, not inside another word", () => {
    expect(oilFamily("PAO 68")).toBe("PAO");
    expect(oilFamily("pao")).toBe("PAO");
    expect(oilFamily("Polyalphaolefin")).toBe("PAO");
    expect(oilFamily("paolo's oil")).toBe("unknown");
  });

  it("stores each electric-compressor warning with its level, words and source", () => {
    const pag = oilSuitsCompressor({ compressorDrive: "electric", oilAdded: "PAG 46" }).warnings[0];
    expect(pag).toMatchObject({
      id: "pag_in_electric",
      level: "danger",
      source: SERVICE_SOURCES.dielectricOil,
    });
    expect(pag?.text).toMatch(
      /^PAG oil in a high-voltage electric compressor .* leave the compressor case live\./,
    );
    expect(oilSuitsCompressor({ compressorDrive: "electric", oilAdded: "ND-11" }).warnings).toEqual([
      {
        id: "unconfirmed_dielectric",
        level: "warning",
        text: "Confirm this is the dielectric oil the maker specifies for the electric compressor before adding it.",
        source: SERVICE_SOURCES.dielectricOil,
      },
    ]);
  });

  it("compares with the spec only when the spec names a known family", () => {
    const added = (specOilType: string) =>
      oilSuitsCompressor({ compressorDrive: "belt", oilAdded: "PAG 46", specOilType });
    expect(added("see service manual").warnings).toEqual([]);
    expect(added("POE 80")).toEqual({
      suits: false,
      warnings: [
        {
          id: "differs_from_spec",
          level: "warning",
          text: "The oil added (PAG 46) is not the kind the spec calls for (POE 80).",
          source: "vehicle spec",
        },
      ],
    });
  });

  it("warns of mineral oil with an HFC or HFO refrigerant only", () => {
    const mineral = (refrigerant?: "R-134a" | "R-1234yf" | "R-12") =>
      oilSuitsCompressor({ compressorDrive: "belt", oilAdded: "mineral 525", refrigerant }).warnings;
    expect(mineral("R-134a")).toEqual([
      {
        id: "mineral_with_hfc",
        level: "warning",
        text: "Mineral oil does not mix with R-134a and will not return to the compressor.",
        source: "from memory — refrigerant/oil miscibility",
      },
    ]);
    expect(mineral("R-1234yf").map((w) => w.id)).toEqual(["mineral_with_hfc"]);
    expect(mineral("R-12")).toEqual([]);
    expect(mineral(undefined)).toEqual([]);
    expect(
      oilSuitsCompressor({ compressorDrive: "belt", oilAdded: "PAG 46", refrigerant: "R-134a" }).warnings,
    ).toEqual([]);
  });
});
