import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrator';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};
const userRef = (allowNull = false) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: 'users', key: 'id' },
  onDelete: 'RESTRICT',
});

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  // A kit's stock sheet: values as they come in the box, and which choice options are in the box.
  await qi.addColumn('kits', 'stock_values', { type: DataTypes.JSONB, allowNull: false, defaultValue: {} });
  await qi.addColumn('kits', 'stock_in_box', { type: DataTypes.JSONB, allowNull: false, defaultValue: {} });
  await qi.addColumn('kits', 'template_version', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 });

  await qi.createTable('photos', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    owner_id: userRef(),
    storage_key: { type: DataTypes.STRING(200), allowNull: false, unique: true },
    thumb_key: { type: DataTypes.STRING(200), allowNull: false, unique: true },
    content_type: { type: DataTypes.STRING(40), allowNull: false },
    width: { type: DataTypes.INTEGER, allowNull: false },
    height: { type: DataTypes.INTEGER, allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    caption: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    hidden_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });

  await qi.createTable('cars', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    owner_id: userRef(),
    kit_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'kits', key: 'id' }, onDelete: 'RESTRICT' },
    nickname: { type: DataTypes.STRING(60), allowNull: false },
    stock: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    photo_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'photos', key: 'id' }, onDelete: 'SET NULL' },
    ...timestamps,
  });
  await qi.addIndex('cars', ['owner_id']);

  await qi.createTable('setups', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    owner_id: userRef(),
    car_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'cars', key: 'id' }, onDelete: 'RESTRICT' },
    vehicle_class: { type: DataTypes.STRING(40), allowNull: false },
    template_version: { type: DataTypes.INTEGER, allowNull: false },
    title: { type: DataTypes.STRING(120), allowNull: false },
    visibility: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'private' },
    share_token: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    track_type: { type: DataTypes.STRING(40), allowNull: true },
    temperature_c: { type: DataTypes.REAL, allowNull: true },
    grip: { type: DataTypes.STRING(10), allowNull: true },
    notes_md: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    current_revision_id: { type: DataTypes.INTEGER, allowNull: true },
    revision_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    // Lineage (forks) and moderation columns are filled by later features; they exist from the
    // start so lists can filter on them.
    forked_from_setup_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'setups', key: 'id' }, onDelete: 'SET NULL' },
    forked_from_revision_id: { type: DataTypes.INTEGER, allowNull: true },
    family_root_id: { type: DataTypes.INTEGER, allowNull: true },
    hidden_at: { type: DataTypes.DATE, allowNull: true },
    deleted_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.sequelize.query("ALTER TABLE setups ADD CONSTRAINT setups_visibility_check CHECK (visibility IN ('private', 'unlisted', 'public'))");
  await qi.addIndex('setups', ['owner_id', 'updated_at']);
  await qi.addIndex('setups', ['car_id']);
  await qi.sequelize.query(
    "CREATE INDEX setups_public_recent_idx ON setups (updated_at DESC, id DESC) WHERE visibility = 'public' AND hidden_at IS NULL AND deleted_at IS NULL",
  );

  await qi.createTable('setup_revisions', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    setup_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'setups', key: 'id' }, onDelete: 'RESTRICT' },
    number: { type: DataTypes.INTEGER, allowNull: false },
    values: { type: DataTypes.JSONB, allowNull: false },
    change_note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    author_id: userRef(),
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addConstraint('setup_revisions', { fields: ['setup_id', 'number'], type: 'unique', name: 'setup_revisions_setup_number_key' });
  await qi.sequelize.query(
    'ALTER TABLE setups ADD CONSTRAINT setups_current_revision_fk FOREIGN KEY (current_revision_id) REFERENCES setup_revisions (id) DEFERRABLE INITIALLY DEFERRED',
  );

  // Revisions are history: the database itself refuses to change or remove one.
  await qi.sequelize.query(`
    CREATE FUNCTION setup_revisions_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      RAISE EXCEPTION 'setup revisions are immutable (% refused)', TG_OP USING ERRCODE = 'restrict_violation';
    END $$`);
  await qi.sequelize.query(`
    CREATE TRIGGER setup_revisions_no_update_or_delete
    BEFORE UPDATE OR DELETE ON setup_revisions
    FOR EACH ROW EXECUTE FUNCTION setup_revisions_immutable()`);
  await qi.sequelize.query(`
    CREATE TRIGGER setup_revisions_no_truncate
    BEFORE TRUNCATE ON setup_revisions
    FOR EACH STATEMENT EXECUTE FUNCTION setup_revisions_immutable()`);

  await qi.createTable('setup_photos', {
    setup_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true, references: { model: 'setups', key: 'id' }, onDelete: 'CASCADE' },
    photo_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true, references: { model: 'photos', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
  });
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.dropTable('setup_photos');
  await qi.sequelize.query('ALTER TABLE setups DROP CONSTRAINT IF EXISTS setups_current_revision_fk');
  await qi.sequelize.query('DROP TRIGGER IF EXISTS setup_revisions_no_truncate ON setup_revisions');
  await qi.sequelize.query('DROP TRIGGER IF EXISTS setup_revisions_no_update_or_delete ON setup_revisions');
  await qi.dropTable('setup_revisions');
  await qi.sequelize.query('DROP FUNCTION IF EXISTS setup_revisions_immutable()');
  await qi.dropTable('setups');
  await qi.dropTable('cars');
  await qi.dropTable('photos');
  for (const c of ['stock_values', 'stock_in_box', 'template_version']) await qi.removeColumn('kits', c);
}
