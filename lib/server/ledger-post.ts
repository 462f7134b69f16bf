import "server-only";
import type { Transaction } from "sequelize";
import type { User } from "lucia";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import type { RefrigerantId } from "@/lib/refrigerants";
import type { CylinderMovement, MovementType } from "@/lib/service/ledger";
import { checkLedgerChange, ledgerMassUnit, ledgerRefusalMessage } from "@/lib/service/ledger-guard";
import { readerUnitsOf } from "@/lib/units";
import type {
  ManualMovementInput,
  MovementDto,
  ReversalInput,
  ReversalResponse,
} from "@/lib/contracts/ledger";
import { recordAudit } from "./audit";
import { unitChoiceOfRow } from "./profile";
import {
  type CylinderRow,
  cylinderMovementRows,
  getMovement,
  toLedgerCylinder,
  toLedgerMovement,
} from "./ledger";

/** A line about to be posted. `field` names the form field it came from, for the refusal message. */
export interface NewLedgerLine {
  cylinderId: number;
  caseId?: number | null;
  serviceRecordId?: number | null;
  technicianId: string;
  type: MovementType;
  refrigerant: RefrigerantId;
  massG: number;
  occurredAt: Date;
  reversesId?: number | null;
  destination?: string | null;
  note?: string | null;
  field?: string;
}

/** A future date more than this far ahead is a typing mistake, not a clock running a little fast. */
const CLOCK_SKEW_MS = 5 * 60_000;

/**
 * The one way a line reaches the ledger. Inside the caller's transaction: lock every cylinder
 * the lines touch (SELECT … FOR UPDATE, in id order so two posts never deadlock), replay its
 * lines with the new ones, and refuse the lot — nothing posted — when a cylinder would go below
 * empty or past its safe fill at any moment. Then insert. Returns the new lines' ids in order.
 */
export async function postMovements({
  shopId,
  lines,
  transaction,
  readerId,
}: {
  shopId: number;
  lines: NewLedgerLine[];
  transaction: Transaction;
  /** who reads a refusal, in their own units; the first line's technician when not given */
  readerId?: string;
}): Promise<number[]> {
  if (lines.length === 0) return [];
  const { Cylinder, RefrigerantMovement, Shop, User } = getModels();
  const cylinderIds = [...new Set(lines.map((l) => l.cylinderId))].sort((a, b) => a - b);
  const cylinders = new Map<number, CylinderRow>();
  for (const id of cylinderIds) {
    const row = await Cylinder.findOne({
      where: { id, shopId },
      raw: true,
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw new AppError("not_found:cylinder", "No such cylinder in this shop.");
    cylinders.set(id, row as unknown as CylinderRow);
  }
  const existing = (await cylinderMovementRows({ shopId, cylinderIds, transaction, latest: true })).map(
    toLedgerMovement,
  );
  const byId = new Map(existing.map((m) => [m.id, m]));
  const planned: CylinderMovement[] = lines.map((l, i) => ({
    id: `new-${i}`,
    cylinderId: String(l.cylinderId),
    type: l.type,
    massG: l.massG,
    at: l.occurredAt.toISOString(),
    technicianId: l.technicianId,
    refrigerant: l.refrigerant,
    ...(l.reversesId ? { reverses: String(l.reversesId) } : {}),
  }));
  const cancelled = new Map(existing.flatMap((m) => (m.reverses ? [[m.reverses, m.id] as const] : [])));
  for (const p of planned) {
    if (!p.reverses) continue;
    const target = byId.get(p.reverses);
    if (!target || target.cylinderId !== p.cylinderId)
      throw new AppError("not_found:movement", "The line to cancel is not on this cylinder.");
    // Checked under the cylinder's lock: a second cancellation of the same line waited for the first.
    const by = cancelled.get(p.reverses);
    if (by) throw new AppError("conflict:movement", `Line #${p.reverses} is already cancelled by #${by}.`);
  }
  for (const id of cylinderIds) {
    const cylinder = toLedgerCylinder(cylinders.get(id)!);
    const own = (list: CylinderMovement[]) => list.filter((m) => m.cylinderId === cylinder.id);
    const refusal = checkLedgerChange(cylinder, own(existing), own(planned));
    if (!refusal) continue;
    const [shop, reader] = await Promise.all([
      Shop.findByPk(shopId, { attributes: ["units", "timeZone"], raw: true, transaction }),
      User.findOne({
        where: { id: readerId ?? lines[0]!.technicianId, shopId },
        attributes: ["unitChoice"],
        raw: true,
        transaction,
      }),
    ]);
    const units = readerUnitsOf(unitChoiceOfRow(reader?.unitChoice), shop?.units ?? "metric");
    const message = ledgerRefusalMessage(refusal, {
      cylinderLabel: cylinders.get(id)!.label,
      massUnit: ledgerMassUnit(units.mass),
      timeZone: shop?.timeZone ?? "UTC",
    });
    const fields = lines.filter((l) => l.cylinderId === id && !l.reversesId).map((l) => l.field ?? "massG");
    throw new AppError("conflict:ledger", message, {
      fieldErrors: Object.fromEntries((fields.length ? fields : ["massG"]).map((f) => [f, [message]])),
    });
  }
  const ids: number[] = [];
  for (const l of lines) {
    const row = await RefrigerantMovement.create(
      {
        shopId,
        cylinderId: l.cylinderId,
        caseId: l.caseId ?? null,
        serviceRecordId: l.serviceRecordId ?? null,
        technicianId: l.technicianId,
        type: l.type,
        refrigerant: l.refrigerant,
        massG: l.massG,
        occurredAt: l.occurredAt,
        reversesId: l.reversesId ?? null,
        destination: l.destination ?? null,
        note: l.note ?? null,
      },
      { transaction },
    );
    ids.push(row.id);
  }
  return ids;
}

/** Recycling, a shipment or a weighed correction, checked against the cylinder before it posts. */
export async function postManualMovement({
  shopId,
  technicianId,
  input,
}: {
  shopId: number;
  technicianId: string;
  input: ManualMovementInput;
}): Promise<MovementDto> {
  const { sequelize, Cylinder } = getModels();
  const occurredAt = input.occurredAt ? new Date(input.occurredAt) : new Date();
  if (occurredAt.getTime() > Date.now() + CLOCK_SKEW_MS)
    throw new AppError("bad_request:movement", "A ledger line cannot be dated in the future.", {
      fieldErrors: { occurredAt: ["A ledger line cannot be dated in the future."] },
    });
  const id = await sequelize.transaction(async (transaction) => {
    const cylinder = await Cylinder.findOne({
      where: { id: input.cylinderId, shopId },
      raw: true,
      transaction,
    });
    if (!cylinder)
      throw new AppError("bad_request:movement", "Choose one of the shop's cylinders.", {
        fieldErrors: { cylinderId: ["Not a cylinder of this shop."] },
      });
    if (cylinder.retiredAt)
      throw new AppError(
        "conflict:cylinder",
        "This cylinder is retired; reactivate it before posting to it.",
        { fieldErrors: { cylinderId: ["This cylinder is retired."] } },
      );
    const [posted] = await postMovements({
      shopId,
      transaction,
      lines: [
        {
          cylinderId: cylinder.id,
          technicianId,
          type: input.type,
          refrigerant: cylinder.refrigerant,
          massG: input.massG,
          occurredAt,
          destination: input.destination || null,
          note: input.note || null,
        },
      ],
    });
    return posted!;
  });
  // By id: a backdated line may be older than any page of the newest lines.
  return getMovement({ shopId, id });
}

/**
 * Cancel a wrong line: the line stays, as the record requires, and a correction with the
 * reason is posted against it, after the same check as any other line. Lines a service record
 * posted are changed through the record, so the two never disagree.
 */
export async function reverseMovement({
  user,
  id,
  input,
}: {
  user: User;
  id: number;
  input: ReversalInput;
}): Promise<ReversalResponse> {
  const { sequelize, RefrigerantMovement } = getModels();
  const shopId = user.shopId;
  const correctionId = await sequelize.transaction(async (transaction) => {
    const original = await RefrigerantMovement.findOne({ where: { id, shopId }, raw: true, transaction });
    if (!original) throw new AppError("not_found:movement", "No such ledger line in this shop.");
    if (user.role === "technician" && original.technicianId !== user.id)
      throw new AppError(
        "forbidden:movement",
        "Only the technician who posted this line, or a senior, can cancel it.",
      );
    if (original.reversesId)
      throw new AppError(
        "conflict:movement",
        `Line #${original.id} is itself a correction. Post a new line instead of cancelling it.`,
      );
    if (original.serviceRecordId)
      throw new AppError(
        "conflict:movement",
        `Line #${original.id} comes from the service record of case ${original.caseId}. Change the figure in that record and the ledger follows it.`,
      );
    const ids = await postMovements({
      shopId,
      transaction,
      lines: [
        {
          cylinderId: original.cylinderId,
          caseId: original.caseId,
          technicianId: user.id,
          type: original.type,
          refrigerant: original.refrigerant,
          massG: original.massG,
          occurredAt: new Date(),
          reversesId: original.id,
          destination: original.destination,
          note: input.reason,
        },
      ],
    });
    const correction = ids[0]!;
    await recordAudit({
      shopId,
      actorId: user.id,
      entity: "refrigerant_movement",
      entityId: original.id,
      action: "reversed",
      detail: { correctionId: correction, reason: input.reason },
      transaction,
    });
    return correction;
  });
  const [correction, original] = await Promise.all([
    getMovement({ shopId, id: correctionId }),
    getMovement({ shopId, id }),
  ]);
  return { correction, original };
}
