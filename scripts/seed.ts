// npx tsx scripts/seed.ts: adds the demo shops, people, vehicles, cases and service records (idempotent).
import { hashPassword } from "@/lib/auth/password";
import { createMigrator } from "@/lib/db/migrator";
import { closeSequelize } from "@/lib/db/sequelize";
import { demoPassword } from "./demo/people";
import { seedAllDemo } from "./demo/seed-all";
import { env } from "@/lib/env";
import { getModels } from "@/models";

async function main() {
  const models = getModels();
  const pending = await createMigrator(models.sequelize).pending();
  if (pending.length > 0) {
    throw new Error(`${pending.length} migration(s) pending; run \`npx tsx scripts/migrate.ts up\` first`);
  }
  // argon2 is slow on purpose: hash once and share it across the demo accounts.
  const passwordHash = await hashPassword(demoPassword);
  for (const line of await seedAllDemo({ models, passwordHash, origin: env().APP_ORIGIN })) console.log(line);
}

main()
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  })
  .finally(() => closeSequelize());
