import "server-only";
import { cache } from "react";
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

// The shell, the page and the reader's profile each ask for the shop while one page renders: React's
// cache makes that one read per render (outside a render, as in route handlers, it reads each time).
// No server action changes a shop, so nothing within one render reads it before and after a change.
const shopOnce = cache(async (shopId: number): Promise<ShopSummary> => {
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
});

export async function getShop({ shopId }: { shopId: number }): Promise<ShopSummary> {
  return { ...(await shopOnce(shopId)) };
}
