import "server-only";
import type { Transaction } from "sequelize";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import type { RefrigerantId } from "@/lib/refrigerants";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import type {
  ServiceCaseContext,
  ServiceRecordDto,
  ServiceRecordResponse,
} from "@/lib/contracts/service-records";
import { recordDto } from "./mapping";
import { caseFigures } from "../case-figures";

export async function getServiceCase({
  shopId,
  caseId,
  transaction,
}: {
  shopId: number;
  caseId: number;
  transaction?: Transaction;
}): Promise<ServiceCaseContext> {
  const { Case, Vehicle } = getModels();
  const row = await Case.findOne({
    where: { id: caseId, shopId },
    include: [{ model: Vehicle }],
    transaction,
  });
  if (!row) throw new AppError("not_found:case", "No such case in this shop.");
  const c = row.get({ plain: true }) as unknown as {
    id: number;
    status: string;
    technicianId: string;
    vehicleId: number | null;
    answers: unknown;
    Vehicle: Record<string, unknown> | null;
  };
  const v = c.Vehicle as {
    year: number;
    make: string;
    model: string;
    engine: string | null;
    refrigerant: RefrigerantId;
    expansionDevice: ExpansionDevice;
    electricCompressor: boolean;
    labelChargeG: number | null;
    oilType: string | null;
  } | null;
  return {
    id: c.id,
    status: c.status,
    technicianId: c.technicianId,
    vehicleId: c.vehicleId,
    vehicle: v ? `${v.year} ${v.make} ${v.model}${v.engine ? ` ${v.engine}` : ""}` : null,
    make: v?.make ?? null,
    model: v?.model ?? null,
    year: v?.year ?? null,
    engine: v?.engine ?? null,
    refrigerant: v?.refrigerant ?? null,
    expansionDevice: v?.expansionDevice ?? null,
    electricCompressor: Boolean(v?.electricCompressor),
    labelChargeG: v?.labelChargeG ?? null,
    oilType: v?.oilType ?? null,
    figures: await caseFigures({
      shopId,
      caseId,
      vehicleId: c.vehicleId ?? null,
      interviewRecord: c.answers,
      transaction,
    }),
  };
}

export async function getServiceRecord({
  shopId,
  caseId,
  transaction,
}: {
  shopId: number;
  caseId: number;
  transaction?: Transaction;
}): Promise<ServiceRecordDto | null> {
  const { ServiceRecord, ReadingSet, User, Case, Vehicle } = getModels();
  const row = await ServiceRecord.findOne({
    where: { shopId, caseId },
    include: [{ model: User, as: "technician", attributes: ["name"] }],
    transaction,
  });
  if (!row) return null;
  // get({ plain: true }) runs the model's getters, so DECIMAL columns come back as numbers.
  const r = row.get({ plain: true }) as unknown as Parameters<typeof recordDto>[0] & {
    technician: { name: string };
  };
  const final = r.finalReadingSetId
    ? await ReadingSet.findOne({ where: { id: r.finalReadingSetId, shopId, caseId }, raw: true, transaction })
    : null;
  const dto = recordDto(r, r.technician.name, final);
  // The label charge is the vehicle's (lib/server/case-figures/); a record keeps no copy of it.
  const caseRow = await Case.findOne({
    where: { id: caseId, shopId },
    attributes: ["id"],
    include: [{ model: Vehicle, attributes: ["labelChargeG"] }],
    transaction,
  });
  const vehicle = caseRow?.get({ plain: true }) as
    { Vehicle?: { labelChargeG: number | null } | null } | undefined;
  return vehicle?.Vehicle ? { ...dto, labelChargeG: vehicle.Vehicle.labelChargeG ?? null } : dto;
}

/** The case as the service record sees it, and its record if one was started (GET /api/cases/[id]/service). */
export async function getServiceRecordView({
  shopId,
  caseId,
}: {
  shopId: number;
  caseId: number;
}): Promise<ServiceRecordResponse> {
  const serviceCase = await getServiceCase({ shopId, caseId });
  return { case: serviceCase, record: await getServiceRecord({ shopId, caseId }) };
}
