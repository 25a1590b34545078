import type { Database } from '../db/database';
import { hashPassword } from '../services/passwords';
import { DEMO_CARS } from './demoSetups';
import { DEMO_PHOTO_STYLES, drawDemoCarPhoto } from './demoPhotos';
import type { BlobStorage } from '../storage';
import type { Config } from '../config';
import { storeUploadedPhoto } from '../services/photos';
import { buildStockSheet } from './stockSheets';
import type { Transaction } from 'sequelize';
import crypto from 'node:crypto';
import { validateSetupValues, getTemplate } from '../../shared/types/templates';
import { diffSetupValues } from '../../shared/compute/setup/diff';
import type { StoredSetupValues } from '../../shared/types/setups';
import { DEMO_KITS, DEMO_MAKERS, DEMO_RACERS, DEMO_TRACKS } from './demoWorld';
import { seedDemoTrackDays } from './demoTrackDays';
import { seedDemoModeration } from './demoModeration';

/** True when nothing a person could have created is in the database yet. */
export async function isDatabaseEmpty(db: Database): Promise<boolean> {
  const [users, kits] = await Promise.all([db.models.User.count(), db.models.Kit.count()]);
  return users === 0 && kits === 0;
}

/**
 * Writes the invented demo world. Idempotent: rows are matched by slug or handle and
 * existing ones are left as they are, so running it twice changes nothing.
 */
export type SeedOptions = {
  bcryptCost: number;
  /** With storage, the public demo setups get a drawn photo each. */
  photos?: { storage: BlobStorage; config: Pick<Config, 'photos'> };
};

export async function seedDemoWorld(db: Database, options: SeedOptions): Promise<void> {
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
      const stock = buildStockSheet(k.slug, k.vehicleClass);
      await Kit.findOrCreate({
        where: { slug: k.slug },
        defaults: {
          slug: k.slug,
          name: k.name,
          makerId,
          vehicleClass: k.vehicleClass,
          releasedYear: k.releasedYear,
          stockValues: stock.values,
          stockInBox: stock.inBox,
          templateVersion: stock.templateVersion,
        },
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
    await seedDemoGarages(db, transaction);
    await seedDemoTrackDays(db, transaction);
  });
  if (options.photos) await seedDemoPhotos(db, options.photos);
  // After the commit: reports go through the reports service, in transactions of their own.
  await seedDemoModeration(db, { bcryptCost: options.bcryptCost });
}

/** One drawn photo on each styled public demo setup that has none yet. */
async function seedDemoPhotos(db: Database, photos: NonNullable<SeedOptions['photos']>): Promise<void> {
  for (const [title, style] of Object.entries(DEMO_PHOTO_STYLES)) {
    const setup = await db.models.Setup.findOne({ where: { title } });
    if (!setup) continue;
    const { rowCount } = await db.pool.query('SELECT 1 FROM setup_photos WHERE setup_id = $1', [setup.id]);
    if (rowCount) continue;
    const buffer = await drawDemoCarPhoto(style);
    const photo = await storeUploadedPhoto({ db, ...photos }, setup.ownerId, { buffer, originalname: 'demo.jpg', mimetype: 'image/jpeg' }, { caption: 'Side view in the pits' });
    await db.pool.query('INSERT INTO setup_photos (setup_id, photo_id, position) VALUES ($1, $2, 0)', [setup.id, photo.id]);
  }
}

/** Cars and setups of the demo racers, each revision one honest change; skipped for racers who have cars. */
async function seedDemoGarages(db: Database, transaction: Transaction): Promise<void> {
  const { User, Kit, Car, Setup, SetupRevision } = db.models;
  for (const demo of DEMO_CARS) {
    const owner = await User.findOne({ where: { handle: demo.owner }, transaction });
    const kit = await Kit.findOne({ where: { slug: demo.kit }, transaction });
    if (!owner || !kit) throw new Error(`demo car ${demo.nickname} names an unknown owner or kit`);
    if ((await Car.count({ where: { ownerId: owner.id, nickname: demo.nickname }, transaction })) > 0) continue;
    const car = await Car.create({ ownerId: owner.id, kitId: kit.id, nickname: demo.nickname, stock: demo.stock }, { transaction });
    const template = getTemplate(kit.vehicleClass);
    for (const s of demo.setups) {
      const setup = await Setup.create(
        {
          ownerId: owner.id, carId: car.id, vehicleClass: kit.vehicleClass, templateVersion: template.version, title: s.title,
          visibility: s.visibility, shareToken: crypto.randomBytes(18).toString('base64url'), trackType: s.trackType,
          temperatureC: s.temperatureC, grip: s.grip, notesMd: s.notes,
        },
        { transaction },
      );
      let values: StoredSetupValues = { ...kit.stockValues };
      const steps = [{ changes: {}, note: `Started from the ${kit.name} stock sheet.` }, ...s.steps];
      let last = 0;
      let lastAt = new Date();
      for (const [i, step] of steps.entries()) {
        const previous = values;
        values = { ...values, ...step.changes };
        const checked = validateSetupValues(template, values);
        if (!checked.ok) throw new Error(`demo setup ${s.title} step ${i} is invalid: ${JSON.stringify(checked.errors)}`);
        // Spread the history over the past weeks so it reads like a season of testing.
        const createdAt = new Date(Date.now() - (steps.length - i) * 6 * 86_400_000);
        const rev = await SetupRevision.create(
          {
            setupId: setup.id, number: i + 1, values, changeNote: step.note, authorId: owner.id, createdAt,
            changedFieldCount: i === 0 ? 0 : diffSetupValues(previous, values).length,
          },
          { transaction },
        );
        last = rev.id;
        lastAt = createdAt;
      }
      await setup.update({ currentRevisionId: last, revisionCount: steps.length }, { transaction });
      // The setup's own dates follow its history, so lists and pages agree on when it last changed.
      await db.sequelize.query('UPDATE setups SET created_at = :created, updated_at = :updated WHERE id = :id', {
        replacements: { created: new Date(lastAt.getTime() - (steps.length - 1) * 6 * 86_400_000), updated: lastAt, id: setup.id },
        transaction,
      });
    }
  }
}
