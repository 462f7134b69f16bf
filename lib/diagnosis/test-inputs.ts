// fast-check generators of engine inputs, shared by the property tests (a helper, not a test file).
import fc from "fast-check";
import { COMPRESSOR_TYPES } from "@/lib/vehicles/compressor-types";
import { type DiagnosisInput, diagnosisInputSchema } from "./schema";
import { SYMPTOM_IDS } from "./symptoms";

export const optional = <T>(arb: fc.Arbitrary<T>) => fc.option(arb, { nil: undefined, freq: 3 });
export const real = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

export const candidateInput = fc
  .constantFrom("R-134a" as const, "R-1234yf" as const, "R-744" as const)
  .chain((refrigerant) => {
    const maxKpa = refrigerant === "R-744" ? 16000 : 4500;
    const pressure = fc.oneof(real(-101.3, 3000), real(-101.3, maxKpa));
    return fc.record({
      refrigerant: fc.constant(refrigerant),
      expansionDevice: fc.constantFrom("orifice_tube" as const, "txv" as const),
      ambientC: real(-30, 60),
      relativeHumidityPct: optional(real(0, 100)),
      altitudeM: optional(real(-500, 5000)),
      staticKpaGauge: optional(pressure),
      staticSoakC: optional(real(-30, 60)),
      staticSoakMin: optional(real(0, 1440)),
      highKpaGauge: optional(pressure),
      lowKpaGauge: optional(pressure),
      lowCutOutKpaGauge: optional(pressure),
      lowCutInKpaGauge: optional(pressure),
      liquidLineC: optional(real(-40, 110)),
      suctionLineC: optional(real(-50, 80)),
      ventC: optional(real(-30, 60)),
      labelChargeG: optional(real(1, 5000)),
      recoveredChargeG: optional(real(0, 6000)),
      chargedG: optional(real(0, 6000)),
      identifierPurityPct: optional(real(0, 100)),
      identifierAirPct: optional(real(0, 100)),
      compressorType: optional(fc.constantFrom(...COMPRESSOR_TYPES)),
      symptoms: optional(fc.subarray([...SYMPTOM_IDS])),
    });
  });

/** Inputs the schema accepts: the engine's contract covers exactly these. */
export const validInput: fc.Arbitrary<DiagnosisInput> = candidateInput.filter(
  (c) => diagnosisInputSchema.safeParse(c).success,
);

/** Shop-like inputs: the temperatures a shop works at and pressures a mobile system reads. */
export const shopInput: fc.Arbitrary<DiagnosisInput> = fc
  .record({
    refrigerant: fc.constantFrom("R-134a" as const, "R-1234yf" as const),
    expansionDevice: fc.constantFrom("orifice_tube" as const, "txv" as const),
    compressorType: optional(fc.constantFrom(...COMPRESSOR_TYPES)),
    ambientC: real(10, 46),
    relativeHumidityPct: optional(real(10, 95)),
    altitudeM: optional(real(0, 2000)),
    staticKpaGauge: optional(real(0, 1300)),
    staticSoakC: optional(real(5, 45)),
    staticSoakMin: optional(real(0, 600)),
    highKpaGauge: optional(real(300, 2600)),
    lowKpaGauge: optional(real(-60, 500)),
    liquidLineC: optional(real(15, 75)),
    suctionLineC: optional(real(-10, 30)),
    ventC: optional(real(0, 35)),
    labelChargeG: optional(real(300, 1500)),
    recoveredChargeG: optional(real(0, 1800)),
    chargedG: optional(real(0, 1500)),
    identifierPurityPct: optional(real(90, 100)),
    identifierAirPct: optional(real(0, 6)),
    symptoms: optional(fc.subarray([...SYMPTOM_IDS], { maxLength: 5 })),
  })
  .filter((c) => diagnosisInputSchema.safeParse(c).success);
