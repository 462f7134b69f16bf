import { describe, expect, it } from "vitest";
import { cautionsById } from "@/lib/cautions/catalog";
import { collectCautions } from "./cautions";
import type { CauseId } from "./causes";
import { degC, grams, kelvin, pct, plain } from "./format";
import { measuredStatement } from "./measured";
import { formatMessage, renderQuantity, SI_UNITS, type ReaderUnits } from "./messages";
import { KEY_READING_GROUPS, type ObservationId } from "./observations";
import { absKpa, gaugeKpa, kpaDifference, millilitres, minutes, percent, tempC } from "./quantities";
import * as q from "./quantities";
import type { DiagnosisInput } from "./schema";

const base = { refrigerant: "R-134a", expansionDevice: "txv", ambientC: 25 } as const;

describe("the cautions a case shows (safety first; the catalogue's own wording)", () => {
  const cautions = (
    input: DiagnosisInput,
    extra: {
      observations?: ObservationId[];
      ranking?: [CauseId, number][];
      refrigerantContaminated?: boolean;
      doNotRun?: boolean;
    } = {},
  ) =>
    collectCautions({
      input,
      observations: new Set(extra.observations ?? []),
      ranking: (extra.ranking ?? [["no_refrigerant_fault", 0.9]]).map(([cause, share]) => ({ cause, share })),
      refrigerantContaminated: extra.refrigerantContaminated ?? false,
      doNotRun: extra.doNotRun ?? false,
    });
  const ids = (...args: Parameters<typeof cautions>) => cautions(...args).map((c) => c.id);

  it("always warns of liquid refrigerant on eyes and skin and ends by deferring to the maker's procedure", () => {
    const list = ids(base);
    expect(list[0]).toBe("eye_and_skin");
    expect(list.at(-1)).toBe("defer_to_procedure");
  });

  it("follows the refrigerant: no venting of a fluorinated gas, R-1234yf is flammable, R-744 runs at high pressure", () => {
    expect(ids(base)).toContain("never_vent");
    expect(ids(base)).not.toContain("flammable_r1234yf");
    expect(ids({ ...base, refrigerant: "R-1234yf" })).toEqual(
      expect.arrayContaining(["never_vent", "flammable_r1234yf"]),
    );
    const co2 = ids({ ...base, refrigerant: "R-744" });
    expect(co2).toContain("r744_pressure");
    expect(co2).not.toContain("never_vent");
    expect(ids(base)).not.toContain("r744_pressure");
  });

  it("warns of high voltage and of running without charge on an electric compressor only", () => {
    expect(ids({ ...base, compressorType: "electric" })).toEqual(
      expect.arrayContaining(["high_voltage_compressor", "electric_never_without_charge"]),
    );
    expect(ids({ ...base, compressorType: "variable_displacement" })).not.toContain(
      "high_voltage_compressor",
    );
  });

  it("follows what was found: a mixed charge, a hydrocarbon, sealant, a very high head", () => {
    expect(ids(base, { refrigerantContaminated: true })).toContain("contaminated_do_not_recover");
    expect(ids(base)).not.toContain("contaminated_do_not_recover");
    expect(ids(base, { observations: ["symptom:identifier_flags_hydrocarbon"] })).toContain(
      "hydrocarbon_flammable",
    );
    expect(ids(base, { observations: ["symptom:sealant_found"] })).toContain("sealant_in_system");
    expect(ids(base, { observations: ["high_side:very_high"] })).toContain("head_pressure_high");
    expect(ids(base, { observations: ["symptom:high_pressure_cutout"] })).toContain("head_pressure_high");
    expect(ids(base, { observations: ["high_side:high"] })).not.toContain("head_pressure_high");
    expect(ids(base)).not.toEqual(expect.arrayContaining(["hydrocarbon_flammable"]));
    expect(ids(base)).not.toContain("sealant_in_system");
  });

  it("warns of an empty system in the do-not-run state, and asks for charging by weight unconditionally there", () => {
    const held = cautions(base, { doNotRun: true });
    expect(held.map((c) => c.id)).toEqual(expect.arrayContaining(["empty_system", "charge_by_weight"]));
    const byWeight = held.find((c) => c.id === "charge_by_weight");
    expect(byWeight?.text).toBe(cautionsById(["charge_by_weight"])[0]?.text);
    expect(ids(base)).not.toContain("empty_system");
  });

  it("asks for slow recovery past an accumulator on an orifice-tube system only", () => {
    expect(ids({ ...base, expansionDevice: "orifice_tube" })).toContain("recover_slowly_accumulator");
    expect(ids(base)).not.toContain("recover_slowly_accumulator");
  });

  it("names repair cautions for the leader or a real share, as conditions, and never for a mixed charge", () => {
    const catalogue = (id: "charge_by_weight" | "repair_before_refill" | "moisture_and_acid") =>
      cautionsById([id])[0]!;
    const under = cautions(base, { ranking: [["undercharge", 0.6]] });
    expect(under.map((c) => c.id)).toEqual(
      expect.arrayContaining(["charge_by_weight", "repair_before_refill"]),
    );
    expect(under.find((c) => c.id === "repair_before_refill")?.text).toBe(
      catalogue("repair_before_refill").ifSuspected,
    );
    expect(under.find((c) => c.id === "charge_by_weight")?.text).toBe(
      catalogue("charge_by_weight").ifSuspected,
    );
    expect(ids(base, { ranking: [["overcharge", 0.6]] })).toContain("charge_by_weight");
    const moist = cautions(base, {
      ranking: [
        ["overcharge", 0.7],
        ["moisture", 0.2],
      ],
    });
    expect(moist.find((c) => c.id === "moisture_and_acid")?.text).toBe(
      catalogue("moisture_and_acid").ifSuspected,
    );
    expect(
      ids(base, {
        ranking: [
          ["overcharge", 0.81],
          ["moisture", 0.19],
        ],
      }),
    ).not.toContain("moisture_and_acid");
    expect(ids(base, { ranking: [["undercharge", 0.6]], refrigerantContaminated: true })).not.toContain(
      "repair_before_refill",
    );
    expect(ids(base)).not.toContain("charge_by_weight");
  });
});

describe("how much was measured", () => {
  const all = new Set(KEY_READING_GROUPS);

  it("says none, all, or which were and were not", () => {
    expect(measuredStatement(new Set(), false).statement).toBe(
      `None of the ${KEY_READING_GROUPS.length} key readings has been measured yet: the ranking rests on the reported behaviour and on how common each cause is.`,
    );
    expect(measuredStatement(all, false).statement).toBe(
      `All ${KEY_READING_GROUPS.length} key readings were measured.`,
    );
    expect(measuredStatement(all, false).missing).toEqual([]);
    const one = measuredStatement(new Set(["high_side"]), false);
    expect(one.groups).toEqual(["high_side"]);
    expect(one.statement).toMatch(
      new RegExp(
        `^Measured 1 of the ${KEY_READING_GROUPS.length} key readings \\(high side\\); not yet measured: low side, `,
      ),
    );
    const two = measuredStatement(new Set(["high_side", "low_side"]), false);
    expect(two.statement).toMatch(/\(high side and low side\)/);
  });

  it("adds why the pressures were not assessed on a failed identification", () => {
    expect(measuredStatement(new Set(["purity"]), true).statement).toMatch(
      / The refrigerant failed identification, so its pressures and temperatures were not assessed\.$/,
    );
    expect(measuredStatement(new Set(["purity"]), false).statement).not.toMatch(/failed identification/);
  });
});

describe("numbers in sentences", () => {
  it("rounds to fixed decimals, groups thousands and writes a real minus sign", () => {
    expect(plain(1234567.891, 2)).toBe("1,234,567.89");
    expect(plain(1005, 0)).toBe("1,005");
    expect(plain(1050, 0)).toBe("1,050");
    expect(plain(999.6, 0)).toBe("1,000");
    expect(plain(-2.05, 1)).toBe("−2.1");
    expect(plain(-0.04, 1)).toBe("0.0");
    expect(plain(3.007, 3)).toBe("3.007");
    expect(plain(0.5, 1)).toBe("0.5");
    expect(plain(101.3, 0, false)).toBe("101");
    expect(plain(-20, 0, false)).toBe("−20");
    expect(plain(1050, 0, false)).toBe("1050");
    expect(degC(4.25)).toBe("4.3 °C");
    expect(kelvin(12)).toBe("12.0 K");
    expect(grams(680.4)).toBe("680 g");
    expect(pct(98)).toBe("98 %");
    expect(pct(97.94)).toBe("97.9 %");
  });
});

describe("quantities in the reader's units (NIST SP 811 conversion factors)", () => {
  const imperial: ReaderUnits = { pressure: "psi", temperature: "F", mass: "lb", volume: "floz" };
  const render = (quantity: q.Quantity, units: ReaderUnits = SI_UNITS) =>
    renderQuantity(quantity, units).join(" ");

  it("says pressures gauge, absolute or as a difference in each unit", () => {
    expect(render(gaugeKpa(689.476))).toBe("689 kPa gauge");
    expect(render(absKpa(101.325))).toBe("101 kPa absolute");
    expect(render(kpaDifference(35))).toBe("35 kPa");
    expect(render(gaugeKpa(689.476), imperial)).toBe("100 psig");
    expect(render(gaugeKpa(68.9476), imperial)).toBe("10.0 psig");
    expect(render(absKpa(101.325), imperial)).toBe("14.7 psia");
    expect(render(kpaDifference(6.894757), imperial)).toBe("1.0 psi");
    expect(render(gaugeKpa(250), { ...SI_UNITS, pressure: "bar" })).toBe("2.50 bar gauge");
    expect(render(absKpa(250), { ...SI_UNITS, pressure: "bar" })).toBe("2.50 bar absolute");
    expect(render(gaugeKpa(1500), { ...SI_UNITS, pressure: "MPa" })).toBe("1.500 MPa gauge");
    expect(render({ ...gaugeKpa(1500), decimals: 1 }, { ...SI_UNITS, pressure: "MPa" })).toBe(
      "1.5 MPa gauge",
    );
  });

  it("says temperatures and their differences in °C and K, or °F", () => {
    expect(render(tempC(0))).toBe("0.0 °C");
    expect(render(tempC(100), imperial)).toBe("212.0 °F");
    expect(render({ ...tempC(30.98), decimals: 0 })).toBe("31 °C");
    expect(render(q.kelvin(5))).toBe("5.0 K");
    expect(render(q.kelvin(5), imperial)).toBe("9.0 °F");
    expect(render({ ...q.kelvin(5), decimals: 0 }, imperial)).toBe("9 °F");
  });

  it("says masses, volumes, percentages and durations", () => {
    expect(render(q.grams(680))).toBe("680 g");
    expect(render(q.grams(453.59237), imperial)).toBe("1.00 lb");
    expect(render(q.grams(28.349523), { ...SI_UNITS, mass: "oz" })).toBe("1.0 oz");
    expect(render(q.grams(1250), { ...SI_UNITS, mass: "kg" })).toBe("1.250 kg");
    expect(render(millilitres(120))).toBe("120 mL");
    expect(render(millilitres(29.5735), imperial)).toBe("1.0 fl oz");
    expect(render({ ...millilitres(120), decimals: 1 })).toBe("120.0 mL");
    expect(render(percent(98))).toBe("98 %");
    expect(render(percent(97.5))).toBe("97.5 %");
    expect(render(percent(97.5, 0))).toBe("98 %");
    expect(render(minutes(90))).toBe("90 min");
  });
});

describe("filling a sentence", () => {
  it("says an optional part only when all its values are there, and marks a missing value elsewhere", () => {
    const withSoak = formatMessage({
      key: "static:slightly_high",
      values: {
        static: gaugeKpa(600),
        excess: q.kelvin(3),
        saturation: gaugeKpa(564),
        reference: tempC(25),
        soakTime: minutes(90),
      },
      words: { what: "parts' soak temperature", weak: "" },
    });
    expect(withSoak).toBe(
      "Static pressure 600 kPa gauge sits 3.0 K above saturation (564 kPa gauge) at the parts' soak temperature of 25.0 °C after 90 min of soak.",
    );
    const withoutSoak = formatMessage({
      key: "static:slightly_high",
      values: { static: gaugeKpa(600), excess: q.kelvin(3), saturation: gaugeKpa(564), reference: tempC(25) },
      words: { what: "parts' soak temperature", weak: "" },
    });
    expect(withoutSoak).toBe(
      "Static pressure 600 kPa gauge sits 3.0 K above saturation (564 kPa gauge) at the parts' soak temperature of 25.0 °C.",
    );
    expect(formatMessage({ key: "low_side:vacuum" })).toBe(
      "Low side … is at or below atmospheric pressure (vacuum) while running.",
    );
  });

  it("says a number alone where the template asks for it, in the reader's units", () => {
    const sentence = formatMessage(
      {
        key: "subcooling:low",
        values: {
          subcooling: q.kelvin(2),
          liquid: tempC(48),
          condensing: tempC(50),
          typicalMin: q.kelvin(4),
          typicalMax: q.kelvin(12),
        },
      },
      { pressure: "psi", temperature: "F", mass: "oz", volume: "floz" },
    );
    expect(sentence).toBe(
      "Subcooling 3.6 °F (liquid line 118.4 °F against 122.0 °F condensing) is below the typical 7.2–21.6 °F.",
    );
  });
});
