// npx tsx scripts/migrate.ts up|down|down:all|status
import { closeSequelize, getSequelize } from "@/lib/db/sequelize";
import { createMigrator } from "@/lib/db/migrator";

async function main(command: string) {
  const migrator = createMigrator(getSequelize());
  switch (command) {
    case "up": {
      const ran = await migrator.up();
      console.log(ran.length ? `applied: ${ran.map((m) => m.name).join(", ")}` : "schema is up to date");
      break;
    }
    case "down": {
      const reverted = await migrator.down();
      console.log(
        reverted.length ? `reverted: ${reverted.map((m) => m.name).join(", ")}` : "nothing to revert",
      );
      break;
    }
    case "down:all": {
      const reverted = await migrator.down({ to: 0 });
      console.log(`reverted ${reverted.length} migration(s)`);
      break;
    }
    case "status": {
      const [executed, pending] = await Promise.all([migrator.executed(), migrator.pending()]);
      for (const m of executed) console.log(`applied  ${m.name}`);
      for (const m of pending) console.log(`pending  ${m.name}`);
      break;
    }
    default:
      console.error("usage: npx tsx scripts/migrate.ts up|down|down:all|status");
      process.exitCode = 2;
  }
}

main(process.argv[2] ?? "")
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  })
  .finally(() => closeSequelize());
