/**
 * Database chores for scripts/start.sh and developers:
 *   tsx server/db/cli.ts migrate        apply pending migrations
 *   tsx server/db/cli.ts rollback       undo the last migration
 *   tsx server/db/cli.ts seed           seed the demo world (idempotent)
 *   tsx server/db/cli.ts seed-if-empty  seed only when no racer or kit exists
 */
import { loadConfig } from '../config';
import { createDatabase } from './database';
import { createMigrator } from './migrator';
import { isDatabaseEmpty, seedDemoWorld } from '../seeders';
import { createStorage } from '../storage';

async function main(command: string | undefined): Promise<void> {
  const config = loadConfig();
  const db = createDatabase(config.databaseUrl);
  try {
    const migrator = createMigrator(db.sequelize);
    switch (command) {
      case 'migrate': {
        const applied = await migrator.up();
        console.log(applied.length ? `applied ${applied.map((m) => m.name).join(', ')}` : 'migrations: up to date');
        break;
      }
      case 'rollback': {
        const undone = await migrator.down();
        console.log(undone.length ? `rolled back ${undone.map((m) => m.name).join(', ')}` : 'nothing to roll back');
        break;
      }
      case 'seed':
        await seedDemoWorld(db, { bcryptCost: config.bcryptCost, photos: { storage: createStorage(config.storage), config } });
        console.log('demo world seeded');
        break;
      case 'seed-if-empty':
        if (await isDatabaseEmpty(db)) {
          await seedDemoWorld(db, { bcryptCost: config.bcryptCost, photos: { storage: createStorage(config.storage), config } });
          console.log('empty database: demo world seeded');
        } else {
          console.log('database has data: demo seed skipped');
        }
        break;
      default:
        throw new Error(`unknown command "${command ?? ''}"; use migrate, rollback, seed or seed-if-empty`);
    }
  } finally {
    await db.close();
  }
}

main(process.argv[2]).catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
