import { z } from "zod";
import { standardBarometricKpa } from "@/lib/units/barometric";
import { SYMPTOM_IDS } from "./symptoms";

// Standard atmosphere at sea level (ICAO/ISO 2533): a gauge can read no lower than this below zero.
const SEA_LEVEL_KPA = 101.325;

// Above ~4 MPa gauge an HFC mobile system is past its relief valve (SAE J639 systems, relief
// about 3.1–3.8 MPa, from memory); R-744 systems run to about 13 MPa on the high side (from memory).
const MAX_GAUGE_KPA = { "R-134a": 4500, "R-1234yf": 4500, "R-744": 16000 } as const;

const gaugeKpa = (what: string) =>
  z
    .number({ error: `${what} must be a number in kPa gauge` })
    .finite()
    .min(-SEA_LEVEL_KPA, { error: `${what} cannot be below a perfect vacuum (−101.3 kPa gauge)` })
    .max(16000, { error: `${what} above 16,000 kPa gauge is not a plausible reading` });

/** How the compressor is driven and controlled: it decides what clutch behaviour can tell. */
export const COMPRESSOR_TYPES = ["cycling_clutch", "variable_displacement", "electric"] as const;
export type CompressorType = (typeof COMPRESSOR_TYPES)[number];

const MAX_SOAK_MIN = 7 * 24 * 60;

const tempC = (what: string, minC: number, maxC: number) =>
  z
    .number({ error: `${what} must be a number in °C` })
    .finite()
    .min(minC, { error: `${what} below ${minC} °C is not plausible` })
    .max(maxC, { error: `${what} above ${maxC} °C is not plausible` });

export const diagnosisInputSchema = z
  .object({
    refrigerant: z.enum(["R-134a", "R-1234yf", "R-744"], {
      error: "refrigerant must be R-134a, R-1234yf or R-744",
    }),
    expansionDevice: z.enum(["orifice_tube", "txv"], {
      error: "expansion device must be orifice_tube or txv",
    }),
    ambientC: tempC("ambient temperature", -30, 60),
    relativeHumidityPct: z
      .number()
      .finite()
      .min(0, { error: "relative humidity must be 0–100 %" })
      .max(100, { error: "relative humidity must be 0–100 %" })
      .optional(),
    altitudeM: z
      .number()
      .finite()
      .min(-500, { error: "altitude below −500 m is not plausible" })
      .max(5000, { error: "altitude above 5,000 m is not plausible" })
      .optional(),
    staticKpaGauge: gaugeKpa("static pressure").optional(),
    highKpaGauge: gaugeKpa("high-side pressure").optional(),
    lowKpaGauge: gaugeKpa("low-side pressure").optional(),
    liquidLineC: tempC("liquid-line temperature", -40, 110).optional(),
    suctionLineC: tempC("suction-line temperature", -50, 80).optional(),
    ventC: tempC("vent temperature", -30, 60).optional(),
    labelChargeG: z
      .number()
      .finite()
      .positive({ error: "label charge must be above 0 g" })
      .max(5000, { error: "label charge above 5,000 g is not a light-vehicle system" })
      .optional(),
    recoveredChargeG: z
      .number()
      .finite()
      .min(0, { error: "recovered mass cannot be negative" })
      .max(6000, { error: "recovered mass above 6,000 g is not plausible" })
      .optional(),
    identifierPurityPct: z
      .number()
      .finite()
      .min(0, { error: "purity must be 0–100 %" })
      .max(100, { error: "purity must be 0–100 %" })
      .optional(),
    identifierAirPct: z
      .number()
      .finite()
      .min(0, { error: "air must be 0–100 %" })
      .max(100, { error: "air must be 0–100 %" })
      .optional(),
    compressorType: z
      .enum(COMPRESSOR_TYPES, {
        error: "compressor type must be cycling_clutch, variable_displacement or electric",
      })
      .optional(),
    staticSoakC: tempC("soak temperature", -30, 60).optional(),
    staticSoakMin: z
      .number()
      .finite()
      .min(0, { error: "soak time cannot be negative" })
      .max(MAX_SOAK_MIN, { error: "soak time above a week is not a soak" })
      .optional(),
    lowCutOutKpaGauge: gaugeKpa("low side at cut-out").optional(),
    lowCutInKpaGauge: gaugeKpa("low side at cut-in").optional(),
    chargedG: z
      .number()
      .finite()
      .min(0, { error: "charged mass cannot be negative" })
      .max(6000, { error: "charged mass above 6,000 g is not plausible" })
      .optional(),
    symptoms: z
      .array(z.enum(SYMPTOM_IDS, { error: "unknown symptom id" }))
      .max(SYMPTOM_IDS.length * 2)
      .optional(),
  })
  .superRefine((input, ctx) => {
    const maxKpa = MAX_GAUGE_KPA[input.refrigerant];
    const deepestGaugeKpa = -standardBarometricKpa(input.altitudeM ?? 0);
    for (const key of [
      "staticKpaGauge",
      "highKpaGauge",
      "lowKpaGauge",
      "lowCutOutKpaGauge",
      "lowCutInKpaGauge",
    ] as const) {
      const value = input[key];
      if (value !== undefined && value < deepestGaugeKpa) {
        ctx.addIssue({
          code: "custom",
          path: [key],
          message: `${value} kPa gauge is deeper than the local atmosphere allows (${deepestGaugeKpa.toFixed(1)} kPa gauge at ${input.altitudeM ?? 0} m)`,
        });
      }
      if (value !== undefined && value > maxKpa) {
        ctx.addIssue({
          code: "custom",
          path: [key],
          message: `${value} kPa gauge is above what a ${input.refrigerant} system can hold (${maxKpa} kPa gauge)`,
        });
      }
    }
    if (
      input.highKpaGauge !== undefined &&
      input.lowKpaGauge !== undefined &&
      input.highKpaGauge < input.lowKpaGauge - 50
    ) {
      ctx.addIssue({
        code: "custom",
        path: ["highKpaGauge"],
        message: "high side reads below low side while running: check that the hoses are on the right ports",
      });
    }
    if (
      input.lowCutOutKpaGauge !== undefined &&
      input.lowCutInKpaGauge !== undefined &&
      input.lowCutInKpaGauge < input.lowCutOutKpaGauge
    ) {
      ctx.addIssue({
        code: "custom",
        path: ["lowCutInKpaGauge"],
        message: "the low side at cut-in reads below the low side at cut-out: the two look swapped",
      });
    }
    if (
      input.recoveredChargeG !== undefined &&
      input.labelChargeG !== undefined &&
      input.recoveredChargeG > input.labelChargeG * 3
    ) {
      ctx.addIssue({
        code: "custom",
        path: ["recoveredChargeG"],
        message:
          "recovered mass is more than three times the label charge: check the scale and the label value",
      });
    }
  });

export type DiagnosisInput = z.infer<typeof diagnosisInputSchema>;
