import "server-only";
import { getModels } from "@/models";
import { DEFAULT_PART_OIL_ALLOWANCES_ML, REPLACED_PART_IDS } from "@/lib/service/oil";
import type { AllowancesMl } from "@/lib/contracts/specs";
import { recordAudit } from "./audit";

/** The shop's figures where it set them, the defaults from lib/service elsewhere. */
export async function getPartOilAllowances({ shopId }: { shopId: number }): Promise<AllowancesMl> {
  const rows = await getModels().PartOilAllowance.findAll({ where: { shopId }, raw: true });
  const out: AllowancesMl = { ...DEFAULT_PART_OIL_ALLOWANCES_ML };
  for (const r of rows) out[r.part] = r.allowanceMl;
  return out;
}

export async function setPartOilAllowances({
  shopId,
  actorId,
  allowancesMl,
}: {
  shopId: number;
  actorId: string;
  allowancesMl: Partial<AllowancesMl>;
}): Promise<AllowancesMl> {
  const { PartOilAllowance, sequelize } = getModels();
  await sequelize.transaction(async (transaction) => {
    for (const part of REPLACED_PART_IDS) {
      const value = allowancesMl[part];
      if (value === undefined) continue;
      const allowanceMl = value === null ? null : Math.round(value);
      const [row, created] = await PartOilAllowance.findOrCreate({
        where: { shopId, part },
        defaults: { shopId, part, allowanceMl },
        transaction,
      });
      if (!created) await row.update({ allowanceMl }, { transaction });
    }
    await recordAudit({
      shopId,
      actorId,
      entity: "part_oil_allowance",
      entityId: "all",
      action: "updated",
      detail: allowancesMl,
      transaction,
    });
  });
  return getPartOilAllowances({ shopId });
}
