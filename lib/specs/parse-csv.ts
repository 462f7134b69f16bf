import type { CompressorType } from "@/lib/vehicles/compressor-types";
import Papa from "papaparse";
import { isServiceRefrigerant, SERVICE_REFRIGERANTS_IN_WORDS } from "@/lib/refrigerants/catalog";
import type { MassUnit, VolumeUnit } from "@/lib/units";
import {
  cleanCell,
  parseChargeCell,
  parseOilCell,
  parseRearAc,
  parseYear,
  parseYearRange,
} from "./csv-cells";
import {
  type ColumnRole,
  FIELD_COLUMN_NAMES,
  type SpecField,
  columnRole,
  massUnitFromWord,
  unitsFromWord,
  volumeUnitFromWord,
} from "./csv-columns";
import { parseRefrigerantName } from "./refrigerant-names";
import { findDuplicatesAndOverlaps } from "./duplicates";
import { LABEL_CHARGE_RANGE_G, TOTAL_OIL_RANGE_ML, type SpecRow, specRowSchema } from "./schema";

export interface ParsedSpecRow {
  /** physical line in the file where the row starts (the header is line 1 in most files) */
  line: number;
  /** present when every cell could be read; save the row only when `problems` is empty */
  values?: SpecRow;
  problems: string[];
  /** worth a look but not blocking, e.g. overlapping year ranges */
  warnings: string[];
}

export interface SpecCsvParse {
  rows: ParsedSpecRow[];
  fileProblems: string[];
  ignoredColumns: string[];
  delimiter: string;
}

export interface SpecCsvOptions {
  /** units for bare numbers when neither header nor cell says (default g and mL) */
  units?: { charge?: MassUnit; oil?: VolumeUnit };
  /** rows already in the shop's table: importing one again is flagged */
  existing?: readonly SpecRow[];
  maxRows?: number;
}

const REQUIRED: readonly SpecField[] = ["make", "model", "rearAc", "refrigerant", "labelCharge", "oilType"];

function guessDelimiter(text: string): string {
  const firstLine = (text.split(/\r?\n/).find((l) => l.trim() !== "") ?? "").replace(/"[^"]*"/g, "");
  const counts = [",", ";", "\t"].map((d) => [d, firstLine.split(d).length - 1] as const);
  const best = counts.reduce((a, b) => (b[1] > a[1] ? b : a));
  return best[1] > 0 ? best[0] : ",";
}

function readRecords(text: string, delimiter: string): { cells: string[]; line: number }[] {
  const records: { cells: string[]; line: number }[] = [];
  let start = 0;
  let line = 1;
  Papa.parse<string[]>(text, {
    delimiter,
    step: (result) => {
      const end = result.meta.cursor;
      const cells = result.data;
      if (cells.some((c) => c.trim() !== "")) records.push({ cells, line });
      // line ends are all \n by now (parseSpecCsv), so each one is a physical line
      for (let i = start; i < end; i++) if (text.charCodeAt(i) === 10) line++;
      start = end;
    },
  });
  return records;
}

/** Read a spec-table CSV into rows with their problems, for a preview before anything is saved. */
export function parseSpecCsv(text: string, options: SpecCsvOptions = {}): SpecCsvParse {
  // \r\n and a lone \r (old spreadsheet exports) each end one line, and a file pasted together from two
  // exports can mix them: one line end before parsing, or a \r\n split at its \r starts a cell with \n.
  const body = text.replace(/^\uFEFF/, "").replace(/\r\n?/g, "\n");
  const delimiter = guessDelimiter(body);
  const fileProblems: string[] = [];
  const records = readRecords(body, delimiter);
  const header = records.shift();
  if (!header) return { rows: [], fileProblems: ["The file is empty."], ignoredColumns: [], delimiter };

  const roles = new Map<SpecField, { index: number; role: ColumnRole }>();
  const ignoredColumns: string[] = [];
  header.cells.forEach((name, index) => {
    const role = columnRole(name);
    if (!role) {
      if (name.trim()) ignoredColumns.push(name.trim());
      return;
    }
    if (roles.has(role.field))
      fileProblems.push(`Two columns give ${FIELD_COLUMN_NAMES[role.field]}: keep one.`);
    else roles.set(role.field, { index, role });
  });
  const hasYears = (roles.has("yearFrom") && roles.has("yearTo")) || roles.has("year") || roles.has("years");
  const missing = [
    ...REQUIRED.filter((f) => !roles.has(f)).map((f) => FIELD_COLUMN_NAMES[f]),
    ...(hasYears ? [] : ["year_from and year_to"]),
  ];
  if (missing.length > 0)
    fileProblems.push(`Missing column${missing.length > 1 ? "s" : ""}: ${missing.join(", ")}.`);

  const maxRows = options.maxRows ?? 5000;
  if (records.length > maxRows)
    fileProblems.push(`The file has ${records.length} rows; import at most ${maxRows} at a time.`);

  const rows = records.slice(0, maxRows).map(({ cells, line }) => {
    const problems: string[] = [];
    if (missing.length > 0)
      problems.push(`missing column${missing.length > 1 ? "s" : ""}: ${missing.join(", ")}`);
    if (cells.length > header.cells.length)
      problems.push("more cells than the header has columns (an unquoted comma?)");
    const shortOf = [...roles.entries()].filter(
      ([, c]) => c.index >= cells.length && REQUIRED.includes(c.role.field),
    );
    if (shortOf.length > 0)
      problems.push(`missing columns: ${shortOf.map(([f]) => FIELD_COLUMN_NAMES[f]).join(", ")}`);
    const get = (f: SpecField) => {
      const c = roles.get(f);
      return c ? cleanCell(cells[c.index]) : "";
    };
    const values = readValues(get, roles, options, problems, delimiter === ";");
    const row: ParsedSpecRow = { line, values, problems, warnings: [] };
    return row;
  });

  findDuplicatesAndOverlaps(rows, options.existing ?? []);
  return { rows, fileProblems, ignoredColumns, delimiter };
}

function readValues(
  get: (f: SpecField) => string,
  roles: Map<SpecField, { index: number; role: ColumnRole }>,
  options: SpecCsvOptions,
  problems: string[],
  decimalComma: boolean,
): SpecRow | undefined {
  const before = problems.length;
  let yearFrom: number | null = null;
  let yearTo: number | null = null;
  if (roles.has("yearFrom") || roles.has("yearTo")) {
    yearFrom = parseYear(get("yearFrom"));
    yearTo = parseYear(get("yearTo"));
    if (yearFrom === null) problems.push(`year_from "${get("yearFrom")}" is not a four-digit year`);
    if (yearTo === null) problems.push(`year_to "${get("yearTo")}" is not a four-digit year`);
  } else {
    const field = roles.has("years") ? "years" : "year";
    const range = parseYearRange(get(field));
    if (range) ({ from: yearFrom, to: yearTo } = range);
    else
      problems.push(`${FIELD_COLUMN_NAMES[field]} "${get(field)}" is not a year or a range like 2015-2019`);
  }
  if (yearFrom !== null && yearTo !== null && yearFrom > yearTo)
    problems.push(`the first year is after the last (${yearFrom} to ${yearTo})`);

  for (const f of ["make", "model", "oilType"] as const)
    if (get(f) === "") problems.push(`${FIELD_COLUMN_NAMES[f]} is missing`);

  const rearAc = parseRearAc(get("rearAc"));
  if (rearAc === null)
    problems.push(`rear_ac "${get("rearAc")}" should be yes (front and rear A/C) or no (front only)`);

  const named = parseRefrigerantName(get("refrigerant"));
  const refrigerant = isServiceRefrigerant(named) ? named : null;
  if (!named)
    problems.push(`unknown refrigerant "${get("refrigerant")}" (use ${SERVICE_REFRIGERANTS_IN_WORDS})`);
  else if (!refrigerant)
    problems.push(`${named} is not covered: the spec table takes ${SERVICE_REFRIGERANTS_IN_WORDS}`);

  const rowUnits = get("units") ? unitsFromWord(get("units")) : null;
  if (get("units") && !rowUnits)
    problems.push(`units "${get("units")}" should be metric, us, or a pair like oz/floz`);
  const rowChargeUnit = get("chargeUnit") ? massUnitFromWord(get("chargeUnit")) : null;
  if (get("chargeUnit") && !rowChargeUnit)
    problems.push(`charge_unit "${get("chargeUnit")}" should be g, kg, oz or lb`);
  const rowOilUnit = get("oilUnit") ? volumeUnitFromWord(get("oilUnit")) : null;
  if (get("oilUnit") && !rowOilUnit) problems.push(`oil_unit "${get("oilUnit")}" should be mL or fl oz`);

  let labelChargeG: number | null = null;
  if (get("labelCharge") === "") problems.push("label charge is missing");
  else {
    const headerUnit = roles.get("labelCharge")?.role.unit as MassUnit | undefined;
    const charge = parseChargeCell(
      get("labelCharge"),
      [headerUnit, rowChargeUnit ?? rowUnits?.charge],
      options.units?.charge ?? "g",
      decimalComma,
    );
    if ("problem" in charge) problems.push(charge.problem);
    else {
      labelChargeG = Math.round(charge.valueInBase);
      if (labelChargeG < LABEL_CHARGE_RANGE_G.min || labelChargeG > LABEL_CHARGE_RANGE_G.max) {
        problems.push(
          `label charge ${labelChargeG} g is outside ${LABEL_CHARGE_RANGE_G.min}–${LABEL_CHARGE_RANGE_G.max} g: check the unit`,
        );
      }
    }
  }

  let totalOilMl: number | null = null;
  if (get("totalOil") !== "") {
    const headerUnit = roles.get("totalOil")?.role.unit as VolumeUnit | undefined;
    const oil = parseOilCell(
      get("totalOil"),
      [headerUnit, rowOilUnit ?? rowUnits?.oil],
      options.units?.oil ?? "mL",
      decimalComma,
    );
    if ("problem" in oil) problems.push(oil.problem);
    else {
      totalOilMl = Math.round(oil.valueInBase);
      if (totalOilMl < TOTAL_OIL_RANGE_ML.min || totalOilMl > TOTAL_OIL_RANGE_ML.max) {
        problems.push(
          `total oil ${totalOilMl} mL is outside ${TOTAL_OIL_RANGE_ML.min}–${TOTAL_OIL_RANGE_ML.max} mL: check the unit`,
        );
      }
    }
  }

  const compressorType = parseCompressorType(get("compressorType"));
  if (compressorType === undefined)
    problems.push(
      `compressor_type "${get("compressorType")}" should be cycling clutch, variable displacement or electric (or empty)`,
    );

  if (
    problems.length > before ||
    yearFrom === null ||
    yearTo === null ||
    rearAc === null ||
    !refrigerant ||
    labelChargeG === null
  ) {
    return undefined;
  }
  const parsed = specRowSchema.safeParse({
    yearFrom,
    yearTo,
    make: get("make"),
    model: get("model"),
    variant: get("variant"),
    rearAc,
    refrigerant,
    labelChargeG,
    oilType: get("oilType"),
    totalOilMl,
    ...(compressorType ? { compressorType } : {}),
  });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) problems.push(issue.message);
    return undefined;
  }
  return parsed.data;
}

/** "cycling clutch", "variable", "electric", "" → the engine's compressor type; null when empty, undefined when unknown. */
function parseCompressorType(cell: string): CompressorType | null | undefined {
  const word = cell
    .trim()
    .toLowerCase()
    .replace(/[\s_-]+/g, " ");
  if (word === "") return null;
  if (word.startsWith("cycling") || word === "fixed" || word.startsWith("fixed displacement"))
    return "cycling_clutch";
  if (word.startsWith("variable")) return "variable_displacement";
  if (word.startsWith("electric") || word === "hv" || word.startsWith("high voltage")) return "electric";
  return undefined;
}
