import "server-only";
import type { Transaction } from "sequelize";
import { getModels, type CylinderKind } from "@/models";
import { AppError } from "@/lib/errors";
import { recordAudit } from "./audit";
import type { RefrigerantId } from "@/lib/refrigerants";
import {
  type Cylinder as LedgerCylinder,
  type CylinderMovement,
  type MovementType,
  applyMovements,
} from "@/lib/service/ledger";
import { monthlyReport, toCsv } from "@/lib/service/ledger-report";
import type { CreateCylinderInput, CylinderDto } from "@/lib/contracts/cylinders";
import type { LedgerReportResponse, ManualMovementInput, MovementDto } from "@/lib/contracts/ledger";

type CylinderRow = {
  id: number;
  label: string;
  serial: string | null;
  refrigerant: RefrigerantId;
  kind: CylinderKind;
  tareG: number;
  capacityG: number;
  initialNetG: number;
  retiredAt: Date | null;
};
type MovementRow = {
  id: number;
  cylinderId: number;
  caseId: number | null;
  serviceRecordId: number | null;
  technicianId: string;
  type: MovementType;
  refrigerant: RefrigerantId;
  massG: number;
  occurredAt: Date;
  reversesId: number | null;
  destination: string | null;
  note: string | null;
};

export function toLedgerCylinder(c: CylinderRow): LedgerCylinder {
  return {
    id: String(c.id),
    refrigerant: c.refrigerant,
    kind: c.kind === "recovery" ? "recovery" : "supply",
    capacityG: c.capacityG,
    tareG: c.tareG,
    initialNetG: c.initialNetG,
  };
}

export function toLedgerMovement(m: MovementRow): CylinderMovement {
  return {
    id: String(m.id),
    cylinderId: String(m.cylinderId),
    type: m.type,
    massG: m.massG,
    at: new Date(m.occurredAt).toISOString(),
    technicianId: m.technicianId,
    refrigerant: m.refrigerant,
    ...(m.serviceRecordId ? { serviceRecordId: String(m.serviceRecordId) } : {}),
    ...(m.reversesId ? { reverses: String(m.reversesId) } : {}),
    ...(m.destination ? { destination: m.destination } : {}),
  };
}

async function movementRows(shopId: number, transaction?: Transaction): Promise<MovementRow[]> {
  const rows = await getModels().RefrigerantMovement.findAll({
    where: { shopId },
    order: [
      ["occurredAt", "ASC"],
      ["id", "ASC"],
    ],
    raw: true,
    transaction,
  });
  return rows as unknown as MovementRow[];
}

/** Cylinders with their contents replayed from the ledger. */
export async function listCylinders({
  shopId,
  includeRetired = true,
  transaction,
}: {
  shopId: number;
  includeRetired?: boolean;
  transaction?: Transaction;
}): Promise<CylinderDto[]> {
  const rows = (await getModels().Cylinder.findAll({
    where: { shopId },
    order: [["label", "ASC"]],
    raw: true,
    transaction,
  })) as unknown as CylinderRow[];
  const movements = (await movementRows(shopId, transaction)).map(toLedgerMovement);
  return rows
    .filter((c) => includeRetired || !c.retiredAt)
    .map((c) => {
      const own = movements.filter((m) => m.cylinderId === String(c.id));
      // A correction always cancels a movement of the same cylinder, so `own` holds both ends of it.
      const state = applyMovements(toLedgerCylinder(c), own);
      return {
        id: c.id,
        label: c.label,
        serial: c.serial,
        refrigerant: c.refrigerant,
        kind: c.kind,
        tareG: c.tareG,
        capacityG: c.capacityG,
        initialNetG: c.initialNetG,
        retired: Boolean(c.retiredAt),
        netG: state.netG,
        grossG: state.grossG,
        fillPct: state.fill.fillPct,
        limitPct: state.fill.limitPct,
        fillMessage: state.fill.message,
        problems: state.problems,
      };
    });
}

export async function createCylinder({
  shopId,
  actorId,
  input,
}: {
  shopId: number;
  actorId: string;
  input: CreateCylinderInput;
}): Promise<CylinderDto> {
  const { Cylinder, sequelize } = getModels();
  return sequelize.transaction(async (transaction) => {
    if (await Cylinder.findOne({ where: { shopId, label: input.label }, attributes: ["id"], transaction })) {
      throw new AppError("conflict:cylinder", "Another cylinder already has this label.", {
        fieldErrors: { label: ["Already used by another cylinder."] },
      });
    }
    const row = await Cylinder.create({ ...input, serial: input.serial ?? null, shopId }, { transaction });
    await recordAudit({
      shopId,
      actorId,
      entity: "cylinder",
      entityId: row.id,
      action: "created",
      transaction,
    });
    const created = (await listCylinders({ shopId, transaction })).find((c) => c.id === row.id);
    if (!created) throw new AppError("not_found:cylinder");
    return created;
  });
}

export async function setCylinderRetired({
  shopId,
  actorId,
  id,
  retired,
}: {
  shopId: number;
  actorId: string;
  id: number;
  retired: boolean;
}): Promise<CylinderDto> {
  const { Cylinder, sequelize } = getModels();
  return sequelize.transaction(async (transaction) => {
    const row = await Cylinder.findOne({ where: { id, shopId }, transaction });
    if (!row) throw new AppError("not_found:cylinder", "No such cylinder in this shop.");
    await row.update({ retiredAt: retired ? (row.retiredAt ?? new Date()) : null }, { transaction });
    await recordAudit({
      shopId,
      actorId,
      entity: "cylinder",
      entityId: row.id,
      action: retired ? "retired" : "reactivated",
      transaction,
    });
    const updated = (await listCylinders({ shopId, transaction })).find((c) => c.id === id);
    if (!updated) throw new AppError("not_found:cylinder");
    return updated;
  });
}

type MovementWithNames = MovementRow & { Cylinder: { label: string }; technician: { name: string } };

function movementIncludes() {
  const { Cylinder, User } = getModels();
  return [
    { model: Cylinder, attributes: ["label"] },
    { model: User, as: "technician", attributes: ["name"] },
  ];
}

/** The ids of the corrections cancelling any of `ids` (one query, only for the lines asked about). */
async function reversalsOf(
  shopId: number,
  ids: number[],
  transaction?: Transaction,
): Promise<Map<number, number>> {
  const reversedBy = new Map<number, number>();
  if (ids.length === 0) return reversedBy;
  const rows = await getModels().RefrigerantMovement.findAll({
    where: { shopId, reversesId: ids },
    attributes: ["id", "reversesId"],
    raw: true,
    transaction,
  });
  for (const r of rows) if (r.reversesId) reversedBy.set(r.reversesId, r.id);
  return reversedBy;
}

function toMovementDto(m: MovementWithNames, reversedBy: Map<number, number>): MovementDto {
  return {
    id: m.id,
    cylinderId: m.cylinderId,
    cylinderLabel: m.Cylinder.label,
    caseId: m.caseId,
    serviceRecordId: m.serviceRecordId,
    technicianId: m.technicianId,
    technician: m.technician.name,
    type: m.type,
    refrigerant: m.refrigerant,
    massG: m.massG,
    occurredAt: new Date(m.occurredAt).toISOString(),
    reversesId: m.reversesId,
    reversedById: reversedBy.get(m.id) ?? null,
    destination: m.destination,
    note: m.note,
  };
}

export async function listMovements({
  shopId,
  cylinderId,
  limit = 200,
}: {
  shopId: number;
  cylinderId?: number;
  limit?: number;
}): Promise<MovementDto[]> {
  const rows = await getModels().RefrigerantMovement.findAll({
    where: { shopId, ...(cylinderId ? { cylinderId } : {}) },
    include: movementIncludes(),
    order: [
      ["occurredAt", "DESC"],
      ["id", "DESC"],
    ],
    limit,
  });
  const plain = rows.map((r) => r.get({ plain: true }) as unknown as MovementWithNames);
  const reversedBy = await reversalsOf(
    shopId,
    plain.map((m) => m.id),
  );
  return plain.map((m) => toMovementDto(m, reversedBy));
}

/** One ledger line by id, however old; not_found when it is missing or another shop's. */
export async function getMovement({
  shopId,
  id,
  transaction,
}: {
  shopId: number;
  id: number;
  transaction?: Transaction;
}): Promise<MovementDto> {
  const row = await getModels().RefrigerantMovement.findOne({
    where: { shopId, id },
    include: movementIncludes(),
    transaction,
  });
  if (!row) throw new AppError("not_found:movement", "No such ledger line in this shop.");
  const m = row.get({ plain: true }) as unknown as MovementWithNames;
  return toMovementDto(m, await reversalsOf(shopId, [m.id], transaction));
}

export async function postManualMovement({
  shopId,
  technicianId,
  input,
}: {
  shopId: number;
  technicianId: string;
  input: ManualMovementInput;
}): Promise<MovementDto> {
  const { Cylinder, RefrigerantMovement } = getModels();
  const cylinder = await Cylinder.findOne({ where: { id: input.cylinderId, shopId }, raw: true });
  if (!cylinder)
    throw new AppError("bad_request:movement", "Choose one of the shop's cylinders.", {
      fieldErrors: { cylinderId: ["Not a cylinder of this shop."] },
    });
  if (cylinder.retiredAt)
    throw new AppError("conflict:cylinder", "This cylinder is retired; reactivate it before posting to it.");
  const row = await RefrigerantMovement.create({
    shopId,
    cylinderId: cylinder.id,
    technicianId,
    type: input.type,
    refrigerant: cylinder.refrigerant,
    massG: input.massG,
    occurredAt: input.occurredAt ? new Date(input.occurredAt) : new Date(),
    destination: input.destination || null,
    note: input.note || null,
  });
  // By id: a backdated line may be older than any page of the newest lines.
  return getMovement({ shopId, id: row.id });
}

/** Recovered, recycled, charged and sent out per month × technician × refrigerant, in the shop's time zone. */
export async function ledgerReport({
  shopId,
}: {
  shopId: number;
}): Promise<LedgerReportResponse & { csv: string }> {
  const { Shop, User } = getModels();
  const shop = await Shop.findOne({ where: { id: shopId }, attributes: ["timeZone"], raw: true });
  const timeZone = shop?.timeZone ?? "UTC";
  const users = await User.findAll({ where: { shopId }, attributes: ["id", "name"], raw: true });
  const names = Object.fromEntries(users.map((u) => [u.id, u.name]));
  const report = monthlyReport((await movementRows(shopId)).map(toLedgerMovement), { timeZone });
  return {
    rows: report.map((r) => ({ ...r, technician: names[r.technicianId] ?? r.technicianId })),
    csv: toCsv(report, { technicianNames: names }),
    timeZone,
  };
}
