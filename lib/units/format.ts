import type { MassUnit, PressureUnit, TemperatureUnit, VolumeUnit } from "./factors";
import {
  massFromG,
  pressureFromKpa,
  temperatureDifferenceFromK,
  temperatureFromC,
  volumeFromMl,
} from "./convert";

function fixed(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  // No "−0.0": a reading that rounds to zero is zero.
  if (Number(text) === 0) return (0).toFixed(decimals);
  return text.startsWith("-") ? `−${text.slice(1)}` : text;
}

const PRESSURE_LABEL: Record<PressureUnit, { plain: string; gauge: string; absolute: string }> = {
  kPa: { plain: "kPa", gauge: "kPa (gauge)", absolute: "kPa (abs)" },
  bar: { plain: "bar", gauge: "bar (gauge)", absolute: "bar (abs)" },
  MPa: { plain: "MPa", gauge: "MPa (gauge)", absolute: "MPa (abs)" },
  psi: { plain: "psi", gauge: "psig", absolute: "psia" },
  inHg: { plain: "inHg", gauge: "inHg", absolute: "inHg" },
};

function pressureDecimals(value: number, unit: PressureUnit): number {
  const size = Math.abs(value);
  switch (unit) {
    case "kPa":
    case "psi":
      return size >= 100 ? 0 : 1;
    case "bar":
      return size >= 100 ? 1 : 2;
    case "MPa":
      return 3;
    case "inHg":
      return 1;
  }
}

/**
 * Shows kpa as given, converted to unit. gauge: true labels it a gauge reading, false an absolute
 * one; convert first with absoluteToGaugeKpa when the number is absolute.
 */
export function formatPressure(kpa: number, unit: PressureUnit, opts?: { gauge?: boolean }): string {
  const value = pressureFromKpa(kpa, unit);
  const label =
    opts?.gauge === undefined
      ? PRESSURE_LABEL[unit].plain
      : opts.gauge
        ? PRESSURE_LABEL[unit].gauge
        : PRESSURE_LABEL[unit].absolute;
  return `${fixed(value, pressureDecimals(value, unit))} ${label}`;
}

export function formatTemperature(c: number, unit: TemperatureUnit): string {
  return `${fixed(temperatureFromC(c, unit), 1)} ${unit === "K" ? "K" : `°${unit}`}`;
}

/** Superheat, subcooling, approach: a difference, shown in K or °F. */
export function formatTemperatureDifference(k: number, unit: "K" | "F"): string {
  return `${fixed(temperatureDifferenceFromK(k, unit), 1)} ${unit === "K" ? "K" : "°F"}`;
}

const MASS_DECIMALS: Record<MassUnit, number> = { g: 0, kg: 3, oz: 1, lb: 2 };
export function formatMass(g: number, unit: MassUnit): string {
  return `${fixed(massFromG(g, unit), MASS_DECIMALS[unit])} ${unit}`;
}

const VOLUME_LABEL: Record<VolumeUnit, { decimals: number; label: string }> = {
  mL: { decimals: 0, label: "mL" },
  floz: { decimals: 1, label: "fl oz" },
};
export function formatVolume(ml: number, unit: VolumeUnit): string {
  return `${fixed(volumeFromMl(ml, unit), VOLUME_LABEL[unit].decimals)} ${VOLUME_LABEL[unit].label}`;
}
