import "server-only";
import { getModels } from "@/models";
import type { CaseDetail, CaseListResponse, CaseStatus } from "@/lib/contracts/cases";
import { pageOf } from "../paging";
import { AppError } from "@/lib/errors";
import { conclusionWritersOf } from "./load";
import type { Role } from "@/lib/auth/roles";
import { QueryTypes } from "sequelize";
import type { CaseFigures } from "@/lib/contracts/case-figures";
import { interviewRecordWithKept, type RecordFigure } from "../case-figures/homes";
import { jsonColumn } from "@/lib/db/json-column";

type VehicleRow = {
  year: number;
  make: string;
  model: string;
  engine: string | null;
  refrigerant: string;
  expansionDevice: string;
} | null;

function describeVehicle(
  v: Pick<NonNullable<VehicleRow>, "year" | "make" | "model" | "engine"> | null,
): string | null {
  return v ? `${v.year} ${v.make} ${v.model}${v.engine ? ` ${v.engine}` : ""}` : null;
}

/** One page of the shop's cases, most recently changed first (index service_case_shop_updated). */
export async function listCases({
  shopId,
  status,
  limit = 50,
  offset = 0,
}: {
  shopId: number;
  status?: CaseStatus;
  limit?: number;
  offset?: number;
}): Promise<CaseListResponse> {
  // What a list line shows, read as rows: not the interview record, the findings or the notes of
  // fifty cases, and no model built for each only to be turned back into plain data.
  const rows = await getModels().sequelize.query<{
    id: number;
    status: CaseStatus;
    complaint: string;
    updated_at: Date;
    technician: string;
    customer: string | null;
    v_year: number | null;
    v_make: string | null;
    v_model: string | null;
    v_engine: string | null;
  }>(
    `SELECT c.id, c.status, c.complaint, c.updated_at, t.name AS technician, cu.name AS customer,
            v.year AS v_year, v.make AS v_make, v.model AS v_model, v.engine AS v_engine
       FROM service_case c
       JOIN user t ON t.id = c.technician_id
       LEFT JOIN customer cu ON cu.id = c.customer_id
       LEFT JOIN vehicle v ON v.id = c.vehicle_id
      WHERE c.shop_id = :shopId${status ? " AND c.status = :status" : ""}
      ORDER BY c.updated_at DESC, c.id DESC
      LIMIT :limit OFFSET :offset`,
    { replacements: { shopId, status: status ?? null, limit: limit + 1, offset }, type: QueryTypes.SELECT },
  );
  const page = pageOf(rows, { limit, offset });
  return {
    cases: page.items.map((c) => ({
      id: c.id,
      status: c.status,
      complaint: c.complaint,
      vehicle:
        c.v_make !== null
          ? describeVehicle({
              year: Number(c.v_year),
              make: c.v_make,
              model: c.v_model ?? "",
              engine: c.v_engine,
            })
          : null,
      customer: c.customer ?? null,
      technician: c.technician,
      updatedAt: new Date(c.updated_at).toISOString(),
    })),
    nextOffset: page.nextOffset,
  };
}

type CaseReadRow = {
  id: number;
  status: CaseStatus;
  complaint: string;
  technician_id: string;
  conclusion_writer_ids: unknown;
  vehicle_id: number | null;
  updated_at: Date;
  interview_step: string | null;
  answers: unknown;
  findings: unknown;
  engine_version: string | null;
  conclusion_cause: string | null;
  conclusion_notes: string | null;
  confirmed_repair: string | null;
  version: number;
  technician: string;
  technician_role: Role;
  customer: string | null;
  v_id: number | null;
  v_year: number | null;
  v_make: string | null;
  v_model: string | null;
  v_engine: string | null;
  v_refrigerant: string | null;
  v_expansion_device: string | null;
  v_label_charge_g: number | null;
  has_record: number | null;
} & Record<(typeof RECORD_FIGURE_COLUMNS)[number][1], number | string | null>;

/** The service record's columns of the figures it keeps (lib/server/case-figures/homes.ts). */
const RECORD_FIGURE_COLUMNS = [
  ["recoveredChargeG", "r_recovered_charge_g"],
  ["oilRemovedMl", "r_oil_removed_ml"],
  ["purityPct", "r_purity_pct"],
  ["airPct", "r_air_pct"],
  ["chargedG", "r_charged_g"],
] as const satisfies readonly (readonly [RecordFigure, string])[];

const toNumber = (v: number | string | null | undefined) =>
  v === null || v === undefined ? null : Number(v);

/**
 * One case as its page and the API show it. Two reads side by side, each scoped to the shop: the case
 * with its vehicle, customer, technician and the figures its service record keeps (one row), and its
 * sign-offs oldest first. Rows, not models: nothing here is written back.
 */
export async function getCase({ shopId, caseId }: { shopId: number; caseId: number }): Promise<CaseDetail> {
  const { sequelize } = getModels();
  const [rows, signOffs] = await Promise.all([
    sequelize.query<CaseReadRow>(
      `SELECT c.id, c.status, c.complaint, c.technician_id, c.conclusion_writer_ids, c.vehicle_id, c.updated_at,
              c.interview_step, c.answers, c.findings, c.engine_version, c.conclusion_cause,
              c.conclusion_notes, c.confirmed_repair, c.version,
              t.name AS technician, t.role AS technician_role, cu.name AS customer,
              v.id AS v_id, v.year AS v_year, v.make AS v_make, v.model AS v_model, v.engine AS v_engine,
              v.refrigerant AS v_refrigerant, v.expansion_device AS v_expansion_device,
              v.label_charge_g AS v_label_charge_g,
              r.id AS has_record, ${RECORD_FIGURE_COLUMNS.map(([, alias]) => `r.${alias.slice(2)} AS ${alias}`).join(", ")}
         FROM service_case c
         JOIN user t ON t.id = c.technician_id
         LEFT JOIN customer cu ON cu.id = c.customer_id
         LEFT JOIN vehicle v ON v.id = c.vehicle_id AND v.shop_id = c.shop_id
         LEFT JOIN service_record r ON r.shop_id = c.shop_id AND r.case_id = c.id
        WHERE c.shop_id = :shopId AND c.id = :caseId`,
      { replacements: { shopId, caseId }, type: QueryTypes.SELECT },
    ),
    sequelize.query<{ verdict: string; comment: string | null; created_at: Date; reviewer: string }>(
      // sign_off_shop_id_case_id: the shop's sign-offs of this case only.
      `SELECT s.verdict, s.comment, s.created_at, u.name AS reviewer
         FROM sign_off s
         JOIN user u ON u.id = s.reviewer_id
        WHERE s.shop_id = :shopId AND s.case_id = :caseId
        ORDER BY s.created_at, s.id`,
      { replacements: { shopId, caseId }, type: QueryTypes.SELECT },
    ),
  ]);
  const c = rows[0];
  if (!c) throw new AppError("not_found:case", "No such case in this shop.");
  const vehicle: VehicleRow =
    c.v_id !== null
      ? {
          year: Number(c.v_year),
          make: c.v_make ?? "",
          model: c.v_model ?? "",
          engine: c.v_engine,
          refrigerant: c.v_refrigerant ?? "",
          expansionDevice: c.v_expansion_device ?? "",
        }
      : null;
  // Each figure typed once is shown from where it lives (lib/server/case-figures/).
  const kept: Partial<CaseFigures> = {};
  if (c.v_id !== null) kept.labelChargeG = toNumber(c.v_label_charge_g);
  if (c.has_record !== null) for (const [id, alias] of RECORD_FIGURE_COLUMNS) kept[id] = toNumber(c[alias]);
  return {
    id: c.id,
    status: c.status,
    complaint: c.complaint,
    vehicle: describeVehicle(vehicle),
    customer: c.customer ?? null,
    technician: c.technician,
    technicianId: c.technician_id,
    technicianRole: c.technician_role,
    conclusionWriterIds: conclusionWritersOf({ conclusionWriterIds: c.conclusion_writer_ids }),
    vehicleId: c.vehicle_id ?? null,
    updatedAt: new Date(c.updated_at).toISOString(),
    refrigerant: vehicle?.refrigerant ?? null,
    expansionDevice: vehicle?.expansionDevice ?? null,
    interviewStep: c.interview_step ?? null,
    answers: interviewRecordWithKept(jsonColumn(c.answers) ?? {}, kept),
    findings: jsonColumn(c.findings),
    engineVersion: c.engine_version ?? null,
    conclusionCause: c.conclusion_cause ?? null,
    conclusionNotes: c.conclusion_notes ?? null,
    confirmedRepair: c.confirmed_repair ?? null,
    version: c.version,
    signOffs: signOffs.map((s) => ({
      verdict: s.verdict,
      comment: s.comment,
      reviewer: s.reviewer,
      createdAt: new Date(s.created_at).toISOString(),
    })),
  };
}
