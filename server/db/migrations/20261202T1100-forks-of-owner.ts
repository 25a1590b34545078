import type { MigrationContext } from '../migrator';

/*
 * "Forks of my setups" (the activity feed's fork items) straight from one index: each fork carries
 * the owner of the setup it was forked from, filled by trigger (a setup's owner never changes), and
 * a partial index over listed forks by that owner, newest first. Without it the feed had to list
 * every setup of mine and look for forks of each, which for a racer with thousands of setups cost
 * more than the rest of the feed together.
 */
export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  const run = (sql: string) => qi.sequelize.query(sql);
  await run('ALTER TABLE setups ADD COLUMN forked_from_owner_id integer');
  await run(`CREATE FUNCTION setups_set_forked_from_owner() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      NEW.forked_from_owner_id := (SELECT o.owner_id FROM setups o WHERE o.id = NEW.forked_from_setup_id);
      RETURN NEW;
    END $$`);
  await run(`CREATE TRIGGER setups_forked_from_owner BEFORE INSERT OR UPDATE OF forked_from_setup_id ON setups
             FOR EACH ROW EXECUTE FUNCTION setups_set_forked_from_owner()`);
  await run(`UPDATE setups s SET forked_from_owner_id = o.owner_id FROM setups o
              WHERE s.forked_from_setup_id = o.id AND s.forked_from_owner_id IS DISTINCT FROM o.owner_id`);
  await run(`CREATE INDEX setups_listed_forks_of_owner_idx ON setups (forked_from_owner_id, created_at DESC, id DESC)
             WHERE forked_from_owner_id IS NOT NULL AND visibility = 'public' AND hidden_at IS NULL AND deleted_at IS NULL`);
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  const run = (sql: string) => qi.sequelize.query(sql);
  await run('DROP INDEX IF EXISTS setups_listed_forks_of_owner_idx');
  await run('DROP TRIGGER IF EXISTS setups_forked_from_owner ON setups');
  await run('DROP FUNCTION IF EXISTS setups_set_forked_from_owner()');
  await run('ALTER TABLE setups DROP COLUMN IF EXISTS forked_from_owner_id');
}
