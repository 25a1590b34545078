import { Pool } from 'pg';
import { Sequelize } from 'sequelize';
import { initModels, type Models } from '../models';

export type Database = {
  sequelize: Sequelize;
  models: Models;
  /** A plain pg pool beside Sequelize's, for the session store and raw hot-path queries. */
  pool: Pool;
  /** Resolves when a trivial query round-trips within `timeoutMs`; rejects otherwise. */
  ping(timeoutMs?: number): Promise<void>;
  close(): Promise<void>;
};

/** Opens a pool on `url` and registers every model. Does not migrate. */
export function createDatabase(url: string, options: { logging?: (sql: string) => void } = {}): Database {
  const sequelize = new Sequelize(url, {
    dialect: 'postgres',
    logging: options.logging ?? false,
    pool: { max: 10, min: 0, idle: 10_000, acquire: 5_000 },
    dialectOptions: { connectionTimeoutMillis: 3_000 },
    define: { underscored: true },
  });
  const models = initModels(sequelize);
  const pool = new Pool({ connectionString: url, max: 10, connectionTimeoutMillis: 3_000 });
  // An idle client dropped by a database restart must not crash the process.
  pool.on('error', () => {});
  return {
    sequelize,
    models,
    pool,
    async ping(timeoutMs = 2_000) {
      let timer: NodeJS.Timeout | undefined;
      const timeout = new Promise<never>((_, reject) => {
        timer = setTimeout(() => reject(new Error('database ping timed out')), timeoutMs);
      });
      try {
        await Promise.race([sequelize.query('SELECT 1'), timeout]);
      } finally {
        clearTimeout(timer);
      }
    },
    async close() {
      await Promise.allSettled([sequelize.close(), pool.end()]);
    },
  };
}
