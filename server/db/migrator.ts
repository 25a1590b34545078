import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import { migrations } from './migrations';

export type MigrationContext = { queryInterface: QueryInterface; sequelize: Sequelize };

/** Umzug over the ordered migration list; applied names are kept in the `migrations_meta` table. */
export function createMigrator(sequelize: Sequelize, log: (msg: string) => void = () => {}) {
  return new Umzug<MigrationContext>({
    migrations: migrations.map((m) => ({
      name: m.name,
      up: ({ context }) => m.up(context),
      down: ({ context }) => m.down(context),
    })),
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    storage: new SequelizeStorage({ sequelize, tableName: 'migrations_meta' }),
    logger: { info: (e) => log(JSON.stringify(e)), warn: (e) => log(JSON.stringify(e)), error: (e) => log(JSON.stringify(e)), debug: () => {} },
  });
}

export async function migrateUp(sequelize: Sequelize, log?: (msg: string) => void): Promise<string[]> {
  const applied = await createMigrator(sequelize, log).up();
  return applied.map((m) => m.name);
}
