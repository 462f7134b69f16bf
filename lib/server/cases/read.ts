import "server-only";
import { getModels } from "@/models";
import type { CaseDetail, CaseListItem, CaseListResponse, CaseStatus } from "@/lib/contracts/cases";
import { pageOf } from "../paging";
import { AppError } from "@/lib/errors";
import { conclusionWritersOf } from "./load";
import type { Role } from "@/lib/auth/roles";
import { interviewRecordWithFigures } from "../case-figures";

type VehicleRow = {
  year: number;
  make: string;
  model: string;
  engine: string | null;
  refrigerant: string;
  expansionDevice: string;
} | null;

function describeVehicle(v: VehicleRow): string | null {
  return v ? `${v.year} ${v.make} ${v.model}${v.engine ? ` ${v.engine}` : ""}` : null;
}

function includes() {
  const { Vehicle, Customer, User } = getModels();
  return [
    { model: Vehicle, attributes: ["year", "make", "model", "engine", "refrigerant", "expansionDevice"] },
    { model: Customer, attributes: ["name"] },
    { model: User, as: "technician", attributes: ["name", "role"] },
  ];
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
  const { Case } = getModels();
  const rows = await Case.findAll({
    where: { shopId, ...(status ? { status } : {}) },
    // What a list line shows: not the interview record, the findings or the notes of fifty cases.
    attributes: ["id", "status", "complaint", "updatedAt", "vehicleId", "customerId", "technicianId"],
    include: includes(),
    order: [
      ["updatedAt", "DESC"],
      ["id", "DESC"],
    ],
    limit: limit + 1,
    offset,
  });
  const page = pageOf(rows, { limit, offset });
  return { cases: page.items.map(toListItem), nextOffset: page.nextOffset };
}

function toListItem(row: { get(options: { plain: true }): unknown }): CaseListItem {
  const c = row.get({ plain: true }) as Record<string, unknown> & {
    Vehicle: VehicleRow;
    Customer: { name: string } | null;
    technician: { name: string };
  };
  return {
    id: c.id as number,
    status: c.status as CaseStatus,
    complaint: c.complaint as string,
    vehicle: describeVehicle(c.Vehicle),
    customer: c.Customer?.name ?? null,
    technician: c.technician.name,
    updatedAt: (c.updatedAt as Date).toISOString(),
  };
}

export async function getCase({ shopId, caseId }: { shopId: number; caseId: number }): Promise<CaseDetail> {
  const { Case, SignOff, User } = getModels();
  const row = await Case.findOne({
    where: { id: caseId, shopId },
    include: [
      ...includes(),
      {
        model: SignOff,
        as: "signOffs",
        // Joined on the shop too, so the lookup uses sign_off_shop_id_case_id instead of reading
        // every sign-off of every shop.
        where: { shopId },
        required: false,
        include: [{ model: User, as: "reviewer", attributes: ["name"] }],
      },
    ],
    order: [[{ model: SignOff, as: "signOffs" }, "createdAt", "ASC"]],
  });
  if (!row) throw new AppError("not_found:case", "No such case in this shop.");
  const c = row.get({ plain: true }) as unknown as Record<string, unknown> & {
    Vehicle: VehicleRow;
    Customer: { name: string } | null;
    technician: { name: string; role: Role };
    signOffs: { verdict: string; comment: string | null; createdAt: Date; reviewer: { name: string } }[];
  };
  return {
    id: c.id as number,
    status: c.status as CaseStatus,
    complaint: c.complaint as string,
    vehicle: describeVehicle(c.Vehicle),
    customer: c.Customer?.name ?? null,
    technician: c.technician.name,
    technicianId: c.technicianId as string,
    technicianRole: c.technician.role,
    conclusionWriterIds: conclusionWritersOf({ conclusionWriterIds: c.conclusionWriterIds }),
    vehicleId: (c.vehicleId as number | null) ?? null,
    updatedAt: (c.updatedAt as Date).toISOString(),
    refrigerant: c.Vehicle?.refrigerant ?? null,
    expansionDevice: c.Vehicle?.expansionDevice ?? null,
    interviewStep: (c.interviewStep as string | null) ?? null,
    // Each figure typed once is shown from where it lives (lib/server/case-figures/).
    answers: await interviewRecordWithFigures({
      shopId,
      caseId,
      vehicleId: (c.vehicleId as number | null) ?? null,
      interviewRecord: c.answers ?? {},
    }),
    findings: c.findings ?? null,
    engineVersion: (c.engineVersion as string | null) ?? null,
    conclusionCause: (c.conclusionCause as string | null) ?? null,
    conclusionNotes: (c.conclusionNotes as string | null) ?? null,
    confirmedRepair: (c.confirmedRepair as string | null) ?? null,
    version: c.version as number,
    signOffs: c.signOffs.map((s) => ({
      verdict: s.verdict,
      comment: s.comment,
      reviewer: s.reviewer.name,
      createdAt: new Date(s.createdAt).toISOString(),
    })),
  };
}
