import mysql from "mysql2/promise";
import { E2E_DB_PORT } from "./e2e-env";

// The e2e server's own throwaway database (scripts/e2e-server.sh).
const E2E_DATABASE = {
  host: "127.0.0.1",
  port: E2E_DB_PORT,
  user: "chillwright",
  password: "chillwright-dev",
  database: "chillwright_e2e",
};

export interface SavedCaseRow {
  status: string;
  interview_step: string | null;
  version: number;
  answers: { answers: Record<string, Record<string, unknown>>; skipped: string[] };
  findings: {
    engineVersion: string;
    suspects: { cause: string; share: number }[];
    input: Record<string, unknown>;
  } | null;
  engine_version: string | null;
  conclusion_cause: string | null;
  /** the case's vehicle's label charge: that figure's one stored home */
  vehicle_label_charge_g: number | null;
}

const parse = (v: unknown) => (typeof v === "string" ? JSON.parse(v) : v);

/** Reads a case straight from MariaDB, to check what the screens saved. */
export async function readCase(caseId: number): Promise<SavedCaseRow> {
  const connection = await mysql.createConnection(E2E_DATABASE);
  try {
    const [rows] = await connection.query(
      `SELECT c.status, c.interview_step, c.version, c.answers, c.findings, c.engine_version, c.conclusion_cause,
              v.label_charge_g AS vehicle_label_charge_g
         FROM service_case c LEFT JOIN vehicle v ON v.id = c.vehicle_id WHERE c.id = ?`,
      [caseId],
    );
    const row = (rows as Record<string, unknown>[])[0];
    if (!row) throw new Error(`case ${caseId} not found`);
    return {
      ...row,
      answers: parse(row.answers),
      findings: parse(row.findings),
    } as SavedCaseRow;
  } finally {
    await connection.end();
  }
}
