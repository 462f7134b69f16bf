import type { GroupId } from "@/lib/interview/steps";

/*
 * The figures a case holds once, whichever screen meets them first: the label charge, the mass
 * recovered, the oil drained with it, the identifier's result (purity and air) and the mass charged.
 * Each has one stored home (lib/server/case-figures/): the label charge is the vehicle's (the label
 * is on the vehicle, and every case of it reads the same label); the others are the service record's
 * once it is started (it posts the masses to the ledger), and the interview's answers until then.
 */
export const CASE_FIGURES = {
  labelChargeG: { group: "system", decimals: 0, label: "Label charge" },
  recoveredChargeG: { group: "chargeAudit", decimals: 0, label: "Recovered mass" },
  oilRemovedMl: { group: "chargeAudit", decimals: 0, label: "Oil drained" },
  purityPct: { group: "identification", decimals: 2, label: "Identifier purity" },
  airPct: { group: "identification", decimals: 2, label: "Identifier air" },
  chargedG: { group: "chargeAudit", decimals: 0, label: "Charged mass" },
} as const satisfies Record<string, { group: GroupId; decimals: number; label: string }>;

/**
 * The most refrigerant one vehicle's recovery or charge may weigh, grams: above it the figure is
 * taken for a unit slip. The interview and the service record both read it. Light-vehicle charges
 * stay far below it (common practice); the larger systems of buses are out of scope.
 */
export const VEHICLE_CHARGE_MASS_MAX_G = 10_000;

export type FigureId = keyof typeof CASE_FIGURES;
export const FIGURE_IDS = Object.keys(CASE_FIGURES) as FigureId[];

/** A figure's value in internal units (g, mL, %); null when the home holds none. */
export type CaseFigures = Record<FigureId, number | null>;

/** Where a figure is stored for this case. */
export type FigureHome = "vehicle" | "service_record" | "interview";

/** Where a change was typed. */
export type FigureSource = "interview" | "service_record";

/** The audit row's detail for a changed figure: old → new, where it was typed and where it is kept. */
export interface FigureChangeDetail {
  [key: string]: string | number | null;
  figure: FigureId;
  from: number | null;
  to: number | null;
  typedIn: FigureSource;
  keptIn: FigureHome;
}
