// npx tsx scripts/seed.ts: adds the demo shops, people, vehicles and cases (idempotent).
import { hashPassword } from "@/lib/auth/password";
import { createMigrator } from "@/lib/db/migrator";
import { closeSequelize } from "@/lib/db/sequelize";
import { demoPassword } from "@/lib/demo/people";
import { seedDemo } from "@/lib/demo/seed-demo";
import { seedServiceDemo } from "@/lib/demo/service-demo";
import { getModels } from "@/models";

async function main() {
  const models = getModels();
  const pending = await createMigrator(models.sequelize).pending();
  if (pending.length > 0) {
    throw new Error(`${pending.length} migration(s) pending; run \`npx tsx scripts/migrate.ts up\` first`);
  }
  // argon2 is slow on purpose: hash once and share it across the demo accounts.
  const passwordHash = await hashPassword(demoPassword);
  const { created, skipped } = await seedDemo({ models, passwordHash });
  for (const name of created) console.log(`seeded   ${name}`);
  for (const name of skipped) console.log(`present  ${name} (left as it is)`);
  for (const name of await seedServiceDemo({ models })) console.log(`seeded   ${name}`);
}

main()
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  })
  .finally(() => closeSequelize());
