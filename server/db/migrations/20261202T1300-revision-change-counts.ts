import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { diffSetupValues } from '../../../shared/compute/setup/diff';
import type { StoredSetupValues } from '../../../shared/types/setups';
import type { MigrationContext } from '../migrator';

/*
 * Each revision keeps how many fields differ from the revision before it (0 for revision 1),
 * written with the revision. The setup page showed that count for every revision and worked it out
 * by fetching every revision's full sheet and diffing them on each view; now it reads the number.
 * Existing rows are filled here with the same diffSetupValues the writers use, so old and new
 * revisions count alike; then the column is NOT NULL, as every insert path sets it.
 */

type BackfillRow = { id: number; values: StoredSetupValues; previous_values: StoredSetupValues | null };

/**
 * Fills changed_field_count where it is NULL, in batches keyed on id so a million revisions never
 * sit in memory at once: each batch reads its revisions with the sheet of the revision before
 * (highest lower number in the same setup) and writes the counts in one UPDATE.
 *
 * Revisions are immutable by trigger, so it is switched off for the UPDATEs and on again after.
 * Run it inside a transaction (`transaction`): ALTER TABLE … DISABLE TRIGGER is transactional, so
 * other sessions never see the trigger off, the lock it takes keeps their writes out until commit,
 * and a failure rolls back with the trigger still on. Returns how many revisions it filled.
 */
export async function backfillChangedFieldCounts(sequelize: Sequelize, transaction: Transaction, batchSize = 1000): Promise<number> {
  if (!Number.isInteger(batchSize) || batchSize < 1) throw new Error(`batchSize must be a whole number ≥ 1, got ${batchSize}`);
  await sequelize.query('ALTER TABLE setup_revisions DISABLE TRIGGER setup_revisions_no_update_or_delete', { transaction });
  let filled = 0;
  let after = 0;
  for (;;) {
    const rows = await sequelize.query<BackfillRow>(
      `SELECT r.id, r.values, p.values AS previous_values
         FROM setup_revisions r
         LEFT JOIN LATERAL (SELECT pr.values FROM setup_revisions pr
                             WHERE pr.setup_id = r.setup_id AND pr.number < r.number
                             ORDER BY pr.number DESC LIMIT 1) p ON true
        WHERE r.id > :after AND r.changed_field_count IS NULL
        ORDER BY r.id
        LIMIT :limit`,
      { replacements: { after, limit: batchSize }, type: QueryTypes.SELECT, transaction },
    );
    if (!rows.length) break;
    const counts = rows.map((r) => (r.previous_values ? diffSetupValues(r.previous_values, r.values).length : 0));
    await sequelize.query(
      `UPDATE setup_revisions r SET changed_field_count = c.n
         FROM unnest(ARRAY[:ids]::int[], ARRAY[:counts]::int[]) AS c(id, n)
        WHERE r.id = c.id`,
      { replacements: { ids: rows.map((r) => r.id), counts }, transaction },
    );
    filled += rows.length;
    after = rows[rows.length - 1].id;
  }
  await sequelize.query('ALTER TABLE setup_revisions ENABLE TRIGGER setup_revisions_no_update_or_delete', { transaction });
  return filled;
}

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  // One transaction: the column, its counts and NOT NULL land together or not at all.
  await qi.sequelize.transaction(async (transaction) => {
    await qi.sequelize.query('ALTER TABLE setup_revisions ADD COLUMN changed_field_count integer', { transaction });
    await backfillChangedFieldCounts(qi.sequelize, transaction);
    await qi.sequelize.query('ALTER TABLE setup_revisions ALTER COLUMN changed_field_count SET NOT NULL', { transaction });
  });
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.sequelize.query('ALTER TABLE setup_revisions DROP COLUMN IF EXISTS changed_field_count');
}
