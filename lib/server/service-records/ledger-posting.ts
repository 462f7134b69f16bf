import "server-only";
import type { Transaction } from "sequelize";
import { getModels } from "@/models";
import type { RefrigerantId } from "@/lib/refrigerants";
import type { ServiceRecordInput } from "@/lib/contracts/service-records";
import { activeMovements } from "@/lib/service/ledger";
import { postingsForRecordChange, postingsForServiceRecord } from "@/lib/service/ledger-corrections";
import { toLedgerMovement } from "../ledger";

/**
 * Brings the ledger in line with the record, in the record's transaction: postings that no longer
 * match are cancelled by correction rows, new ones posted. With `input` null (the record is being
 * removed) every posting it made is cancelled. Returns how many rows it wrote.
 */
export async function postLedger(opts: {
  shopId: number;
  caseId: number;
  recordId: number;
  technicianId: string;
  refrigerant: RefrigerantId;
  input: ServiceRecordInput | null;
  transaction: Transaction;
}): Promise<number> {
  const { RefrigerantMovement } = getModels();
  const { shopId, caseId, recordId, technicianId, refrigerant, input, transaction } = opts;
  const mine = await RefrigerantMovement.findAll({
    where: { shopId, serviceRecordId: recordId },
    raw: true,
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  const posted = activeMovements(
    (mine as unknown as Parameters<typeof toLedgerMovement>[0][]).map(toLedgerMovement),
  );
  const wanted = input
    ? postingsForServiceRecord({
        refrigerant,
        technicianId,
        recovery:
          input.recoveryCylinderId && input.recoveredChargeG
            ? { cylinderId: String(input.recoveryCylinderId), massG: input.recoveredChargeG }
            : null,
        recharge:
          input.chargeCylinderId && input.chargedG
            ? { cylinderId: String(input.chargeCylinderId), massG: input.chargedG }
            : null,
      })
    : [];
  const now = new Date();
  let n = 0;
  const changes = postingsForRecordChange({
    serviceRecordId: String(recordId),
    posted,
    wanted,
    at: now.toISOString(),
    technicianId,
    newId: () => `new-${++n}`,
  });
  for (const m of changes) {
    const recoveredAt =
      m.type === "recovered_into" && !m.reverses && input?.recoveryEndedAt
        ? new Date(input.recoveryEndedAt)
        : now;
    await RefrigerantMovement.create(
      {
        shopId,
        caseId,
        serviceRecordId: recordId,
        cylinderId: Number(m.cylinderId),
        technicianId: m.technicianId,
        type: m.type,
        refrigerant: m.refrigerant,
        massG: m.massG,
        occurredAt: recoveredAt,
        reversesId: m.reverses ? Number(m.reverses) : null,
        note: m.note ?? null,
      },
      { transaction },
    );
  }
  return changes.length;
}
