import { describe, expect, it } from "vitest";
import { extractEvidence } from "./evidence";
import { MESSAGE_TEMPLATES } from "./message-templates";
import { formatMessage, type ReaderUnits, renderQuantity } from "./messages";
import { READING_GRADES } from "./observations";
import { gaugeKpa, grams, kelvin, percent, tempC } from "./quantities";
import { pressureToKpa } from "@/lib/units";
import { quantityParts, SI_READER_UNITS } from "@/lib/units/quantity";
import { SYMPTOM_IDS } from "./symptoms";

const IMPERIAL: ReaderUnits = { pressure: "psi", temperature: "F", mass: "oz", volume: "floz" };

describe("quantities in the reader's units", () => {
  it("keeps the engine's own units by default: whole kPa gauge, °C and K to a tenth, whole grams", () => {
    expect(renderQuantity(gaugeKpa(1849.6))).toEqual(["1850", "kPa gauge"]);
    expect(renderQuantity(tempC(-3.25))).toEqual(["−3.3", "°C"]);
    expect(renderQuantity(kelvin(10))).toEqual(["10.0", "K"]);
    expect(renderQuantity(grams(1124.6))).toEqual(["1,125", "g"]);
    expect(renderQuantity(percent(97.5))).toEqual(["97.5", "%"]);
  });

  it("says a pressure with the same digits as the readings beside it (lib/units/quantity.ts)", () => {
    for (const pressure of ["kPa", "bar", "psi"] as const)
      for (const kpa of [190, 1150, 1849.6, 4000, 9500]) {
        const units = { ...SI_READER_UNITS, pressure };
        expect(renderQuantity(gaugeKpa(kpa), { ...IMPERIAL, pressure }), `${kpa} kPa in ${pressure}`).toEqual(
          quantityParts({ kind: "pressure_gauge", value: kpa }, units),
        );
      }
  });

  it("converts for an imperial reader: 1 psi = 6.894757 kPa, °F = °C × 1.8 + 32, a kelvin of difference is 1.8 °F, 1 oz = 28.3495 g (NIST SP 811)", () => {
    expect(renderQuantity(gaugeKpa(1379), IMPERIAL)).toEqual(["200", "psig"]);
    expect(renderQuantity(tempC(35), IMPERIAL)).toEqual(["95.0", "°F"]);
    expect(renderQuantity(kelvin(5), IMPERIAL)).toEqual(["9.0", "°F"]);
    expect(renderQuantity(grams(170), IMPERIAL)).toEqual(["6.0", "oz"]);
    expect(renderQuantity(percent(25, 0), IMPERIAL)).toEqual(["25", "%"]);
  });
});

describe("formatMessage", () => {
  it("renders a charge sentence the same way in SI as the engine always has, and in imperial units", () => {
    const input = {
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 25,
      labelChargeG: 680,
      recoveredChargeG: 850,
    } as const;
    const charge = extractEvidence(input).observations.find((o) => o.id.startsWith("charge:"));
    expect(charge && formatMessage(charge.message)).toMatch(
      /^Recovered 850 g against a label charge of 680 g: 170 g \(25 %\) over/,
    );
    expect(charge && formatMessage(charge.message, IMPERIAL)).toMatch(
      /^Recovered 30\.0 oz against a label charge of 24\.0 oz: 6\.0 oz \(25 %\) over/,
    );
  });

  it("says an optional part only when its values are there, and shows a gap rather than failing on a missing value", () => {
    const band = {
      high: gaugeKpa(1850),
      condensing: tempC(64),
      bandMinSat: tempC(47),
      bandMaxSat: tempC(63),
      ambient: tempC(33),
    };
    expect(formatMessage({ key: "high_side:high", values: band })).toBe(
      "High side 1850 kPa gauge (condensing at 64.0 °C) is above the expected 47.0–63.0 °C saturation for 33.0 °C ambient.",
    );
    expect(
      formatMessage({
        key: "high_side:high",
        values: { ...band, bandMin: gaugeKpa(1130), bandMax: gaugeKpa(1640) },
      }),
    ).toMatch(/saturation \(1130–1640 kPa gauge\) for/);
    expect(formatMessage({ key: "lift:normal" })).toBe(
      "The compressor lifts … of saturation temperature, a normal spread between the sides.",
    );
  });

  it("has a sentence for every reading grade and every symptom", () => {
    const keys = new Set(Object.keys(MESSAGE_TEMPLATES));
    for (const [group, grades] of Object.entries(READING_GRADES))
      for (const grade of grades) expect(keys.has(`${group}:${grade}`), `${group}:${grade}`).toBe(true);
    for (const symptom of SYMPTOM_IDS) expect(keys.has(`symptom:${symptom}`), symptom).toBe(true);
  });

  it("puts no unit of its own into a template: every number comes from a quantity", () => {
    for (const [key, template] of Object.entries(MESSAGE_TEMPLATES))
      expect(template, key).not.toMatch(/\d\s*(kPa|psi|bar|°C|°F|K\b|g\b|oz|mL)/);
  });
});

describe("the edges of the reader's numbers and words", () => {
  it("shows psi to a tenth below 100 and whole from 100 up", () => {
    expect(renderQuantity(gaugeKpa(pressureToKpa(100, "psi")), IMPERIAL)).toEqual(["100", "psig"]);
    expect(renderQuantity(gaugeKpa(pressureToKpa(99.5, "psi")), IMPERIAL)).toEqual(["99.5", "psig"]);
  });

  it("shows a gap for a missing word as for a missing value, never a crash", () => {
    expect(formatMessage({ key: "note:static_outside_table", values: { ambient: tempC(30) } })).toBe(
      "Static pressure check not possible: 30.0 °C is outside the … saturation table.",
    );
  });
});
