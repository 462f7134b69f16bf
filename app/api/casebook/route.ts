import { handler } from "@/lib/server/handler";
import { searchCasebook } from "@/lib/server/casebook/search";
import { casebookSearchQuerySchema } from "@/lib/contracts/casebook";

/** One page of the shop's cases matching the words and filters, with the total. */
export const GET = handler(
  { permission: "casebook:search", query: casebookSearchQuerySchema },
  async ({ user, query }) => searchCasebook({ shopId: user.shopId, query }),
);
