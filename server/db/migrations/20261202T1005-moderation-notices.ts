import type { MigrationContext } from '../migrator';

/*
 * A notification type of its own for what moderators did to a racer's content or account
 * ('moderation-notice': hidden, restored, warned, suspended, appeal decided). The list of types is
 * frozen in the notifications table's CHECK constraint, so a new type comes with its own migration.
 */
const BEFORE = `'new-follower', 'comment-on-setup', 'comment-on-revision', 'comment-reply', 'setup-forked', 'original-changed', 'report-outcome'`;

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.sequelize.query('ALTER TABLE notifications DROP CONSTRAINT notifications_type_check');
  await qi.sequelize.query(
    `ALTER TABLE notifications ADD CONSTRAINT notifications_type_check CHECK (type IN (${BEFORE}, 'moderation-notice'))`,
  );
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.sequelize.query("DELETE FROM notifications WHERE type = 'moderation-notice'");
  await qi.sequelize.query('ALTER TABLE notifications DROP CONSTRAINT notifications_type_check');
  await qi.sequelize.query(`ALTER TABLE notifications ADD CONSTRAINT notifications_type_check CHECK (type IN (${BEFORE}))`);
}
