import "server-only";
import type { Transaction } from "sequelize";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import type { RefrigerantId } from "@/lib/refrigerants";
import type { ServiceRecordInput } from "@/lib/contracts/service-records";
import { cylinderProblem } from "@/lib/service/record-rules";

// The rules that need the shop's own rows: the spec row and the cylinders a save names.

function refuse(field: string, message: string, fieldMessage = message): never {
  throw new AppError("bad_request:service_record", message, { fieldErrors: { [field]: [fieldMessage] } });
}

export async function checkNamedRows({
  shopId,
  input,
  refrigerant,
  previous,
  transaction,
}: {
  shopId: number;
  input: ServiceRecordInput;
  refrigerant: RefrigerantId;
  /** the cylinders the stored record already names */
  previous: { recoveryCylinderId: number | null; chargeCylinderId: number | null } | null;
  transaction: Transaction;
}): Promise<void> {
  const { SpecEntry, Cylinder } = getModels();
  if (
    input.specEntryId &&
    !(await SpecEntry.findOne({ where: { id: input.specEntryId, shopId }, attributes: ["id"], transaction }))
  )
    refuse(
      "specEntryId",
      "That spec row is not in this shop's table.",
      "Not a row of this shop's spec table.",
    );

  for (const [field, purpose] of [
    ["recoveryCylinderId", "recovery"],
    ["chargeCylinderId", "charge"],
  ] as const) {
    const id = input[field];
    if (!id) continue;
    const row = await Cylinder.findOne({ where: { id, shopId }, raw: true, transaction });
    const problem = cylinderProblem(
      row
        ? { id: row.id, refrigerant: row.refrigerant, kind: row.kind, retired: Boolean(row.retiredAt) }
        : null,
      { purpose, refrigerant, previousId: previous?.[field] ?? null },
    );
    if (problem) refuse(field, problem);
  }
}
