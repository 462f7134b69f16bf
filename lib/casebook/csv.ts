import Papa from "papaparse";
import type { CasebookRow } from "@/lib/contracts/casebook";
import { confirmedCauseLabel } from "./labels";
import { CAUSE_LABELS, type CauseId } from "@/lib/diagnosis/causes";

export const CASEBOOK_CSV_FIELDS = [
  "case",
  "opened_utc",
  "closed_utc",
  "status",
  "vehicle",
  "refrigerant",
  "metering_device",
  "technician",
  "leading_suspect",
  "confirmed_causes",
  "comeback_of_case",
  "came_back_as_case",
  "complaint",
] as const;

function cells(r: CasebookRow): (string | number)[] {
  return [
    r.caseId,
    r.openedAt,
    r.closedAt ?? "",
    r.status,
    r.vehicle ?? "",
    r.refrigerant ?? "",
    r.meteringDevice ?? "",
    r.technician,
    r.leadingSuspect ? (CAUSE_LABELS[r.leadingSuspect as CauseId] ?? r.leadingSuspect) : "",
    r.confirmedCauses.map(confirmedCauseLabel).join("; "),
    r.comebackOfCaseId ?? "",
    r.cameBackCaseId ?? "",
    r.complaint,
  ];
}

/** CSV lines for some rows (with the header first when asked); formulas are defused with an apostrophe. */
export function casebookCsv(rows: readonly CasebookRow[], { header }: { header: boolean }): string {
  const text = Papa.unparse(
    { fields: header ? [...CASEBOOK_CSV_FIELDS] : [], data: rows.map(cells) },
    { escapeFormulae: true, newline: "\r\n", header },
  );
  const lines = text.replace(/(\r\n)+$/, "");
  return lines.length > 0 ? `${lines}\r\n` : "";
}
