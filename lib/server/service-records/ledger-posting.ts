import "server-only";
import type { Transaction } from "sequelize";
import { getModels } from "@/models";
import type { RefrigerantId } from "@/lib/refrigerants";
import type { ServiceRecordInput } from "@/lib/contracts/service-records";
import { activeMovements } from "@/lib/service/ledger";
import { postingsForRecordChange, postingsForServiceRecord } from "@/lib/service/ledger-corrections";
import { toLedgerMovement } from "../ledger";
import { postMovements } from "../ledger-post";

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
  /** the record's masses and cylinders as they now stand; null when the record is being removed */
  input: Pick<
    ServiceRecordInput,
    "recoveryCylinderId" | "recoveredChargeG" | "chargeCylinderId" | "chargedG" | "recoveryEndedAt"
  > | null;
  transaction: Transaction;
}): Promise<number> {
  const { RefrigerantMovement } = getModels();
  const { shopId, caseId, recordId, technicianId, refrigerant, input, transaction } = opts;
  // No lock here: the record's own row (updated before this at its version) already keeps two saves
  // of it apart, and postMovements locks the cylinders. A range lock on these lines would also block
  // unrelated posts waiting for a cylinder this save holds, and the two could deadlock.
  const mine = await RefrigerantMovement.findAll({
    where: { shopId, serviceRecordId: recordId },
    raw: true,
    transaction,
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
  // Through the ledger's own guard: the cylinders are locked, and a save that would take one
  // below empty or past its safe fill is refused whole, record and all.
  await postMovements({
    shopId,
    transaction,
    lines: changes.map((m) => ({
      cylinderId: Number(m.cylinderId),
      caseId,
      serviceRecordId: recordId,
      technicianId: m.technicianId,
      type: m.type,
      refrigerant: m.refrigerant,
      massG: m.massG,
      occurredAt:
        m.type === "recovered_into" && !m.reverses && input?.recoveryEndedAt
          ? new Date(input.recoveryEndedAt)
          : now,
      reversesId: m.reverses ? Number(m.reverses) : null,
      note: m.note ?? null,
      field: m.type === "recovered_into" ? "recoveredChargeG" : "chargedG",
    })),
  });
  return changes.length;
}
