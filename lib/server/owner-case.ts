import "server-only";
import type { User } from "lucia";
import { caseRefusal, ownerMayViewCase } from "@/lib/cases/rules";
import type { CaseStatus } from "@/lib/contracts/cases";
import { AppError } from "@/lib/errors";
import { isRole } from "@/lib/auth/roles";
import type { ServiceRecordFacts } from "@/lib/owner/case-facts";
import type { ProposalRecord } from "@/lib/owner/summary";
import type { OwnerUnits } from "@/lib/owner/units";
import { getModels } from "@/models";
import { interviewRecordWithFigures } from "./case-figures";

/** A case as the owner-summary code needs it; plain values only. */
export interface OwnerCaseRow {
  id: number;
  shopId: number;
  status: CaseStatus;
  complaint: string;
  technicianId: string;
  technicianRole: string | null;
  answers: unknown;
  findings: unknown;
  conclusionCause: string | null;
  vehicle: string | null;
  customerEmail: string | null;
  shopName: string;
  units: OwnerUnits;
  timeZone: string;
  available: boolean;
}

/**
 * The case scoped to the user's shop (404 otherwise). With forChange, the case's rules must let the
 * user work on it (photos, proposal, owner page): its technician, a senior or the owner (403).
 */
export async function loadCaseForOwner({
  user,
  caseId,
  forChange = false,
}: {
  user: User;
  caseId: number;
  forChange?: boolean;
}): Promise<OwnerCaseRow> {
  const row = await loadOwnerCase({ shopId: user.shopId, caseId });
  const refusal = forChange ? caseRefusal("work_on", user, row) : null;
  if (refusal) throw new AppError(refusal.code, refusal.message);
  return row;
}

export async function loadOwnerCase({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<OwnerCaseRow> {
  const { Case, Vehicle, Customer, User, Shop } = getModels();
  const row = await Case.findOne({
    where: { id: caseId, shopId },
    include: [
      { model: Vehicle, attributes: ["year", "make", "model"] },
      { model: Customer, attributes: ["email"] },
      { model: User, as: "technician", attributes: ["role"] },
      { model: Shop, attributes: ["name", "units", "timeZone"] },
    ],
  });
  if (!row) throw new AppError("not_found:case", "No such case in this shop.");
  const c = row.get({ plain: true }) as unknown as {
    id: number;
    shopId: number;
    status: CaseStatus;
    complaint: string;
    technicianId: string;
    answers: unknown;
    vehicleId: number | null;
    findings: unknown;
    conclusionCause: string | null;
    Vehicle: { year: number; make: string; model: string } | null;
    Customer: { email: string | null } | null;
    technician: { role: string } | null;
    Shop: { name: string; units: OwnerUnits; timeZone: string };
  };
  const technicianRole = c.technician?.role ?? null;
  return {
    id: c.id,
    shopId: c.shopId,
    status: c.status,
    complaint: c.complaint,
    technicianId: c.technicianId,
    technicianRole,
    // The label charge and the service record's figures written in from where they live.
    answers: await interviewRecordWithFigures({
      shopId,
      caseId,
      vehicleId: c.vehicleId,
      interviewRecord: c.answers,
    }),
    findings: c.findings,
    conclusionCause: c.conclusionCause,
    vehicle: c.Vehicle ? `${c.Vehicle.year} ${c.Vehicle.make} ${c.Vehicle.model}` : null,
    customerEmail: c.Customer?.email ?? null,
    shopName: c.Shop.name,
    units: c.Shop.units,
    timeZone: c.Shop.timeZone,
    available: ownerMayViewCase(c.status, isRole(technicianRole) ? technicianRole : null),
  };
}

export async function loadServiceRecordFacts({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<ServiceRecordFacts | null> {
  const record = await getModels().ServiceRecord.findOne({ where: { shopId, caseId } });
  if (!record) return null;
  return {
    labelChargeG: record.labelChargeG ?? null,
    recoveredChargeG: record.recoveredChargeG ?? null,
    chargedG: record.chargedG ?? null,
    holdMinutes: record.holdMinutes ?? null,
    holdPassed: record.holdPassed ?? null,
    oilAddedMl: record.oilAddedMl ?? null,
    partsReplaced: (record.partsReplaced ?? []).map((p) => ({ part: p.part })),
  };
}

/** The case's current proposal: the latest one. */
export async function loadLatestProposal({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<(ProposalRecord & { proposedBy: string; answeredViaLinkId: number | null }) | null> {
  const { RepairProposal, User } = getModels();
  const row = await RepairProposal.findOne({
    where: { shopId, caseId },
    include: [{ model: User, as: "proposer", attributes: ["name"] }],
    order: [
      ["createdAt", "DESC"],
      ["id", "DESC"],
    ],
  });
  if (!row) return null;
  const p = row.get({ plain: true }) as unknown as {
    id: number;
    repairIds: unknown;
    priceMinor: number | null;
    currency: string;
    note: string | null;
    createdAt: Date;
    answer: "approved" | "declined" | null;
    answerNote: string | null;
    answeredAt: Date | null;
    answeredViaLinkId: number | null;
    proposer: { name: string } | null;
  };
  const repairIds = typeof p.repairIds === "string" ? (JSON.parse(p.repairIds) as unknown) : p.repairIds;
  return {
    id: p.id,
    repairIds: Array.isArray(repairIds) ? repairIds.filter((id): id is string => typeof id === "string") : [],
    priceMinor: p.priceMinor,
    currency: p.currency,
    note: p.note,
    createdAt: p.createdAt,
    answer: p.answer,
    answerNote: p.answerNote,
    answeredAt: p.answeredAt,
    proposedBy: p.proposer?.name ?? "",
    answeredViaLinkId: p.answeredViaLinkId,
  };
}
