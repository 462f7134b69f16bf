import "server-only";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";

export interface ShopSummary {
  id: number;
  name: string;
  units: "metric" | "imperial";
  altitudeM: number;
  timeZone: string;
  locale: string;
}

export async function getShop({ shopId }: { shopId: number }): Promise<ShopSummary> {
  const { Shop } = getModels();
  const shop = await Shop.findByPk(shopId, {
    attributes: ["id", "name", "units", "altitudeM", "timeZone", "locale"],
    raw: true,
  });
  if (!shop) throw new AppError("not_found:shop");
  return {
    id: shop.id,
    name: shop.name,
    units: shop.units,
    altitudeM: shop.altitudeM,
    timeZone: shop.timeZone,
    locale: shop.locale,
  };
}
