import r12Table from "@/data/refrigerants/r-12.json";
import r1234yfTable from "@/data/refrigerants/r-1234yf.json";
import r134aTable from "@/data/refrigerants/r-134a.json";
import r744Table from "@/data/refrigerants/r-744.json";

export type RefrigerantId = "R-134a" | "R-1234yf" | "R-744" | "R-12";

export const REFRIGERANT_IDS: readonly RefrigerantId[] = ["R-134a", "R-1234yf", "R-744", "R-12"];

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
}

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

export const SATURATION_TABLES: Readonly<Record<RefrigerantId, SaturationTableData>> = {
  "R-134a": r134aTable,
  "R-1234yf": r1234yfTable,
  "R-744": r744Table,
  "R-12": r12Table,
};

// ASHRAE Standard 34 safety groups (from memory): only R-1234yf is flammable (A2L, mildly flammable).
const SAFETY: Record<RefrigerantId, { safetyClass: string; flammable: boolean }> = {
  "R-134a": { safetyClass: "A1", flammable: false },
  "R-1234yf": { safetyClass: "A2L", flammable: true },
  "R-744": { safetyClass: "A1", flammable: false },
  "R-12": { safetyClass: "A1", flammable: false },
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
