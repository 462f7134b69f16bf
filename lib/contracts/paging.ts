import { z } from "zod";

/** `limit` and `offset` for a list route: every list answers one page, never a whole table. */
export function pageQuery({ defaultLimit, maxLimit }: { defaultLimit: number; maxLimit: number }) {
  return z.object({
    limit: z.coerce
      .number({ message: "A limit is a number." })
      .int("A limit is a whole number.")
      .min(1, "Ask for at least one row.")
      .max(maxLimit, `Ask for at most ${maxLimit} rows at a time.`)
      .default(defaultLimit),
    offset: z.coerce
      .number({ message: "An offset is a number." })
      .int("An offset is a whole number.")
      .min(0, "An offset is 0 or more.")
      .max(1_000_000, "Narrow the list instead of paging this far.")
      .default(0),
  });
}

/** Where the next page starts, or null on the last page. */
export interface PageInfo {
  nextOffset: number | null;
}
