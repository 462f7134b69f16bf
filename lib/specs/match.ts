import { type SpecRow, normaliseName } from "./schema";

export interface VehicleForMatch {
  year: number;
  make: string;
  model: string;
  engine?: string | null;
  /** when known from the vehicle; otherwise the technician picks between variants */
  rearAc?: boolean | null;
}

export interface SpecMatch<T extends SpecRow = SpecRow> {
  row: T;
  score: number;
  reasons: string[];
}

function tokens(text: string): string[] {
  return normaliseName(text).split(" ").filter(Boolean);
}

const compact = (text: string) => normaliseName(text).replace(/ /g, "");

/** "2.5L Hybrid", "V6 3.5 l" → ["2.5", "hybrid"], ["v6", "3.5"]: displacements keep their decimal point. */
function engineTokens(text: string): string[] {
  return (text.toLowerCase().match(/\d+\.\d+|v\d+|\d+|\p{L}{2,}/gu) ?? []).filter((t) => t !== "l");
}

/**
 * Rows that could apply to the vehicle, best first. Make and year must fit; the model must
 * match or be the start of the vehicle's model ("Sierra" for "Sierra 1500"). Every
 * candidate is offered: the technician confirms which one the label agrees with, because
 * the same model can carry different charges with and without rear A/C.
 */
export function matchSpecRows<T extends SpecRow>(
  vehicle: VehicleForMatch,
  rows: readonly T[],
): SpecMatch<T>[] {
  const make = compact(vehicle.make);
  const modelCompact = compact(vehicle.model);
  const modelTokens = tokens(vehicle.model);
  const vehicleEngine = new Set(engineTokens(vehicle.engine ?? ""));
  const matches: SpecMatch<T>[] = [];
  for (const row of rows) {
    if (compact(row.make) !== make) continue;
    if (vehicle.year < row.yearFrom || vehicle.year > row.yearTo) continue;
    const reasons: string[] = [`${row.yearFrom}–${row.yearTo} covers ${vehicle.year}`];
    let score = 0;
    const rowModelTokens = tokens(row.model);
    if (compact(row.model) === modelCompact) {
      score += 100;
      reasons.push("same model");
    } else if (rowModelTokens.length > 0 && rowModelTokens.every((t, i) => modelTokens[i] === t)) {
      score += 60;
      reasons.push(`model "${row.model}" covers "${vehicle.model}"`);
    } else continue;

    const shared = engineTokens(row.variant).filter((t) => vehicleEngine.has(t));
    if (row.variant === "") reasons.push("row covers every engine");
    else if (shared.length > 0) {
      score += 20 + shared.length;
      reasons.push(`engine matches "${row.variant}"`);
    } else if (vehicleEngine.size > 0) {
      score -= 10;
      reasons.push(`variant "${row.variant}" does not mention the vehicle's engine`);
    }

    if (vehicle.rearAc != null) {
      if (row.rearAc === vehicle.rearAc) {
        score += 30;
        reasons.push(row.rearAc ? "front and rear A/C, as the vehicle" : "front A/C only, as the vehicle");
      } else {
        score -= 50;
        reasons.push(
          row.rearAc
            ? "row is for front and rear A/C; the vehicle is front only"
            : "row is front only; the vehicle has rear A/C",
        );
      }
    } else {
      reasons.push(
        row.rearAc
          ? "front and rear A/C: check for a rear unit"
          : "front A/C only: check there is no rear unit",
      );
    }
    matches.push({ row, score, reasons });
  }
  return matches.sort((a, b) => b.score - a.score || a.row.labelChargeG - b.row.labelChargeG);
}
