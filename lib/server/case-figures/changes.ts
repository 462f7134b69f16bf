import "server-only";
import type { Transaction } from "sequelize";
import type { User } from "lucia";
import { getModels } from "@/models";
import type { FigureChangeDetail, FigureHome, FigureId, FigureSource } from "@/lib/contracts/case-figures";
import { recordAudit } from "../audit";
import type { Homes } from "./homes";

// What both screens' saves share: the label charge onto the vehicle, and an audit row per change.

export interface Change {
  figure: FigureId;
  from: number | null;
  to: number | null;
  keptIn: FigureHome;
}

export async function auditChanges(opts: {
  user: User;
  caseId: number;
  typedIn: FigureSource;
  changes: Change[];
  transaction: Transaction;
}) {
  for (const c of opts.changes) {
    const detail: FigureChangeDetail = { ...c, typedIn: opts.typedIn };
    await recordAudit({
      shopId: opts.user.shopId,
      actorId: opts.user.id,
      entity: "case",
      entityId: opts.caseId,
      action: "figure_changed",
      detail,
      transaction: opts.transaction,
    });
  }
}

/**
 * The label charge on the vehicle, when a number was entered that differs from it. An emptied field
 * never clears it: the label is the vehicle's, read by each of its cases.
 */
export async function writeLabelCharge(
  homes: Homes,
  said: number | null | undefined,
  transaction: Transaction,
) {
  if (!homes.vehicle || said === undefined || said === null || said === homes.vehicle.labelChargeG) return [];
  await getModels().Vehicle.update({ labelChargeG: said }, { where: { id: homes.vehicle.id }, transaction });
  return [
    { figure: "labelChargeG", from: homes.vehicle.labelChargeG, to: said, keptIn: "vehicle" } as Change,
  ];
}
