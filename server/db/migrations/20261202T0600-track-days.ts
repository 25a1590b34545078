import { DataTypes, literal } from 'sequelize';
import type { MigrationContext } from '../migrator';

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  const now = literal('now()');
  const timestamps = {
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
  };

  // Racers add tracks; seeded tracks have no creator.
  await qi.addColumn('tracks', 'created_by', {
    type: DataTypes.INTEGER,
    allowNull: true,
    references: { model: 'users', key: 'id' },
    onDelete: 'SET NULL',
  });
  // One track per name whatever the case, so "hollow pines circuit" finds the seeded one.
  await qi.sequelize.query('CREATE UNIQUE INDEX tracks_name_lower_key ON tracks (lower(name))');

  await qi.createTable('track_days', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    owner_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    track_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'tracks', key: 'id' }, onDelete: 'RESTRICT' },
    // The racer's local calendar day: no time zone to shift it.
    date: { type: DataTypes.DATEONLY, allowNull: false },
    air_temp_c: { type: DataTypes.DOUBLE, allowNull: true },
    track_temp_c: { type: DataTypes.DOUBLE, allowNull: true },
    humidity_pct: { type: DataTypes.DOUBLE, allowNull: true },
    moisture: { type: DataTypes.STRING(10), allowNull: true },
    grip: { type: DataTypes.STRING(10), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    ...timestamps,
  });
  // Written out rather than imported: a migration keeps meaning what it meant when it ran.
  await qi.sequelize.query("ALTER TABLE track_days ADD CONSTRAINT track_days_moisture_check CHECK (moisture IN ('dry', 'damp', 'wet', 'watered'))");
  await qi.sequelize.query('CREATE INDEX track_days_owner_date_idx ON track_days (owner_id, date DESC, id DESC)');

  await qi.createTable('runs', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    // A run exists only within its track day.
    track_day_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'track_days', key: 'id' }, onDelete: 'CASCADE' },
    car_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'cars', key: 'id' }, onDelete: 'RESTRICT' },
    // Setups are deleted softly and revisions never, so a run always knows what the car ran.
    setup_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'setups', key: 'id' }, onDelete: 'RESTRICT' },
    revision_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'setup_revisions', key: 'id' }, onDelete: 'RESTRICT' },
    label: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
    laps: { type: DataTypes.ARRAY(DataTypes.DOUBLE), allowNull: false, defaultValue: [] },
    included_slow_laps: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false, defaultValue: [] },
    feel_notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    ...timestamps,
  });
  await qi.sequelize.query('ALTER TABLE runs ADD CONSTRAINT runs_laps_count_check CHECK (cardinality(laps) <= 500)');
  await qi.sequelize.query('ALTER TABLE runs ADD CONSTRAINT runs_laps_positive_check CHECK (0 < ALL (laps))');
  await qi.addIndex('runs', ['track_day_id', 'id'], { name: 'runs_track_day_idx' });
  await qi.addIndex('runs', ['car_id'], { name: 'runs_car_idx' });
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.dropTable('runs');
  await qi.dropTable('track_days');
  await qi.sequelize.query('DROP INDEX IF EXISTS tracks_name_lower_key');
  await qi.removeColumn('tracks', 'created_by');
}
