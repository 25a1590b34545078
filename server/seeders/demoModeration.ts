import crypto from 'node:crypto';
import { QueryTypes } from 'sequelize';
import type { ReportReason, ReportTargetType } from '../../shared/types/moderation';
import { getTemplate } from '../../shared/types/templates';
import type { StoredSetupValues } from '../../shared/types/setups';
import type { Database } from '../db/database';
import type { User } from '../models/User';
import { fileReport } from '../services/moderation/reports';
import { hashPassword } from '../services/passwords';

/*
 * A spam account for the moderators' queue: an invented shop's account that posted advertising
 * setups, a spammy change note and comments on the demo racers' setups, reported by demo racers
 * for different reasons. The reports go through the same service as the app's, so the setup three
 * trusted racers reported is hidden automatically. Everything here is invented; the shop's
 * addresses are under .example, which never resolves.
 */

const DAY_MS = 86_400_000;
const SHOP = 'https://bargain-bushings.example';

/** The demo spam account (password for trying the appeal flow locally). */
export const DEMO_SPAMMER = {
  handle: 'bargain-bushings-4u',
  displayName: 'Bargain Bushings 4U',
  email: 'deals@bargain-bushings.example',
  password: 'seventy-percent-off-9',
  bio: `CHEAPEST bushings and bearings anywhere!!! ${SHOP}/sale and ${SHOP}/bulk — use code WIN70`,
  /** Signed up two days ago: past the new-account day, so nothing held its posts back. */
  ageDays: 2,
};

/**
 * How old the demo racers' accounts are: their setups' histories reach back weeks, and the ones
 * who report must count towards the automatic hide (older than a week). Rafi is the newcomer: a
 * few days, so he is not limited but his reports do not count towards the automatic hide.
 */
const DEMO_ACCOUNT_AGE_DAYS: Record<string, number> = {
  tamsin_q: 400,
  'oskar-velde': 300,
  juno_braithwick: 200,
  'pell-strand': 150,
  rafi_new: 3,
};

export const SPAM_SETUPS = [
  {
    title: 'MEGA SALE — bushings 70% off, free shipping',
    notes: `Forget tuning, our bushings make ANY buggy win!!!\n\nOrder today: ${SHOP}/sale\nCodes: www.bargain-bushings.example/codes\nWholesale: ${SHOP}/bulk`,
    hoursAgo: 40,
  },
  {
    title: 'Winning Stoat 8N sheet (free parts inside)',
    notes: `Free bearings with every order over 20 — ${SHOP}/free`,
    hoursAgo: 30,
    spamRevision: `Fitted our bushings, instantly faster. Get yours: ${SHOP}/sale`,
  },
  {
    title: 'Race-proven 8N setup — buy the full file',
    notes: `Full sheet with every secret for 9.99 at ${SHOP}/files`,
    hoursAgo: 20,
    /** Copied value for value from this demo setup, which is what its report says. */
    copiedFrom: 'Saltmarsh hard-pack nitro',
  },
];

export const SPAM_COMMENTS = [
  { on: 'Hollow Pines — loose and dusty', body: `Great setup!!! Even better with our bushings, 70% off at ${SHOP}/sale`, hoursAgo: 26 },
  {
    on: 'Brackwater rough-track truggy',
    body: `Pro tip: lean the engine right out and let it run hot, +20% power. Our glow plugs take the heat: ${SHOP}/plugs`,
    hoursAgo: 22,
  },
  { on: 'Saltmarsh hard-pack nitro', body: 'Anyone still running this sheet is throwing money away. Buy a real setup from us.', hoursAgo: 18 },
];

type Target = { setup: number } | { revisionOf: number } | { comment: number } | { racer: true };

export const DEMO_REPORTS: Array<{ reporter: string; target: Target; reason: ReportReason; note?: string }> = [
  // Three trusted racers on the first setup: it is hidden automatically.
  { reporter: 'juno_braithwick', target: { setup: 0 }, reason: 'spam' },
  { reporter: 'pell-strand', target: { setup: 0 }, reason: 'spam', note: 'Shop links, nothing about a car.' },
  { reporter: 'tamsin_q', target: { setup: 0 }, reason: 'spam' },
  { reporter: 'juno_braithwick', target: { setup: 1 }, reason: 'spam' },
  { reporter: 'rafi_new', target: { setup: 1 }, reason: 'other', note: 'The same account posted three of these today.' },
  { reporter: 'pell-strand', target: { revisionOf: 1 }, reason: 'spam', note: 'The change note is an advert.' },
  { reporter: 'pell-strand', target: { setup: 2 }, reason: 'stolen', note: 'These are the Saltmarsh hard-pack values, copied one for one and put behind a paywall.' },
  { reporter: 'juno_braithwick', target: { comment: 0 }, reason: 'spam' },
  { reporter: 'pell-strand', target: { comment: 1 }, reason: 'unsafe', note: 'A lean, hot nitro engine seizes or throws its rod. Nobody should follow this.' },
  { reporter: 'rafi_new', target: { comment: 1 }, reason: 'unsafe' },
  { reporter: 'juno_braithwick', target: { comment: 2 }, reason: 'abusive' },
  { reporter: 'rafi_new', target: { racer: true }, reason: 'spam', note: 'The profile is only shop links.' },
];

/** Makes the demo racers' accounts as old as their histories (never younger than they are). */
async function ageDemoAccounts(db: Database): Promise<void> {
  for (const [handle, days] of Object.entries(DEMO_ACCOUNT_AGE_DAYS)) {
    await db.sequelize.query('UPDATE users SET created_at = LEAST(created_at, now() - make_interval(days => :days)) WHERE handle = :handle', {
      replacements: { handle, days },
    });
  }
}

async function ensureSpammer(db: Database, bcryptCost: number): Promise<User> {
  const existing = await db.models.User.findOne({ where: { handle: DEMO_SPAMMER.handle } });
  if (existing) return existing;
  const since = new Date(Date.now() - DEMO_SPAMMER.ageDays * DAY_MS);
  return db.models.User.create({
    handle: DEMO_SPAMMER.handle,
    displayName: DEMO_SPAMMER.displayName,
    email: DEMO_SPAMMER.email,
    bio: DEMO_SPAMMER.bio,
    passwordHash: await hashPassword(DEMO_SPAMMER.password, bcryptCost),
    emailVerifiedAt: since,
    classesRaced: ['buggy-1-8-nitro'],
    createdAt: since,
  });
}

const hoursAgo = (h: number) => new Date(Date.now() - h * 3_600_000);

/** The spam setups (public), each with revision 1 and, where given, an advertising second revision. */
async function ensureSpamSetups(db: Database, spammer: User): Promise<number[]> {
  const { Kit, Car, Setup, SetupRevision } = db.models;
  const kit = await Kit.findOne({ where: { slug: 'ottervale-stoat-8n' } });
  if (!kit) return [];
  const [car] = await Car.findOrCreate({ where: { ownerId: spammer.id, nickname: 'Deal Buggy' }, defaults: { ownerId: spammer.id, kitId: kit.id, nickname: 'Deal Buggy', stock: true } });
  const ids: number[] = [];
  for (const spam of SPAM_SETUPS) {
    const found = await Setup.findOne({ where: { ownerId: spammer.id, title: spam.title } });
    if (found) {
      ids.push(found.id);
      continue;
    }
    const copied = spam.copiedFrom ? await Setup.findOne({ where: { title: spam.copiedFrom } }) : null;
    const values: StoredSetupValues = copied ? (await SetupRevision.findByPk(copied.currentRevisionId!))!.values : kit.stockValues;
    const createdAt = hoursAgo(spam.hoursAgo);
    const setup = await db.sequelize.transaction(async (transaction) => {
      const created = await Setup.create(
        {
          ownerId: spammer.id, carId: car.id, vehicleClass: kit.vehicleClass, templateVersion: getTemplate(kit.vehicleClass).version,
          title: spam.title, visibility: 'public', shareToken: crypto.randomBytes(18).toString('base64url'), notesMd: spam.notes,
        },
        { transaction },
      );
      const notes = [`Started from the ${kit.name} stock sheet.`, ...(spam.spamRevision ? [spam.spamRevision] : [])];
      let last = 0;
      for (const [i, changeNote] of notes.entries()) {
        // Every revision holds the same sheet (only the note advertises), so none changes a field.
        last = (await SetupRevision.create({ setupId: created.id, number: i + 1, values, changeNote, authorId: spammer.id, createdAt, changedFieldCount: 0 }, { transaction })).id;
      }
      await created.update({ currentRevisionId: last, revisionCount: notes.length }, { transaction });
      await db.sequelize.query('UPDATE setups SET created_at = :at, updated_at = :at WHERE id = :id', { replacements: { at: createdAt, id: created.id }, transaction });
      return created;
    });
    ids.push(setup.id);
  }
  return ids;
}

/** The spam comments on the demo racers' public setups (setup-level, no replies). */
async function ensureSpamComments(db: Database, spammer: User): Promise<Array<number | null>> {
  const ids: Array<number | null> = [];
  for (const spam of SPAM_COMMENTS) {
    const setup = await db.models.Setup.findOne({ where: { title: spam.on, visibility: 'public', deletedAt: null } });
    if (!setup) {
      ids.push(null);
      continue;
    }
    const [comment] = await db.models.Comment.findOrCreate({
      where: { setupId: setup.id, authorId: spammer.id, bodyMd: spam.body },
      defaults: { setupId: setup.id, authorId: spammer.id, bodyMd: spam.body, createdAt: hoursAgo(spam.hoursAgo) },
    });
    ids.push(comment.id);
  }
  return ids;
}

async function revisionNoteOf(db: Database, setupId: number | undefined): Promise<number | null> {
  if (!setupId) return null;
  const revision = await db.models.SetupRevision.findOne({ where: { setupId, number: 2 } });
  return revision?.id ?? null;
}

/**
 * Seeds the spam account, its posts and the demo racers' reports on them. Idempotent: each row is
 * matched before it is made, and a report is filed only when that racer never reported that thing
 * (so a re-run does not reopen what a moderator already decided).
 */
export async function seedDemoModeration(db: Database, options: { bcryptCost: number }): Promise<void> {
  await ageDemoAccounts(db);
  const spammer = await ensureSpammer(db, options.bcryptCost);
  const setups = await ensureSpamSetups(db, spammer);
  const comments = await ensureSpamComments(db, spammer);
  const resolve = async (target: Target): Promise<{ type: ReportTargetType; id: number | null | undefined }> => {
    if ('setup' in target) return { type: 'setup', id: setups[target.setup] };
    if ('revisionOf' in target) return { type: 'revision', id: await revisionNoteOf(db, setups[target.revisionOf]) };
    if ('comment' in target) return { type: 'comment', id: comments[target.comment] };
    return { type: 'racer', id: spammer.id };
  };
  for (const report of DEMO_REPORTS) {
    const reporter = await db.models.User.findOne({ where: { handle: report.reporter } });
    const { type, id } = await resolve(report.target);
    if (!reporter || !id) continue;
    const [seen] = await db.sequelize.query('SELECT 1 FROM reports WHERE reporter_id = :reporter AND target_type = :type AND target_id = :id', {
      type: QueryTypes.SELECT,
      replacements: { reporter: reporter.id, type, id },
    });
    if (seen) continue;
    await fileReport(db, reporter, { targetType: type, targetId: id, reason: report.reason, note: report.note ?? '' });
  }
}
