import { massFromG, temperatureFromC, volumeFromMl } from "@/lib/units";

/** The unit system the shop works in; the owner reads the same. */
export type OwnerUnits = "metric" | "imperial";

/** A mass as an owner reads it: grams or kilograms; ounces or pounds and ounces. */
export function ownerMass(g: number, units: OwnerUnits): string {
  if (units === "metric") {
    return g >= 1000 ? `${(Math.round(g / 10) / 100).toString()} kg` : `${Math.round(g)} g`;
  }
  const oz = massFromG(g, "oz");
  if (oz < 16) return `${(Math.round(oz * 10) / 10).toString()} oz`;
  const wholeLb = Math.floor(oz / 16);
  const restOz = Math.round(oz - wholeLb * 16);
  if (restOz === 16) return `${wholeLb + 1} lb`;
  return restOz === 0 ? `${wholeLb} lb` : `${wholeLb} lb ${restOz} oz`;
}

/** Whole degrees are enough for an owner. */
export function ownerTemperature(c: number, units: OwnerUnits): string {
  const value = Math.round(units === "metric" ? c : temperatureFromC(c, "F"));
  return `${value < 0 ? "−" : ""}${Math.abs(value)} °${units === "metric" ? "C" : "F"}`;
}

/** A temperature difference in whole degrees (K and °C steps are the same size). */
export function ownerTemperatureDifference(k: number, units: OwnerUnits): string {
  const value = Math.round(units === "metric" ? k : k * 1.8);
  return `${value} degrees`;
}

export function ownerVolume(ml: number, units: OwnerUnits): string {
  if (units === "metric") return `${Math.round(ml)} mL`;
  return `${(Math.round(volumeFromMl(ml, "floz") * 10) / 10).toString()} fl oz`;
}

/**
 * How a measured charge compares with the label, as words an owner reads at a glance:
 * "about a quarter less refrigerant than the maker specifies". Null within 5 % of the label.
 */
export function chargeComparison(deviationPct: number): string | null {
  const size = Math.abs(deviationPct);
  if (!Number.isFinite(deviationPct) || size < 5) return null;
  if (deviationPct <= -85) return "almost none of the refrigerant the maker specifies";
  const share =
    size < 14
      ? "about a tenth"
      : size < 22.5
        ? "about a fifth"
        : size < 29
          ? "about a quarter"
          : size < 41
            ? "about a third"
            : size < 58
              ? "about half"
              : deviationPct < 0
                ? "more than half"
                : "far";
  return `${share} ${deviationPct < 0 ? "less" : "more"} refrigerant than the maker specifies`;
}
