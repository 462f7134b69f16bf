import { createHash, randomBytes } from "node:crypto";
import type { Models } from "@/models";
import { mazdaOvercharge } from "./owner-demo-case";

const DAY_MS = 24 * 60 * 60 * 1000;

/**
 * The owner-page demo: a repair proposal on the invented CX-5 case and one link to its owner page
 * (the token is printed once, here; only its SHA-256 is stored). Left alone once a proposal exists.
 */
export async function seedOwnerDemo({
  models,
  origin,
}: {
  models: Models;
  origin: string;
}): Promise<string[]> {
  const shop = await models.Shop.findOne({ where: { name: "Harbourline Auto Climate" } });
  const vehicle =
    shop && (await models.Vehicle.findOne({ where: { shopId: shop.id, make: "Mazda", model: "CX-5" } }));
  const serviceCase =
    vehicle &&
    (await models.Case.findOne({
      where: { shopId: shop.id, vehicleId: vehicle.id, complaint: mazdaOvercharge.complaint },
    }));
  if (!shop || !serviceCase) return [];
  if ((await models.RepairProposal.count({ where: { shopId: shop.id, caseId: serviceCase.id } })) > 0)
    return [];
  const tech = await models.User.findOne({ where: { shopId: shop.id, role: "technician" } });
  if (!tech) return [];
  const token = randomBytes(32).toString("base64url");
  await models.sequelize.transaction(async (transaction) => {
    await models.RepairProposal.create(
      {
        shopId: shop.id,
        caseId: serviceCase.id,
        repairIds: ["recover_evacuate_recharge"],
        priceMinor: 18900,
        currency: "CAD",
        note: "About an hour of work. We can do it on Thursday morning.",
        proposedBy: tech.id,
      },
      { transaction },
    );
    await models.ShareLink.create(
      {
        shopId: shop.id,
        caseId: serviceCase.id,
        tokenHash: createHash("sha256").update(token, "utf8").digest("hex"),
        createdBy: tech.id,
        expiresAt: new Date(Date.now() + 30 * DAY_MS),
      },
      { transaction },
    );
  });
  return [`Harbourline: a repair proposal on case ${serviceCase.id}, owner page ${origin}/s/${token}`];
}
