import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrator';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.createTable('makers', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('kits', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    maker_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'makers', key: 'id' },
      onDelete: 'RESTRICT',
    },
    vehicle_class: { type: DataTypes.STRING(40), allowNull: false },
    released_year: { type: DataTypes.INTEGER, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('kits', ['maker_id']);
  await qi.createTable('tracks', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    surface: { type: DataTypes.STRING(40), allowNull: false },
    indoor: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    ...timestamps,
  });
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    handle: { type: DataTypes.STRING(30), allowNull: false },
    display_name: { type: DataTypes.STRING(80), allowNull: false },
    role: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'racer' },
    bio: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    home_track: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    ...timestamps,
  });
  // Handles are unique regardless of case: "Pit_Ada" and "pit_ada" are the same racer.
  await qi.sequelize.query('CREATE UNIQUE INDEX users_handle_lower_key ON users (lower(handle))');
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.dropTable('users');
  await qi.dropTable('tracks');
  await qi.dropTable('kits');
  await qi.dropTable('makers');
}
