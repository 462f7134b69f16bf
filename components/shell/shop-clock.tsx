"use client";

import { createContext, useContext } from "react";
import { formatShopRecordTime, formatShopTime, type ShopClock } from "@/lib/units/clock";

// One date and time format everywhere a person reads one: the shop's locale on the shop's clock.
const ShopClockContext = createContext<ShopClock>({ timeZone: "UTC", locale: "en" });

export function ShopClockProvider({ clock, children }: { clock: ShopClock; children: React.ReactNode }) {
  return <ShopClockContext.Provider value={clock}>{children}</ShopClockContext.Provider>;
}

/** A formatter for ISO times in this shop's way. */
export function useShopTime(): (iso: string) => string {
  const clock = useContext(ShopClockContext);
  return (iso) => formatShopTime(new Date(iso), clock);
}

/** A formatter for a kept record's ISO time (a ledger line): with its year, in this shop's way. */
export function useShopRecordTime(): (iso: string) => string {
  const clock = useContext(ShopClockContext);
  return (iso) => formatShopRecordTime(new Date(iso), clock);
}

/** A moment as the shop's clock shows it; the server and the phone may disagree near midnight. */
export function ShopTime({ iso }: { iso: string }) {
  const format = useShopTime();
  return (
    <time dateTime={iso} suppressHydrationWarning>
      {format(iso)}
    </time>
  );
}
