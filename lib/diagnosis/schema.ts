import { z } from "zod";
import { withArticle } from "@/lib/article";
import { MAX_KPA_GAUGE_BY_REFRIGERANT } from "@/lib/refrigerants/gauge-limits";
import { SERVICE_REFRIGERANT_IDS, SERVICE_REFRIGERANTS_IN_WORDS } from "@/lib/refrigerants/catalog";
import { standardBarometricKpa } from "@/lib/units/barometric";
import { COMPRESSOR_TYPES } from "@/lib/vehicles/compressor-types";
import { EXPANSION_DEVICE_IDS } from "@/lib/vehicles/expansion-devices";
import { INPUT_LIMITS, inputLimitMessage, type LimitedField } from "./input-limits";
import { SYMPTOM_IDS } from "./symptoms";

/** A number between the field's limits (input-limits.ts), with the limit messages said in SI. */
const limited = (field: LimitedField, type: string) =>
  z
    .number({ error: `${INPUT_LIMITS[field].what} must be a number in ${type}` })
    .finite()
    .min(INPUT_LIMITS[field].min.value, { error: inputLimitMessage(field, "min") })
    .max(INPUT_LIMITS[field].max.value, { error: inputLimitMessage(field, "max") });

export const diagnosisInputSchema = z
  .object({
    refrigerant: z.enum(SERVICE_REFRIGERANT_IDS, {
      error: `refrigerant must be ${SERVICE_REFRIGERANTS_IN_WORDS}`,
    }),
    expansionDevice: z.enum(EXPANSION_DEVICE_IDS, {
      error: `expansion device must be ${EXPANSION_DEVICE_IDS.join(" or ")}`,
    }),
    ambientC: limited("ambientC", "°C"),
    relativeHumidityPct: limited("relativeHumidityPct", "%").optional(),
    altitudeM: z
      .number()
      .finite()
      .min(-500, { error: "altitude below −500 m is not plausible" })
      .max(5000, { error: "altitude above 5,000 m is not plausible" })
      .optional(),
    staticKpaGauge: limited("staticKpaGauge", "kPa gauge").optional(),
    highKpaGauge: limited("highKpaGauge", "kPa gauge").optional(),
    lowKpaGauge: limited("lowKpaGauge", "kPa gauge").optional(),
    liquidLineC: limited("liquidLineC", "°C").optional(),
    suctionLineC: limited("suctionLineC", "°C").optional(),
    ventC: limited("ventC", "°C").optional(),
    labelChargeG: limited("labelChargeG", "g")
      .positive({ error: `${INPUT_LIMITS.labelChargeG.what} must be above 0 g` })
      .optional(),
    recoveredChargeG: limited("recoveredChargeG", "g").optional(),
    identifierPurityPct: limited("identifierPurityPct", "%").optional(),
    identifierAirPct: limited("identifierAirPct", "%").optional(),
    compressorType: z
      .enum(COMPRESSOR_TYPES, {
        error: `compressor type must be ${COMPRESSOR_TYPES.slice(0, -1).join(", ")} or ${COMPRESSOR_TYPES.at(-1)}`,
      })
      .optional(),
    staticSoakC: limited("staticSoakC", "°C").optional(),
    staticSoakMin: limited("staticSoakMin", "minutes").optional(),
    lowCutOutKpaGauge: limited("lowCutOutKpaGauge", "kPa gauge").optional(),
    lowCutInKpaGauge: limited("lowCutInKpaGauge", "kPa gauge").optional(),
    chargedG: limited("chargedG", "g").optional(),
    symptoms: z
      .array(z.enum(SYMPTOM_IDS, { error: "unknown symptom id" }))
      .max(SYMPTOM_IDS.length * 2)
      .optional(),
  })
  .superRefine((input, ctx) => {
    const maxKpa = MAX_KPA_GAUGE_BY_REFRIGERANT[input.refrigerant];
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
          message: `${value} kPa gauge is above what ${withArticle(input.refrigerant)} system can hold (${maxKpa} kPa gauge)`,
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
