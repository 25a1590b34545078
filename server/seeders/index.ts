import type { Database } from '../db/database';
import { hashPassword } from '../services/passwords';
import { DEMO_KITS, DEMO_MAKERS, DEMO_RACERS, DEMO_TRACKS } from './demoWorld';

/** True when nothing a person could have created is in the database yet. */
export async function isDatabaseEmpty(db: Database): Promise<boolean> {
  const [users, kits] = await Promise.all([db.models.User.count(), db.models.Kit.count()]);
  return users === 0 && kits === 0;
}

/**
 * Writes the invented demo world. Idempotent: rows are matched by slug or handle and
 * existing ones are left as they are, so running it twice changes nothing.
 */
export async function seedDemoWorld(db: Database, options: { bcryptCost: number }): Promise<void> {
  const { Maker, Kit, Track, User } = db.models;
  const passwordHashes = await Promise.all(DEMO_RACERS.map((r) => hashPassword(r.password, options.bcryptCost)));
  await db.sequelize.transaction(async (transaction) => {
    const makerIds = new Map<string, number>();
    for (const m of DEMO_MAKERS) {
      const [maker] = await Maker.findOrCreate({ where: { slug: m.slug }, defaults: { ...m }, transaction });
      makerIds.set(m.slug, maker.id);
    }
    for (const k of DEMO_KITS) {
      const makerId = makerIds.get(k.maker);
      if (makerId === undefined) throw new Error(`demo kit ${k.slug} names unknown maker ${k.maker}`);
      await Kit.findOrCreate({
        where: { slug: k.slug },
        defaults: { slug: k.slug, name: k.name, makerId, vehicleClass: k.vehicleClass, releasedYear: k.releasedYear },
        transaction,
      });
    }
    for (const t of DEMO_TRACKS) {
      await Track.findOrCreate({ where: { slug: t.slug }, defaults: { ...t }, transaction });
    }
    for (const [i, { password: _password, ...r }] of DEMO_RACERS.entries()) {
      await User.findOrCreate({
        where: { handle: r.handle },
        defaults: { ...r, passwordHash: passwordHashes[i], emailVerifiedAt: new Date() },
        transaction,
      });
    }
  });
}
