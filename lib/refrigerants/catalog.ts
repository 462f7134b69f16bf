import { buildSaturationTable } from "@/data/refrigerants/build-table";
import { VAPOUR_PRESSURE_EQUATIONS } from "@/data/refrigerants/equations";

/**
 * The one list of refrigerants (tests/unit/vocabulary.test.ts fails on a second one). REFRIGERANT_IDS
 * are the refrigerants the bundled saturation tables cover and a stored row may hold;
 * SERVICE_REFRIGERANT_IDS are the ones Chillwright offers anywhere a refrigerant is chosen: a new
 * vehicle, a spec-table row or its CSV import, a cylinder, the interview and the findings.
 *
 * R-12 is offered nowhere, and this is why:
 * - the findings engine's grades (expected bands, subcooling and superheat ranges, gauge limits, the
 *   worked cases) are set and tested for R-134a, R-1234yf and R-744 only, so an R-12 interview would
 *   end in findings nobody has checked; offering R-12 for a vehicle or a cylinder while the interview
 *   refused it would tell the technician the product covers a system it does not;
 * - an R-12 (CFC-12) system is an ozone-depleting one from before the changeover to R-134a in the early
 *   1990s (from memory). Where servicing it is still allowed, it needs R-12-only recovery equipment and
 *   its own rules (US 40 CFR Part 82; in the EU, Regulation (EC) No 1005/2009): the shop follows those
 *   and the vehicle maker's procedure outside this product.
 * Its saturation table stays: it is checked against its published equation, and a row stored before
 * this rule still reads.
 */
export const REFRIGERANT_IDS = ["R-134a", "R-1234yf", "R-744", "R-12"] as const;
export type RefrigerantId = (typeof REFRIGERANT_IDS)[number];

export const SERVICE_REFRIGERANT_IDS = [
  "R-134a",
  "R-1234yf",
  "R-744",
] as const satisfies readonly RefrigerantId[];
export type ServiceRefrigerantId = (typeof SERVICE_REFRIGERANT_IDS)[number];

/** How a refrigerant is named on screen: its ASHRAE Standard 34 designation, CO₂ spelled out for R-744. */
export const REFRIGERANT_LABELS: Readonly<Record<RefrigerantId, string>> = {
  "R-134a": "R-134a",
  "R-1234yf": "R-1234yf",
  "R-744": "R-744 (CO₂)",
  "R-12": "R-12",
};

/** The offered refrigerants as choices, in the order the lists show them. */
export const SERVICE_REFRIGERANT_OPTIONS: readonly { value: ServiceRefrigerantId; label: string }[] =
  SERVICE_REFRIGERANT_IDS.map((id) => ({ value: id, label: REFRIGERANT_LABELS[id] }));

/** "R-134a, R-1234yf or R-744": the offered refrigerants in a sentence. */
export const SERVICE_REFRIGERANTS_IN_WORDS = `${SERVICE_REFRIGERANT_IDS.slice(0, -1).join(", ")} or ${SERVICE_REFRIGERANT_IDS.at(-1)}`;

export interface RefrigerantInfo {
  id: RefrigerantId;
  name: string;
  criticalTempC: number;
  criticalPressureKpaAbs: number;
  /** null for R-744: CO2 has no liquid at one atmosphere. */
  normalBoilingPointC: number | null;
  /** Valid range of the bundled saturation table. */
  minTempC: number;
  maxTempC: number;
  flammable: boolean;
  /** ASHRAE Standard 34 safety group. */
  safetyClass: string;
  /** The refrigerant's kind: it decides the venting rules and which oils mix with it. */
  chemistry: RefrigerantChemistry;
}

/** Hydrofluorocarbon, hydrofluoro-olefin, chlorofluorocarbon, or a natural refrigerant (CO₂). */
export type RefrigerantChemistry = "HFC" | "HFO" | "CFC" | "natural";

export interface SaturationTableData {
  id: string;
  name: string;
  source: string;
  criticalTempC: number;
  criticalPressureKpaAbs: number;
  normalBoilingPointC: number | null;
  minTempC: number;
  maxTempC: number;
  tempC: number[];
  pressureKpaAbs: number[];
}

/**
 * The saturation tables, built when this module loads from the published vapour-pressure equations
 * (data/refrigerants/equations.ts) by the code that wrote the committed data/refrigerants/*.json files:
 * the same grid and the same values (catalog.test.ts compares them number for number, tables.test.ts
 * the files with the equations). A few coefficients travel to the browser instead of some 40 kB of
 * numbers, and a few milliseconds of arithmetic at load replace the download.
 */
export const SATURATION_TABLES: Readonly<Record<RefrigerantId, SaturationTableData>> = (() => {
  // The equations name their refrigerant by its designation (data/ imports nothing from lib/refrigerants).
  const tables: Partial<Record<string, SaturationTableData>> = Object.fromEntries(
    VAPOUR_PRESSURE_EQUATIONS.map((eq) => [eq.id, buildSaturationTable(eq)]),
  );
  for (const id of REFRIGERANT_IDS)
    if (!tables[id]) throw new TypeError(`No vapour-pressure equation for ${id}.`);
  return tables as Record<RefrigerantId, SaturationTableData>;
})();

// ASHRAE Standard 34 safety groups (from memory): only R-1234yf is flammable (A2L, mildly flammable).
const SAFETY: Record<
  RefrigerantId,
  { safetyClass: string; flammable: boolean; chemistry: RefrigerantChemistry }
> = {
  "R-134a": { safetyClass: "A1", flammable: false, chemistry: "HFC" },
  "R-1234yf": { safetyClass: "A2L", flammable: true, chemistry: "HFO" },
  "R-744": { safetyClass: "A1", flammable: false, chemistry: "natural" },
  "R-12": { safetyClass: "A1", flammable: false, chemistry: "CFC" },
};

const INFO = Object.fromEntries(
  REFRIGERANT_IDS.map((id): [RefrigerantId, RefrigerantInfo] => {
    const table = SATURATION_TABLES[id];
    return [
      id,
      Object.freeze({
        id,
        name: table.name,
        criticalTempC: table.criticalTempC,
        criticalPressureKpaAbs: table.criticalPressureKpaAbs,
        normalBoilingPointC: table.normalBoilingPointC,
        minTempC: table.minTempC,
        maxTempC: table.maxTempC,
        ...SAFETY[id],
      }),
    ];
  }),
) as Record<RefrigerantId, RefrigerantInfo>;

export function refrigerantInfo(id: RefrigerantId): RefrigerantInfo {
  const info = INFO[id];
  if (!info) throw new TypeError(`Unknown refrigerant "${String(id)}".`);
  return info;
}

export function isRefrigerantId(value: unknown): value is RefrigerantId {
  return typeof value === "string" && (REFRIGERANT_IDS as readonly string[]).includes(value);
}

/** One of the refrigerants Chillwright offers (not a legacy one a stored row may still hold). */
export function isServiceRefrigerant(value: unknown): value is ServiceRefrigerantId {
  return typeof value === "string" && (SERVICE_REFRIGERANT_IDS as readonly string[]).includes(value);
}
