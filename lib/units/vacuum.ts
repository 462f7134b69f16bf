import { type BarometricSource, barometricKpa } from "./barometric";
import { KPA_PER_UNIT } from "./factors";
import { normaliseNumbers } from "./number";
import { KPA_PER_VACUUM_UNIT, round, vacuumFromKpaAbs, type VacuumUnit } from "./vacuum-format";

export {
  formatVacuum,
  KPA_PER_VACUUM_UNIT,
  MICRON_RANGE_KPA_ABS,
  vacuumFromKpaAbs,
  type VacuumUnit,
} from "./vacuum-format";

// Reading a typed vacuum, and writing a stored one back as field text; saying one is vacuum-format.ts.

const SPELLINGS: Record<string, VacuumUnit> = {
  inhg: "inHg",
  "in hg": "inHg",
  '"hg': "inHg",
  '" hg': "inHg",
  "in. hg": "inHg",
  "inhg vacuum": "inHg",
  "inhg vac": "inHg",
  kpa: "kPa",
  "kpa abs": "kPa",
  kpaa: "kPa",
  "kpa(a)": "kPa",
  "kpa absolute": "kPa",
  mbar: "mbar",
  "mbar abs": "mbar",
  "mbar absolute": "mbar",
  micron: "micron",
  microns: "micron",
  µ: "micron",
  μ: "micron",
  "µm hg": "micron",
  "μm hg": "micron",
  "um hg": "micron",
  µmhg: "micron",
  umhg: "micron",
  mtorr: "micron",
};

export const VACUUM_EXAMPLES = "29.5 inHg, 0.4 kPa abs, 4 mbar or 500 microns";

export type VacuumReading =
  | {
      kpaAbs: number;
      /** The number and unit as read, for showing back what was typed. */
      value: number;
      unit: VacuumUnit;
      /** What the number was taken to be, in words: a screen says it beside the field. */
      readAs: string;
    }
  | { error: string; ambiguous?: { decimal: number; thousands: number } };

/** The deepest reading a vacuum gauge in inHg can show at this place: the whole local atmosphere. */
export function deepestVacuumInHg(at?: BarometricSource): number {
  return barometricKpa(at) / KPA_PER_UNIT.inHg;
}

/** Reads a typed vacuum ("29.9", "29.9 inHg", "-29.9 inHg", "500 microns", "0.4 kPa", "4 mbar"). */
export function parseVacuum(
  text: string,
  defaultUnit: VacuumUnit,
  opts: { at?: BarometricSource; locale?: string } = {},
): VacuumReading {
  const numbers = normaliseNumbers(text.trim().replace(/[\u2212\u2013]/g, "-"), opts.locale ?? "en");
  if ("error" in numbers) return numbers;
  if ("ambiguous" in numbers)
    return {
      error: `“${numbers.ambiguous.text}” could be ${numbers.ambiguous.decimal} or ${numbers.ambiguous.thousands}: type it without the separator.`,
      ambiguous: numbers.ambiguous,
    };
  const match = /^([+-]?(?:\d+(?:\.\d+)?|\.\d+))\s*(.*)$/.exec(numbers.text.replace(/\s+/g, " "));
  if (!match) return { error: `Enter the vacuum as the gauge shows it, for example ${VACUUM_EXAMPLES}.` };
  const spelled = (match[2] ?? "").trim().toLowerCase();
  const unit = spelled === "" ? defaultUnit : SPELLINGS[spelled];
  if (!unit)
    return {
      error: `“${match[2]}” is not a vacuum unit we read. Use inHg, kPa or mbar absolute, or microns: for example ${VACUUM_EXAMPLES}.`,
    };
  const typed = Number(match[1]);
  const atmosphereKpa = barometricKpa(opts.at);
  const here = `${round(atmosphereKpa, 1)} kPa (${round(atmosphereKpa / KPA_PER_UNIT.inHg, 1)} inHg)`;
  let kpaAbs: number;
  let readAs: string;
  if (unit === "inHg") {
    // A compound gauge shows vacuum as inches below the atmosphere; some print it with a minus sign.
    const below = Math.abs(typed);
    kpaAbs = atmosphereKpa - below * KPA_PER_UNIT.inHg;
    readAs = `inHg of vacuum below the local atmosphere (a compound gauge), about ${round(Math.max(kpaAbs, 0), 2)} kPa absolute`;
    if (kpaAbs < -0.005)
      return {
        error: `${below} inHg is a deeper vacuum than the air here allows: the atmosphere here is ${here}, so a vacuum gauge cannot read more than ${round(atmosphereKpa / KPA_PER_UNIT.inHg, 1)} inHg. Check the gauge and the shop's altitude.`,
      };
    kpaAbs = Math.max(kpaAbs, 0);
    return { kpaAbs, value: below, unit, readAs };
  }
  if (typed < 0) {
    return {
      error: `A ${unit === "micron" ? "micron" : "absolute"} reading cannot be below zero. For a compound gauge's reading below the atmosphere, type it in inHg (for example 29.5 inHg).`,
    };
  }
  kpaAbs = typed * KPA_PER_VACUUM_UNIT[unit];
  readAs =
    unit === "micron"
      ? "microns of mercury, absolute (a micron gauge)"
      : `${unit} absolute (an electronic gauge)`;
  if (kpaAbs > atmosphereKpa + 0.5)
    return {
      error: `${typed} ${unit === "micron" ? "microns" : unit} absolute is above the atmosphere here (${here}): not a vacuum. For a compound gauge's reading, type it in inHg.`,
    };
  return { kpaAbs, value: typed, unit, readAs };
}

/** Stored vacuum readings keep 0.01 Pa (service_record, DECIMAL(9,5) kPa). */
const STORED_RESOLUTION_KPA = 0.00001;

/**
 * A stored vacuum as field text that reads back to the same value, in the unit it was most likely typed
 * in: the unit where it needs the fewest significant digits, the reader's own first on a tie. 500 microns comes
 * back as 500 microns and 29.9 inHg as 29.9 inHg, whatever the reader's unit.
 */
export function vacuumFieldText(kpaAbs: number, unit: VacuumUnit, at?: BarometricSource): string {
  const order = [...new Set<VacuumUnit>([unit, "inHg", "micron", "kPa", "mbar"])];
  let best: { unit: VacuumUnit; value: number; digits: number } | null = null;
  for (const u of order) {
    const exact = vacuumFromKpaAbs(kpaAbs, u, at);
    if (u === "inHg" && exact <= 0) continue;
    const tolerance = (0.6 * STORED_RESOLUTION_KPA) / KPA_PER_VACUUM_UNIT[u];
    // Nobody reads a micron gauge to a fraction of a micron.
    for (let decimals = 0; decimals <= (u === "micron" ? 0 : 3); decimals++) {
      const value = round(exact, decimals);
      if (Math.abs(value - exact) > tolerance) continue;
      const digits = value.toFixed(decimals).replace(".", "").replace(/^0+/, "").length;
      if (!best || digits < best.digits) best = { unit: u, value, digits };
      break;
    }
  }
  const shown = best ?? { unit, value: round(vacuumFromKpaAbs(kpaAbs, unit, at), 3) };
  return `${shown.value} ${shown.unit === "micron" ? "microns" : shown.unit}`;
}
