import { DataTypes, literal } from 'sequelize';
import type { MigrationContext } from '../migrator';

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  // Timestamps default in the database (now()), so rows written by SQL get them too.
  const now = literal('now()');
  await qi.createTable('comments', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    setup_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'setups', key: 'id' }, onDelete: 'CASCADE' },
    // The change the comment is about; null for the setup as a whole. Revisions are never deleted.
    revision_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'setup_revisions', key: 'id' } },
    field_key: { type: DataTypes.STRING(80), allowNull: true },
    // One level of replies: a reply points at a top-level comment of the same setup.
    parent_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'comments', key: 'id' }, onDelete: 'CASCADE' },
    author_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    body_md: { type: DataTypes.TEXT, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
    edited_at: { type: DataTypes.DATE, allowNull: true },
    // Soft delete: the comment stays in its thread as "deleted" so the replies still read.
    deleted_at: { type: DataTypes.DATE, allowNull: true },
    // Set by moderation.
    hidden_at: { type: DataTypes.DATE, allowNull: true },
  });
  await qi.sequelize.query(
    'ALTER TABLE comments ADD CONSTRAINT comments_field_needs_revision_check CHECK (field_key IS NULL OR revision_id IS NOT NULL)',
  );
  await qi.addIndex('comments', ['setup_id', 'created_at'], { name: 'comments_setup_created_idx' });
  await qi.addIndex('comments', ['parent_id'], { name: 'comments_parent_idx' });
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.dropTable('comments');
}
