import { handler } from "@/lib/server/handler";
import { commitSpecImport, previewSpecImport } from "@/lib/server/specs";
import { specImportQuerySchema, specImportSchema } from "@/lib/contracts/specs";

/** ?step=preview reads the file and reports each row's problems; ?step=commit saves the rows without problems. */
export const POST = handler(
  { permission: "specs:edit", query: specImportQuerySchema, body: specImportSchema },
  async ({ user, query, body }) =>
    query.step === "preview"
      ? { preview: await previewSpecImport({ shopId: user.shopId, csv: body.csv, units: body.units }) }
      : commitSpecImport({ shopId: user.shopId, actorId: user.id, csv: body.csv, units: body.units }),
);
