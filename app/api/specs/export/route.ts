import { handler } from "@/lib/server/handler";
import { exportSpecsCsv } from "@/lib/server/specs";
import { specExportQuerySchema } from "@/lib/contracts/specs";

export const GET = handler(
  { permission: "specs:read", query: specExportQuerySchema },
  async ({ user, query }) => {
    const csv = await exportSpecsCsv({
      shopId: user.shopId,
      reader: user,
      units: { charge: query.charge, oil: query.oil },
    });
    return new Response(`\uFEFF${csv}\r\n`, {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": 'attachment; filename="spec-table.csv"',
      },
    });
  },
);
