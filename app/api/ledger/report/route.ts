import { handler } from "@/lib/server/handler";
import { ledgerReportAnswer } from "@/lib/server/ledger";
import { reportQuerySchema } from "@/lib/contracts/ledger";

export const GET = handler(
  { permission: "ledger:read", query: reportQuerySchema },
  async ({ user, query }) => {
    const answer = await ledgerReportAnswer({
      shopId: user.shopId,
      reader: user,
      format: query.format,
      months: query.months,
    });
    if ("csv" in answer) {
      return new Response(`\uFEFF${answer.csv}\r\n`, {
        headers: {
          "content-type": "text/csv; charset=utf-8",
          "content-disposition": 'attachment; filename="refrigerant-ledger.csv"',
        },
      });
    }
    return answer.json;
  },
);
