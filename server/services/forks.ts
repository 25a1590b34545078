import crypto from 'node:crypto';
import { z } from 'zod';
import { applyStockFork, forkCompatible, planStockFork, type StockForkPlan } from '../../shared/compute/setup/stockFork';
import { forkRequestSchema, type ForkPreview } from '../../shared/types/forks';
import { getTemplate } from '../../shared/types/templates';
import { vehicleClassLabel } from '../../shared/types/vehicleClasses';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Car } from '../models/Car';
import type { Setup } from '../models/Setup';
import type { SetupRevision } from '../models/SetupRevision';
import type { User } from '../models/User';
import { findOwnCar } from './garage';
import { assertNewAccountMayPost } from './moderation/limits';
import { findViewableSetup } from './setupAccess';
import { validatedValues } from './setups';

/** Ids are PostgreSQL integers: a bigger number can name nothing, and must not reach a query. */
const MAX_ID = 2_147_483_647;

function queryId(name: string, missing: string) {
  return z
    .string({ error: (issue) => (issue.input === undefined ? missing : `Give ${name} once, as a number.`) })
    .regex(/^\d+$/, { error: `${name} must be a whole number, such as 12.` })
    .transform(Number)
    .refine((n) => n >= 1 && n <= MAX_ID, { error: `${name} must be a number from 1 to ${MAX_ID}.` });
}

/** `GET /api/setups/:id/fork-preview?carId=N[&revisionId=R][&share=T]`: every value arrives as a string. */
const previewQuerySchema = z.object({
  carId: queryId('carId', 'Pick the car to fork onto (carId).'),
  revisionId: queryId('revisionId', 'Pick a revision of the setup (revisionId).').optional(),
  share: z.string({ error: 'Give the share token once.' }).max(60, 'That share token is too long.').optional(),
});

type ForkTarget = { carId: number; revisionId?: number; share?: string };

/** Everything a preview shows and a fork is made from; both go through here so they always agree. */
type PreparedFork = {
  source: Setup;
  revision: SetupRevision;
  ownerHandle: string;
  sourceKitName: string;
  car: Car;
  checkOptionParts: boolean;
  plan: StockForkPlan;
};

function refuseOversizedIds(target: ForkTarget): void {
  const problems: Record<string, string> = {};
  if (target.carId > MAX_ID) problems.carId = 'Pick one of your cars.';
  if (target.revisionId !== undefined && target.revisionId > MAX_ID) problems.revisionId = 'That revision is not part of this setup.';
  if (Object.keys(problems).length) throw ApiError.validation(problems);
}

async function prepareFork(db: Database, user: User, sourceId: number, target: ForkTarget): Promise<PreparedFork> {
  const source = await findViewableSetup(db, sourceId, user, target.share);
  const car = await findOwnCar(db, user.id, target.carId);
  const kit = car.kit!;
  if (!forkCompatible(source.vehicleClass, kit.vehicleClass)) {
    throw ApiError.validation({
      carId: `This setup is for a ${vehicleClassLabel(source.vehicleClass)} and ${car.nickname} is a ${vehicleClassLabel(kit.vehicleClass)}: a setup can be forked onto a car of the same scale only.`,
    });
  }
  const revision = await db.models.SetupRevision.findOne({ where: { id: target.revisionId ?? source.currentRevisionId!, setupId: source.id } });
  if (!revision) throw ApiError.validation({ revisionId: 'That revision is not part of this setup.' });
  const [owner, sourceCar] = await Promise.all([
    db.models.User.findByPk(source.ownerId),
    db.models.Car.findByPk(source.carId, { include: [{ model: db.models.Kit, as: 'kit' }] }),
  ]);
  const checkOptionParts = car.stock || sourceCar?.kitId !== car.kitId;
  const plan = planStockFork({
    sourceClass: source.vehicleClass,
    sourceValues: revision.values,
    targetClass: kit.vehicleClass,
    targetStock: { values: kit.stockValues, inBox: kit.stockInBox },
    checkOptionParts,
  });
  return { source, revision, ownerHandle: owner?.handle ?? 'unknown', sourceKitName: sourceCar?.kit?.name ?? '', car, checkOptionParts, plan };
}

/**
 * What forking a setup onto one of my cars would do, before it is done: the option parts it
 * assumes that my kit does not have in the box, the fields my car's sheet has no place for, and
 * the fields taken from my kit's stock sheet. `query` is the request's query string.
 */
export async function previewFork(db: Database, user: User, sourceId: number, query: unknown): Promise<ForkPreview> {
  const target = previewQuerySchema.parse(query);
  const { source, revision, ownerHandle, sourceKitName, car, checkOptionParts, plan } = await prepareFork(db, user, sourceId, target);
  return {
    source: {
      setupId: source.id,
      revisionId: revision.id,
      revisionNumber: revision.number,
      title: source.title,
      ownerHandle,
      vehicleClass: source.vehicleClass,
      kitName: sourceKitName,
    },
    target: { carId: car.id, nickname: car.nickname, kitName: car.kit!.name, vehicleClass: car.kit!.vehicleClass, stock: car.stock },
    checkedOptionParts: checkOptionParts,
    ...plan,
  };
}

/** Called once a fork exists (notifications hook in here later); must not throw. */
export type ForkListener = (fork: Setup, source: Setup) => void;
const listeners: ForkListener[] = [];
export function onSetupForked(listener: ForkListener): void {
  listeners.push(listener);
}

/** Labels for a change note: the first few, then how many more, so a note stays readable. */
function labelList(rows: ReadonlyArray<{ label: string }>, shown = 6): string {
  const labels = rows.map((row) => row.label);
  return labels.length <= shown ? labels.join(', ') : `${labels.slice(0, shown).join(', ')} and ${labels.length - shown} more`;
}

function forkChangeNote(prepared: PreparedFork, stockTaken: StockForkPlan['optionParts']): string {
  const { source, revision, ownerHandle, car, plan } = prepared;
  const sentences = [`Forked from “${source.title}” by @${ownerHandle} (revision ${revision.number}).`];
  if (stockTaken.length) sentences.push(`Stock values instead of option parts: ${labelList(stockTaken)}.`);
  if (plan.dropped.length) sentences.push(`Left out, not on this car's sheet: ${labelList(plan.dropped)}.`);
  if (plan.filledFromStock.length) sentences.push(`From the ${car.kit!.name} stock sheet: ${labelList(plan.filledFromStock)}.`);
  return sentences.join(' ');
}

/**
 * Copies a setup the racer may see into their garage, in one transaction: a new private setup whose
 * revision 1 holds the chosen revision's values as fitted to the racer's car (see planStockFork),
 * with where it came from and its family root. A fork is a snapshot: nothing done to the original
 * later changes it. Cars of another class are accepted within the same scale.
 */
export async function forkSetup(db: Database, user: User, sourceId: number, input: unknown): Promise<Setup> {
  const data = forkRequestSchema.parse(input);
  refuseOversizedIds(data);
  await assertNewAccountMayPost(db, user, { kind: 'setup' });
  const prepared = await prepareFork(db, user, sourceId, data);
  const { source, revision, car, plan } = prepared;
  const vehicleClass = car.kit!.vehicleClass;
  const forkValues = applyStockFork(plan, revision.values, car.kit!.stockValues, data.stockChoices);
  const { values } = validatedValues(vehicleClass, forkValues);
  const stockTaken = plan.optionParts.filter((row) => Object.hasOwn(data.stockChoices, row.key) && data.stockChoices[row.key] === 'stock');

  // One statement, so one round trip and one commit: the revision's id is drawn first, the setup
  // is written already pointing at it (that foreign key is checked at commit), then the revision.
  // Writing the setup once, rather than inserting it and updating it to point at its revision,
  // also spares a second version of the row and of its index entries.
  const [fork] = await db.sequelize.query(
    `WITH ids AS (SELECT CAST(nextval('setup_revisions_id_seq') AS integer) AS revision_id),
     created AS (
       INSERT INTO setups (owner_id, car_id, vehicle_class, template_version, title, visibility, share_token, track_type,
                           temperature_c, grip, notes_md, forked_from_setup_id, forked_from_revision_id, upstream_revision_id,
                           family_root_id, current_revision_id, revision_count, created_at, updated_at)
       SELECT :ownerId, :carId, :vehicleClass, :templateVersion, :title, 'private', :shareToken, :trackType,
              :temperatureC, :grip, '', :sourceId, :revisionId, :revisionId, :familyRootId, ids.revision_id, 1, now(), now()
         FROM ids
       RETURNING *),
     first AS (
       INSERT INTO setup_revisions (id, setup_id, number, values, change_note, author_id, changed_field_count, created_at)
       SELECT ids.revision_id, created.id, 1, CAST(:values AS jsonb), :changeNote, :ownerId, 0, now() FROM ids, created
       RETURNING id)
     SELECT created.* FROM created, first`,
    {
      replacements: {
        ownerId: user.id,
        carId: car.id,
        vehicleClass,
        templateVersion: getTemplate(vehicleClass).version,
        title: data.title ?? source.title,
        shareToken: crypto.randomBytes(18).toString('base64url'),
        trackType: source.trackType,
        temperatureC: source.temperatureC,
        grip: source.grip,
        sourceId: source.id,
        revisionId: revision.id,
        familyRootId: source.familyRootId ?? source.id,
        values: JSON.stringify(values),
        changeNote: forkChangeNote(prepared, stockTaken),
      },
      model: db.models.Setup,
      mapToModel: true,
    },
  );
  for (const listener of listeners) listener(fork, source);
  return fork;
}
