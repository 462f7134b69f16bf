import { hashPassword } from "@/lib/auth/password";
import { createMigrator } from "@/lib/db/migrator";
import { closeSequelize } from "@/lib/db/sequelize";
import { demoPassword } from "@/scripts/demo/people";
import { seedAllDemo } from "@/scripts/demo/seed-all";
import { getModels } from "@/models";

/** What `migrate.ts up` and `seed.ts` do, in one process, for the integration database. */
export async function migrateAndSeed() {
  const models = getModels();
  try {
    await createMigrator(models.sequelize).up();
    await seedAllDemo({ models, passwordHash: await hashPassword(demoPassword) });
  } finally {
    await closeSequelize();
  }
}
