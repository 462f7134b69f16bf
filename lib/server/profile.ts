import "server-only";
import { cache } from "react";
import type { User } from "lucia";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import { readerUnitsOf, type UnitChoice } from "@/lib/units";
import { unitChoiceOf, type ProfileInput, type ProfileResponse } from "@/lib/contracts/profile";
import { getShop } from "./shops";
import { recordAudit } from "./audit";

/** A stored unit choice, or none when the column holds anything else. */
export function unitChoiceOfRow(raw: unknown): UnitChoice {
  return typeof raw === "object" && raw !== null && !Array.isArray(raw) ? (raw as UnitChoice) : {};
}

/**
 * What a page's shell and the page read of the signed-in person's own row (units, locale, whether a
 * temporary password must be changed first): one read per render through React's cache; outside a
 * render (route handlers) it reads each time.
 */
export const readerRow = cache(async (userId: string, shopId: number) =>
  getModels().User.findOne({
    where: { id: userId, shopId },
    attributes: ["unitChoice", "locale", "passwordMustChange"],
    raw: true,
  }),
);

/** The person's units and locale, resolved against the shop's system. */
export async function getProfile({ user }: { user: Pick<User, "id" | "shopId"> }): Promise<ProfileResponse> {
  const [row, shop] = await Promise.all([readerRow(user.id, user.shopId), getShop({ shopId: user.shopId })]);
  if (!row) throw new AppError("not_found:user");
  const choice = unitChoiceOfRow(row.unitChoice);
  return {
    choice,
    locale: row.locale ?? null,
    shopSystem: shop.units,
    units: readerUnitsOf(choice, shop.units),
  };
}

export async function updateProfile({
  user,
  input,
}: {
  user: Pick<User, "id" | "shopId">;
  input: ProfileInput;
}): Promise<ProfileResponse> {
  const choice = unitChoiceOf(input);
  const locale = input.locale === null || input.locale === "" ? null : input.locale;
  const [count] = await getModels().User.update(
    { unitChoice: { ...choice }, locale },
    { where: { id: user.id, shopId: user.shopId } },
  );
  if (count === 0) throw new AppError("not_found:user");
  await recordAudit({
    shopId: user.shopId,
    actorId: user.id,
    entity: "user",
    entityId: user.id,
    action: "profile",
    detail: { units: { ...(choice as Record<string, string>) }, locale },
  });
  return getProfile({ user });
}
