import type { MovementType } from "@/lib/service/ledger";

/** How a ledger line reads on the screen, before the cylinder's label. */
export const MOVEMENT_WORDS: Readonly<Record<MovementType, string>> = {
  recovered_into: "Recovered into",
  charged_from: "Charged from",
  recycled: "Recycled in",
  sent_out: "Sent out from",
  adjustment: "Weighed adjustment to",
};

const formatters = new Map<string, Intl.DateTimeFormat>();

/** A line's date and time as the shop's wall clock shows it. */
export function shopDateTime(atIso: string, timeZone: string): string {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-GB", { timeZone, dateStyle: "medium", timeStyle: "short" });
    formatters.set(timeZone, f);
  }
  return f.format(new Date(atIso));
}
