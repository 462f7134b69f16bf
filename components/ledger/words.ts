import type { MovementType } from "@/lib/service/ledger";

/** How a ledger line reads on the screen, before the cylinder's label. */
export const MOVEMENT_WORDS: Readonly<Record<MovementType, string>> = {
  recovered_into: "Recovered into",
  charged_from: "Charged from",
  recycled: "Recycled in",
  sent_out: "Sent out from",
  adjustment: "Weighed adjustment to",
};
