import { handler } from "@/lib/server/handler";
import { commitSpecImport, previewSpecImport } from "@/lib/server/specs";
import { recordAudit } from "@/lib/server/audit";
import { specImportQuerySchema, specImportSchema } from "@/lib/contracts/specs";

/** ?step=preview reads the file and reports each row's problems; ?step=commit saves the rows without problems. */
export const POST = handler(
  { permission: "specs:edit", query: specImportQuerySchema, body: specImportSchema },
  async ({ user, query, body }) => {
    if (query.step === "preview")
      return { preview: await previewSpecImport({ shopId: user.shopId, csv: body.csv, units: body.units }) };
    const result = await commitSpecImport({ shopId: user.shopId, csv: body.csv, units: body.units });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "spec_entry",
      entityId: "import",
      action: "imported",
      detail: result,
    });
    return result;
  },
);
