"use client";

import { useCallback, useMemo, useSyncExternalStore } from "react";
import type { MassUnit, TemperatureUnit, VolumeUnit } from "@/lib/units";

export type GaugeUnit = "kPa" | "bar" | "psi";
export interface UnitPreferences {
  pressure: GaugeUnit;
  temperature: Exclude<TemperatureUnit, "K">;
  mass: MassUnit;
  volume: VolumeUnit;
}
export type QuantityKind = keyof UnitPreferences;

export const UNIT_CHOICES = {
  pressure: ["kPa", "bar", "psi"],
  temperature: ["C", "F"],
  mass: ["g", "kg", "oz", "lb"],
  volume: ["mL", "floz"],
} as const satisfies { [K in QuantityKind]: readonly UnitPreferences[K][] };

export function defaultUnits(system: "metric" | "imperial"): UnitPreferences {
  return system === "imperial"
    ? { pressure: "psi", temperature: "F", mass: "oz", volume: "floz" }
    : { pressure: "kPa", temperature: "C", mass: "g", volume: "mL" };
}

// Kept per device: each technician reads their own gauges in their own units.
const KEY = "chillwright:units";
const listeners = new Set<() => void>();
let cachedRaw: string | null | undefined;
let cachedValue: Partial<UnitPreferences> = {};

function read(): Partial<UnitPreferences> {
  const raw = typeof window === "undefined" ? null : window.localStorage.getItem(KEY);
  if (raw !== cachedRaw) {
    cachedRaw = raw;
    try {
      cachedValue = raw ? (JSON.parse(raw) as Partial<UnitPreferences>) : {};
    } catch {
      cachedValue = {};
    }
  }
  return cachedValue;
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

const EMPTY: Partial<UnitPreferences> = {};

export function useUnitPreferences(shopSystem: "metric" | "imperial") {
  const stored = useSyncExternalStore(subscribe, read, () => EMPTY);
  // One object per actual change: screens compare units by identity.
  const units: UnitPreferences = useMemo(
    () => ({ ...defaultUnits(shopSystem), ...stored }),
    [shopSystem, stored],
  );
  const setUnit = useCallback(<K extends QuantityKind>(kind: K, unit: UnitPreferences[K]) => {
    window.localStorage.setItem(KEY, JSON.stringify({ ...read(), [kind]: unit }));
    listeners.forEach((l) => l());
  }, []);
  return { units, setUnit };
}
