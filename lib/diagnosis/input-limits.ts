import { VEHICLE_CHARGE_MASS_MAX_G } from "@/lib/contracts/case-figures";
import { FULL_VACUUM_KPA_GAUGE, MAX_READING_KPA_GAUGE } from "@/lib/refrigerants/gauge-limits";
import { formatMessage, type ReaderUnits, SI_UNITS } from "./messages";
import { gaugeKpa, grams, minutes, percent, type Quantity, tempC } from "./quantities";

const whole = (q: Quantity): Quantity => ({ ...q, decimals: 0 });

/**
 * What the engine accepts, as quantities: a screen can say a limit in the reader's own units
 * (inputLimitMessage) instead of a sentence with kPa and °C baked in.
 */
export const INPUT_LIMITS = {
  ambientC: { what: "ambient temperature", min: whole(tempC(-30)), max: whole(tempC(60)) },
  relativeHumidityPct: { what: "relative humidity", min: whole(percent(0)), max: whole(percent(100)) },
  staticKpaGauge: {
    what: "static pressure",
    min: gaugeKpa(FULL_VACUUM_KPA_GAUGE),
    max: gaugeKpa(MAX_READING_KPA_GAUGE),
  },
  staticSoakC: { what: "soak temperature", min: whole(tempC(-30)), max: whole(tempC(60)) },
  staticSoakMin: { what: "soak time", min: minutes(0), max: minutes(7 * 24 * 60) },
  highKpaGauge: {
    what: "high-side pressure",
    min: gaugeKpa(FULL_VACUUM_KPA_GAUGE),
    max: gaugeKpa(MAX_READING_KPA_GAUGE),
  },
  lowKpaGauge: {
    what: "low-side pressure",
    min: gaugeKpa(FULL_VACUUM_KPA_GAUGE),
    max: gaugeKpa(MAX_READING_KPA_GAUGE),
  },
  lowCutOutKpaGauge: {
    what: "low side at cut-out",
    min: gaugeKpa(FULL_VACUUM_KPA_GAUGE),
    max: gaugeKpa(MAX_READING_KPA_GAUGE),
  },
  lowCutInKpaGauge: {
    what: "low side at cut-in",
    min: gaugeKpa(FULL_VACUUM_KPA_GAUGE),
    max: gaugeKpa(MAX_READING_KPA_GAUGE),
  },
  liquidLineC: { what: "liquid-line temperature", min: whole(tempC(-40)), max: whole(tempC(110)) },
  suctionLineC: { what: "suction-line temperature", min: whole(tempC(-50)), max: whole(tempC(80)) },
  ventC: { what: "vent temperature", min: whole(tempC(-30)), max: whole(tempC(60)) },
  labelChargeG: { what: "label charge", min: grams(0), max: grams(5000) },
  recoveredChargeG: { what: "recovered mass", min: grams(0), max: grams(VEHICLE_CHARGE_MASS_MAX_G) },
  chargedG: { what: "charged mass", min: grams(0), max: grams(VEHICLE_CHARGE_MASS_MAX_G) },
  identifierPurityPct: { what: "purity", min: whole(percent(0)), max: whole(percent(100)) },
  identifierAirPct: { what: "air", min: whole(percent(0)), max: whole(percent(100)) },
} as const satisfies Record<string, { what: string; min: Quantity; max: Quantity }>;

export type LimitedField = keyof typeof INPUT_LIMITS;

/** The message for a value past one of the limits, in the reader's units (SI by default, as the schema says it). */
export function inputLimitMessage(
  field: LimitedField,
  side: "min" | "max",
  units: ReaderUnits = SI_UNITS,
): string {
  const limit = INPUT_LIMITS[field];
  const key =
    side === "max"
      ? "limit:above"
      : limit.min.kind === "pressure_gauge"
        ? "limit:vacuum"
        : limit.min.value === 0 && (limit.min.kind === "mass" || limit.min.kind === "duration")
          ? "limit:negative"
          : "limit:below";
  return formatMessage({ key, values: { limit: limit[side] }, words: { what: limit.what } }, units);
}
