import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrator';

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  // Per field, the original's value this fork last took or dismissed: the base of the next
  // three-way comparison. Null until the first sync, when the forked-from revision is the base.
  await qi.addColumn('setups', 'upstream_base_values', { type: DataTypes.JSONB, allowNull: true });
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.removeColumn('setups', 'upstream_base_values');
}
