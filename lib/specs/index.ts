export {
  LABEL_CHARGE_RANGE_G,
  MODEL_YEAR_RANGE,
  TOTAL_OIL_RANGE_ML,
  type SpecRow,
  normaliseName,
  specMatchKey,
  specRowKey,
  specRowSchema,
} from "./schema";
export { type ParsedSpecRow, type SpecCsvOptions, type SpecCsvParse, parseSpecCsv } from "./parse-csv";
export { specRowsToCsv } from "./export-csv";
export { type SpecMatch, type VehicleForMatch, matchSpecRows } from "./match";
export { parseRefrigerantName } from "./refrigerant-names";
