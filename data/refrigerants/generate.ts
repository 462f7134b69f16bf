import { writeFileSync } from "node:fs";
import { join } from "node:path";
import { buildSaturationTable, serializeSaturationTable } from "./build-table";
import { VAPOUR_PRESSURE_EQUATIONS } from "./equations";

const directory = join(process.cwd(), "data", "refrigerants");
for (const eq of VAPOUR_PRESSURE_EQUATIONS) {
  const table = buildSaturationTable(eq);
  writeFileSync(join(directory, eq.fileName), serializeSaturationTable(table));
  console.log(`${eq.fileName}: ${table.tempC.length} points, ${table.minTempC} to ${table.maxTempC} °C`);
}
