import Papa from "papaparse";
import type { RefrigerantId } from "@/lib/refrigerants";
import { type MassUnit, massFromG } from "@/lib/units";
import type { CylinderMovement, MovementType } from "./ledger";

export interface MonthlyReportRow {
  /** calendar month in the shop's time zone, "YYYY-MM" */
  month: string;
  technicianId: string;
  refrigerant: RefrigerantId;
  recoveredG: number;
  recycledG: number;
  chargedG: number;
  sentOutG: number;
  adjustmentG: number;
  /** correction lines netted into this row's figures (each cancels a line of this month) */
  corrections: number;
}

const COLUMN: Readonly<Record<MovementType, keyof MonthlyReportRow>> = {
  recovered_into: "recoveredG",
  recycled: "recycledG",
  charged_from: "chargedG",
  sent_out: "sentOutG",
  adjustment: "adjustmentG",
};

const monthFormatters = new Map<string, Intl.DateTimeFormat>();

/** "YYYY-MM" of an instant as the calendar on the shop's wall shows it. */
export function monthInTimeZone(atIso: string, timeZone: string): string {
  let f = monthFormatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-US", { timeZone, year: "numeric", month: "2-digit" });
    monthFormatters.set(timeZone, f);
  }
  const instant = new Date(atIso);
  if (Number.isNaN(instant.getTime())) throw new RangeError(`"${atIso}" is not a date and time`);
  // UTC offsets stay within −12 h … +14 h, so from the 2nd to the 27th (UTC) the local
  // month is the UTC month; only instants near a month's end need the time-zone rules.
  const utcDay = instant.getUTCDate();
  if (utcDay >= 2 && utcDay <= 27)
    return `${instant.getUTCFullYear()}-${String(instant.getUTCMonth() + 1).padStart(2, "0")}`;
  const parts = f.formatToParts(instant);
  const year = parts.find((p) => p.type === "year")?.value;
  const month = parts.find((p) => p.type === "month")?.value;
  return `${year}-${month}`;
}

/**
 * Refrigerant recovered, recycled, charged and sent out per month × technician × refrigerant.
 * A correction counts against the month, technician and refrigerant of the movement it
 * cancels, so a past month's figures show what really happened once corrected.
 */
export function monthlyReport(
  movements: readonly CylinderMovement[],
  opts: { timeZone: string },
): MonthlyReportRow[] {
  const byId = new Map(movements.map((m) => [m.id, m]));
  const rows = new Map<string, MonthlyReportRow>();
  for (const m of movements) {
    const original = m.reverses ? (byId.get(m.reverses) ?? m) : m;
    const month = monthInTimeZone(original.at, opts.timeZone);
    const key = `${month}\u0000${original.technicianId}\u0000${original.refrigerant}`;
    let row = rows.get(key);
    if (!row) {
      row = {
        month,
        technicianId: original.technicianId,
        refrigerant: original.refrigerant,
        recoveredG: 0,
        recycledG: 0,
        chargedG: 0,
        sentOutG: 0,
        adjustmentG: 0,
        corrections: 0,
      };
      rows.set(key, row);
    }
    const column = COLUMN[original.type] as "recoveredG";
    row[column] += m.reverses ? -original.massG : m.massG;
    if (m.reverses) row.corrections += 1;
  }
  return [...rows.values()].sort(
    (a, b) =>
      a.month.localeCompare(b.month) ||
      a.technicianId.localeCompare(b.technicianId) ||
      a.refrigerant.localeCompare(b.refrigerant),
  );
}

/** The CSV's columns; each mass column names its unit ("recovered_lb"), as the reader chose it. */
export function monthlyReportCsvColumns(massUnit: MassUnit = "g"): string[] {
  const mass = (name: string) => `${name}_${massUnit}`;
  return [
    "month",
    "technician",
    "refrigerant",
    mass("recovered"),
    mass("recycled"),
    mass("charged"),
    mass("sent_out"),
    mass("adjustment"),
    "corrections",
  ];
}

/** The columns of a report in grams, the ledger's own unit. */
export const MONTHLY_REPORT_CSV_COLUMNS = monthlyReportCsvColumns("g");

// As the ledger's scale reads: whole grams, kilograms to the gram, ounces to a tenth, pounds to a hundredth.
const CSV_MASS_DECIMALS: Readonly<Record<MassUnit, number>> = { g: 0, kg: 3, oz: 1, lb: 2 };

function massCell(massG: number, unit: MassUnit): number {
  const f = 10 ** CSV_MASS_DECIMALS[unit];
  const value = Math.round(massFromG(massG, unit) * f) / f;
  return Object.is(value, -0) ? 0 : value;
}

/**
 * CSV for the shop's records, every mass in the reader's unit with the unit in its column's name;
 * names starting with = + - @ are defused so a spreadsheet will not run them.
 */
export function toCsv(
  rows: readonly MonthlyReportRow[],
  opts: { technicianNames?: Readonly<Record<string, string>>; massUnit?: MassUnit } = {},
): string {
  const unit = opts.massUnit ?? "g";
  const data = rows.map((r) => [
    r.month,
    opts.technicianNames?.[r.technicianId] ?? r.technicianId,
    r.refrigerant,
    massCell(r.recoveredG, unit),
    massCell(r.recycledG, unit),
    massCell(r.chargedG, unit),
    massCell(r.sentOutG, unit),
    massCell(r.adjustmentG, unit),
    r.corrections,
  ]);
  return Papa.unparse(
    { fields: monthlyReportCsvColumns(unit), data },
    { escapeFormulae: true, newline: "\r\n" },
  );
}
