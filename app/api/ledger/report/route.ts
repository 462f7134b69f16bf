import { handler } from "@/lib/server/handler";
import { ledgerReport, ledgerReportRows } from "@/lib/server/ledger";
import { reportQuerySchema } from "@/lib/contracts/ledger";

export const GET = handler(
  { permission: "ledger:read", query: reportQuerySchema },
  async ({ user, query }) => {
    // The latest months only (the ledger page's first view): no CSV to write for that.
    if (query.format !== "csv" && query.months !== undefined)
      return ledgerReportRows({ shopId: user.shopId, months: query.months });
    const report = await ledgerReport({ shopId: user.shopId, reader: user });
    if (query.format === "csv") {
      return new Response(`\uFEFF${report.csv}\r\n`, {
        headers: {
          "content-type": "text/csv; charset=utf-8",
          "content-disposition": 'attachment; filename="refrigerant-ledger.csv"',
        },
      });
    }
    return { rows: report.rows, timeZone: report.timeZone, monthCount: report.monthCount };
  },
);
