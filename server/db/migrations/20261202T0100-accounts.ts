import { DataTypes } from 'sequelize';
import type { MigrationContext } from '../migrator';

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  const users = {
    email: { type: DataTypes.STRING(254), allowNull: true },
    email_verified_at: { type: DataTypes.DATE, allowNull: true },
    pending_email: { type: DataTypes.STRING(254), allowNull: true },
    password_hash: { type: DataTypes.STRING(100), allowNull: true },
    github_id: { type: DataTypes.STRING(40), allowNull: true, unique: true },
    github_login: { type: DataTypes.STRING(60), allowNull: true },
    classes_raced: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    units_length: { type: DataTypes.STRING(2), allowNull: false, defaultValue: 'mm' },
    units_temperature: { type: DataTypes.STRING(1), allowNull: false, defaultValue: 'C' },
    suspended_until: { type: DataTypes.DATE, allowNull: true },
    suspended_indefinitely: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    suspension_reason: { type: DataTypes.TEXT, allowNull: true },
  };
  for (const [column, spec] of Object.entries(users)) await qi.addColumn('users', column, spec);
  await qi.sequelize.query('CREATE UNIQUE INDEX users_email_lower_key ON users (lower(email)) WHERE email IS NOT NULL');
  await qi.sequelize.query(
    "ALTER TABLE users ADD CONSTRAINT users_role_check CHECK (role IN ('racer', 'moderator', 'admin'))",
  );

  // Single-use e-mail tokens; only a SHA-256 of the token is stored.
  await qi.createTable('email_tokens', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    purpose: { type: DataTypes.STRING(20), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    email: { type: DataTypes.STRING(254), allowNull: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('email_tokens', ['user_id', 'purpose']);

  // Failed sign-ins per account and client address: slows guessing without locking the owner out
  // from their own address.
  await qi.createTable('sign_in_failures', {
    user_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    client_key: { type: DataTypes.STRING(64), allowNull: false, primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    last_failed_at: { type: DataTypes.DATE, allowNull: false },
  });

  // express-session rows (connect-pg-simple's layout) so sessions survive restarts and are shared
  // by every app server.
  await qi.sequelize.query(`
    CREATE TABLE sessions (
      sid varchar NOT NULL PRIMARY KEY,
      sess json NOT NULL,
      expire timestamp(6) NOT NULL
    )`);
  await qi.sequelize.query('CREATE INDEX sessions_expire_idx ON sessions (expire)');
  await qi.sequelize.query("CREATE INDEX sessions_user_idx ON sessions (((sess -> 'passport' ->> 'user')))");

  // What the local fake SMTP server received, for the development mailbox.
  await qi.createTable('mailbox_messages', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    to_address: { type: DataTypes.TEXT, allowNull: false },
    from_address: { type: DataTypes.TEXT, allowNull: false },
    subject: { type: DataTypes.TEXT, allowNull: false },
    text_body: { type: DataTypes.TEXT, allowNull: false },
    html_body: { type: DataTypes.TEXT, allowNull: false },
    received_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.dropTable('mailbox_messages');
  await qi.dropTable('sessions');
  await qi.dropTable('sign_in_failures');
  await qi.dropTable('email_tokens');
  await qi.sequelize.query('ALTER TABLE users DROP CONSTRAINT IF EXISTS users_role_check');
  await qi.sequelize.query('DROP INDEX IF EXISTS users_email_lower_key');
  for (const column of [
    'email', 'email_verified_at', 'pending_email', 'password_hash', 'github_id', 'github_login', 'classes_raced',
    'units_length', 'units_temperature', 'suspended_until', 'suspended_indefinitely', 'suspension_reason',
  ]) {
    await qi.removeColumn('users', column);
  }
}
