import { rawTokenParamsSchema } from "@/lib/contracts/owner-summary";
import { handler } from "@/lib/server/handler";
import { publicOwnerSummaryPdf } from "@/lib/server/owner-pdf";
import { tokenFromParams } from "@/lib/server/public-token";

/** The owner page as a PDF, drawn on the server. */
export const GET = handler({ public: true, params: rawTokenParamsSchema }, async ({ params }) => {
  const { pdf, caseId } = await publicOwnerSummaryPdf(tokenFromParams(params));
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="ac-summary-case-${caseId}.pdf"`,
      "cache-control": "private, no-store",
      "referrer-policy": "no-referrer",
    },
  });
});
