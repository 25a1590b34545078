import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrator';

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  // The original's revision this fork last took values from (the fork point, then each sync).
  await qi.addColumn('setups', 'upstream_revision_id', { type: DataTypes.INTEGER, allowNull: true });
  // Rows written by SQL (bulk generators, later maintenance) get their timestamps from the database.
  for (const table of ['setups', 'setup_revisions']) {
    await qi.sequelize.query(`ALTER TABLE ${table} ALTER COLUMN created_at SET DEFAULT now()`);
  }
  await qi.sequelize.query('ALTER TABLE setups ALTER COLUMN updated_at SET DEFAULT now()');
  await qi.sequelize.query('CREATE INDEX setups_forked_from_idx ON setups (forked_from_setup_id) WHERE forked_from_setup_id IS NOT NULL');
  await qi.sequelize.query('CREATE INDEX setups_family_root_idx ON setups (family_root_id) WHERE family_root_id IS NOT NULL');
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.sequelize.query('DROP INDEX IF EXISTS setups_family_root_idx');
  await qi.sequelize.query('DROP INDEX IF EXISTS setups_forked_from_idx');
  await qi.removeColumn('setups', 'upstream_revision_id');
  for (const table of ['setups', 'setup_revisions']) {
    await qi.sequelize.query(`ALTER TABLE ${table} ALTER COLUMN created_at DROP DEFAULT`);
  }
  await qi.sequelize.query('ALTER TABLE setups ALTER COLUMN updated_at DROP DEFAULT');
}
