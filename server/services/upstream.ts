import type { Transaction } from 'sequelize';
import { diffSetupValues } from '../../shared/compute/setup/diff';
import { applyMerge, threeWayMerge, upstreamChanges, type FieldMerge, type MergeChoice } from '../../shared/compute/setup/merge';
import { ERROR_CODES } from '../../shared/types/errors';
import { upstreamApplySchema, type Upstream, type UpstreamApply, type UpstreamRow } from '../../shared/types/forks';
import { CHANGE_NOTE_MAX, type StoredSetupValues } from '../../shared/types/setups';
import { getTemplate, type SetupFieldValue, type SetupTemplate, type TemplateField } from '../../shared/types/templates';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Setup } from '../models/Setup';
import type { SetupRevision } from '../models/SetupRevision';
import type { User } from '../models/User';
import { findOwnSetup } from './setupAccess';
import { validatedValues } from './setups';
import { revisionSaved, staleRevisionError } from './revisions';

type Original = { setup: Setup; ownerHandle: string };
type SyncState = { theirs: SetupRevision; mine: SetupRevision; syncedNumber: number; base: StoredSetupValues; rows: FieldMerge[]; offered: FieldMerge[] };
type Placed = { field: TemplateField; section: string; order: number };

const placesCache = new WeakMap<SetupTemplate, ReadonlyMap<string, Placed>>();

/** Each field of a class's sheet with its section title and position, so rows read in sheet order. */
function placesOf(template: SetupTemplate): ReadonlyMap<string, Placed> {
  let places = placesCache.get(template);
  if (!places) {
    const entries = template.sections.flatMap((section) => section.fields.map((field) => ({ field, section: section.label })));
    places = new Map(entries.map((entry, order) => [entry.field.key, { ...entry, order }]));
    placesCache.set(template, places);
  }
  return places;
}

function inSheetOrder(places: ReadonlyMap<string, Placed>, keys: Iterable<string>): string[] {
  const position = (key: string) => places.get(key)?.order ?? Number.MAX_SAFE_INTEGER;
  return [...keys].sort((a, b) => position(a) - position(b) || a.localeCompare(b));
}

/**
 * The setup a fork came from, while it can still be read from: not deleted or hidden, and public,
 * unlisted (the fork's owner had the link once) or the fork owner's own. Null otherwise.
 */
async function findOriginal(db: Database, fork: Setup, transaction?: Transaction): Promise<Original | null> {
  const setup = await db.models.Setup.findByPk(fork.forkedFromSetupId!, {
    transaction,
    include: [{ model: db.models.User, as: 'owner', attributes: ['handle'] }],
  });
  if (!setup || setup.deletedAt || setup.hiddenAt || !setup.currentRevisionId) return null;
  if (setup.visibility === 'private' && setup.ownerId !== fork.ownerId) return null;
  return { setup, ownerHandle: setup.owner?.handle ?? '' };
}

/**
 * The three sheets of the comparison, read in one query: the original now (theirs), the fork now
 * (mine) and, per field, what the fork last synced to (base), which is the fork point until the
 * first sync.
 */
async function loadSyncState(db: Database, fork: Setup, original: Setup, transaction?: Transaction): Promise<SyncState> {
  const syncedId = fork.upstreamRevisionId ?? fork.forkedFromRevisionId;
  const ids = [fork.currentRevisionId, original.currentRevisionId, syncedId, fork.forkedFromRevisionId].filter((id): id is number => id !== null);
  const revisions = new Map((await db.models.SetupRevision.findAll({ where: { id: ids }, transaction })).map((r) => [r.id, r]));
  const theirs = revisions.get(original.currentRevisionId!)!;
  const mine = revisions.get(fork.currentRevisionId!)!;
  const base = fork.upstreamBaseValues ?? revisions.get(fork.forkedFromRevisionId ?? 0)?.values ?? {};
  const places = placesOf(getTemplate(fork.vehicleClass));
  const merged = threeWayMerge(base, theirs.values, mine.values);
  const byKey = new Map(upstreamChanges(merged).map((row) => [row.key, row]));
  const offered = inSheetOrder(places, byKey.keys()).map((key) => byKey.get(key)!);
  return { theirs, mine, syncedNumber: revisions.get(syncedId ?? 0)?.number ?? 0, base, rows: merged, offered };
}

function toRow(places: ReadonlyMap<string, Placed>, row: FieldMerge): UpstreamRow {
  const place = places.get(row.key);
  return {
    key: row.key,
    label: place?.field.label ?? row.key,
    section: place?.section ?? 'Other',
    base: row.base ?? null,
    theirs: row.theirs ?? null,
    mine: row.mine ?? null,
    status: row.status === 'conflict' ? 'conflict' : 'theirs-only',
  };
}

/**
 * What the original changed since this fork last took its changes, field by field: only the
 * original changed it (theirs-only), or both did, differently (conflict). The owner's alone; a
 * fork whose original is deleted, hidden or now private to its owner gets 'unavailable'.
 */
export async function getUpstream(db: Database, user: User, setupId: number): Promise<Upstream> {
  const fork = await findOwnSetup(db, user.id, setupId);
  if (!fork.forkedFromSetupId) return { status: 'not-a-fork' };
  const original = await findOriginal(db, fork);
  if (!original) return { status: 'unavailable' };
  const state = await loadSyncState(db, fork, original.setup);
  const places = placesOf(getTemplate(fork.vehicleClass));
  return {
    status: 'available',
    original: {
      setupId: original.setup.id,
      title: original.setup.title,
      ownerHandle: original.ownerHandle,
      revisionId: state.theirs.id,
      revisionNumber: state.theirs.number,
    },
    syncedRevisionNumber: state.syncedNumber,
    mineRevisionId: state.mine.id,
    rows: state.offered.map((row) => toRow(places, row)),
  };
}

// ---- Change note ----

const numberText = (value: number) => value.toLocaleString('en-GB', { maximumFractionDigits: 3 });

/** Unit written after a number: angles and percentages touch it, counts of teeth need no unit. */
function unitSuffix(field: TemplateField | undefined): string {
  if (!field || (field.type !== 'number' && field.type !== 'integer') || !field.unit || field.unit === 'teeth') return '';
  return field.unit === 'deg' ? '°' : field.unit === '%' ? '%' : ` ${field.unit}`;
}

function valueText(field: TemplateField | undefined, value: SetupFieldValue | undefined): string {
  if (value === undefined || value === '') return 'not set';
  if (typeof value === 'number') return `${field?.type === 'position' ? 'hole ' : ''}${numberText(value)}${unitSuffix(field)}`;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (field?.type === 'choice') return field.options.find((o) => o.value === value)?.label ?? value;
  return `“${value}”`;
}

/** "Rear diff oil 7,000 → 10,000 cSt": the unit once when both sides are numbers. */
function changeText(place: Placed | undefined, row: FieldMerge): string {
  const field = place?.field;
  const label = field?.label ?? row.key;
  if (typeof row.mine === 'number' && typeof row.theirs === 'number' && field?.type !== 'position') {
    return `${label} ${numberText(row.mine)} → ${numberText(row.theirs)}${unitSuffix(field)}`;
  }
  return `${label} ${valueText(field, row.mine)} → ${valueText(field, row.theirs)}`;
}

/** The note of a sync revision, listing as many changes as fit under the note limit and counting the rest. */
function syncNote(original: Original, theirs: SetupRevision, items: string[]): string {
  const count = `${items.length} change${items.length === 1 ? '' : 's'}`;
  const head = `Took ${count} from “${original.setup.title}” by @${original.ownerHandle} (revision ${theirs.number})`;
  for (let shown = items.length; shown > 0; shown -= 1) {
    const rest = items.length - shown;
    const note = `${head}: ${items.slice(0, shown).join('; ')}${rest ? `; and ${rest} more` : ''}.`;
    if (note.length <= CHANGE_NOTE_MAX) return note;
  }
  return `${head}.`;
}

// ---- Applying ----


function fieldNames(places: ReadonlyMap<string, Placed>, keys: string[]): string {
  return keys.map((key) => `“${places.get(key)?.field.label ?? key}”${places.has(key) ? ` (${key})` : ''}`).join(', ');
}

/** Every chosen field must be one of the rows on offer; 400 naming those that are not. */
function checkChoices(places: ReadonlyMap<string, Placed>, offered: FieldMerge[], take: string[], dismiss: string[]): void {
  const keys = new Set(offered.map((row) => row.key));
  const details: Record<string, string> = {};
  for (const [list, chosen] of [['take', take], ['dismiss', dismiss]] as const) {
    const unknown = chosen.filter((key) => !keys.has(key));
    if (unknown.length) {
      details[list] = `The original has no change to offer for ${fieldNames(places, unknown)}. Look at its changes again and choose from those.`;
    }
  }
  if (Object.keys(details).length) throw ApiError.validation(details, 'Some chosen fields are not among the original’s changes.');
}

/** Base after a sync: the original's value for each taken or dismissed field, the old base elsewhere. */
function nextBase(base: StoredSetupValues, theirs: StoredSetupValues, keys: string[]): StoredSetupValues {
  const entries = new Map(Object.entries(base));
  for (const key of keys) {
    if (Object.prototype.hasOwnProperty.call(theirs, key)) entries.set(key, theirs[key]);
    else entries.delete(key);
  }
  return Object.fromEntries(entries);
}

/**
 * Takes the chosen fields of the original's changes into the fork as one new revision with a note
 * naming them, and remembers taken and dismissed fields so they are not offered again until the
 * original changes them once more. Skipped fields stay on offer. The fork row is locked for the
 * transaction, so a sync and a save from the same base cannot both win.
 */
export async function applyUpstream(db: Database, user: User, setupId: number, input: UpstreamApply): Promise<{ setupId: number; taken: number }> {
  const data = upstreamApplySchema.parse(input);
  const take = [...new Set(data.take)];
  const dismiss = [...new Set(data.dismiss)];
  const both = take.filter((key) => dismiss.includes(key));
  const found = await findOwnSetup(db, user.id, setupId);
  const places = placesOf(getTemplate(found.vehicleClass));
  if (both.length) {
    throw ApiError.validation({ dismiss: `${fieldNames(places, both)} cannot be both taken and dismissed; choose one.` }, 'Choose to take or to dismiss each change, not both.');
  }
  const result = await db.sequelize.transaction(async (transaction) => {
    const fork = await db.models.Setup.findByPk(found.id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!fork || fork.deletedAt) throw ApiError.notFound('That setup');
    if (!fork.forkedFromSetupId) throw ApiError.validation({ setupId: 'This setup is not a fork: there is no original to take changes from.' });
    if (fork.currentRevisionId !== data.baseRevisionId) throw await staleRevisionError(db, fork, transaction, 'This setup changed since you opened it. Nothing was taken; look at the original’s changes again.');
    const original = await findOriginal(db, fork, transaction);
    if (!original) {
      throw new ApiError(409, ERROR_CODES.conflict, 'The original setup was deleted, hidden or made private, so its changes can no longer be taken. Your setup is unchanged.');
    }
    const state = await loadSyncState(db, fork, original.setup, transaction);
    if (state.theirs.id !== data.theirsRevisionId) {
      throw new ApiError(
        409,
        ERROR_CODES.upstreamMoved,
        `“${original.setup.title}” has a newer revision (${state.theirs.number}) since you looked. Nothing was taken; look at its changes again.`,
        { originalRevision: { id: state.theirs.id, number: state.theirs.number } },
      );
    }
    checkChoices(places, state.offered, take, dismiss);
    const update: Partial<Pick<Setup, 'currentRevisionId' | 'revisionCount' | 'upstreamBaseValues' | 'upstreamRevisionId'>> = {
      upstreamBaseValues: nextBase(state.base, state.theirs.values, [...take, ...dismiss]),
      upstreamRevisionId: state.theirs.id,
    };
    if (take.length) {
      const choices: Record<string, MergeChoice> = Object.fromEntries(take.map((key) => [key, 'theirs']));
      const { values } = validatedValues(fork.vehicleClass, applyMerge(state.mine.values, state.rows, choices));
      const items = state.offered.filter((row) => take.includes(row.key)).map((row) => changeText(places.get(row.key), row));
      const revision = await db.models.SetupRevision.create(
        {
          setupId: fork.id,
          number: fork.revisionCount + 1,
          values,
          changeNote: syncNote(original, state.theirs, items),
          authorId: user.id,
          // Against the fork's own sheet before the sync (its current revision), as for any save.
          changedFieldCount: diffSetupValues(state.mine.values, values).length,
        },
        { transaction },
      );
      Object.assign(update, { currentRevisionId: revision.id, revisionCount: fork.revisionCount + 1 });
    }
    await fork.update(update, { transaction });
    return { fork, revision: take.length ? (update.currentRevisionId ?? null) : null, taken: take.length };
  });
  // Forks of this fork hear about the new revision like any other save, once it is committed.
  if (result.revision !== null) {
    const revision = await db.models.SetupRevision.findByPk(result.revision);
    if (revision) await revisionSaved(db, result.fork, revision);
  }
  return { setupId: result.fork.id, taken: result.taken };
}
