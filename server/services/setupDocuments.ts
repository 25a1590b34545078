import type { SetupDocument } from '../../shared/types/setups';
import { SETUP_DOCUMENT_FORMAT, SETUP_DOCUMENT_VERSION, setupDocumentSchema } from '../../shared/types/setups';
import { getTemplate, listFields } from '../../shared/types/templates';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Setup } from '../models/Setup';
import type { User } from '../models/User';
import { createSetupWithValues } from './setupImport';
import { conditionsOf } from './setupDto';
import { hiddenNoticeOf, visibleChangeNote } from './moderation/visibility';

/**
 * Tunefork's JSON document for one setup at its current revision. A change note moderators hid is
 * left out unless `viewer` wrote it or moderates.
 */
export async function exportSetupDocument(db: Database, setup: Setup, viewer?: Pick<User, 'id' | 'role'>): Promise<SetupDocument> {
  const [revision, car, noteHidden] = await Promise.all([
    db.models.SetupRevision.findByPk(setup.currentRevisionId!),
    db.models.Car.findByPk(setup.carId, { include: [{ model: db.models.Kit, as: 'kit', include: [{ model: db.models.Maker, as: 'maker' }] }] }),
    hiddenNoticeOf(db, 'revision', setup.currentRevisionId!).then((notice) => notice !== null),
  ]);
  const changeNote = visibleChangeNote(revision!.changeNote, noteHidden, revision!.authorId, viewer);
  return {
    format: SETUP_DOCUMENT_FORMAT,
    formatVersion: SETUP_DOCUMENT_VERSION,
    exportedAt: new Date().toISOString(),
    setup: {
      title: setup.title,
      vehicleClass: setup.vehicleClass,
      templateVersion: setup.templateVersion,
      kit: { maker: car!.kit!.maker?.name ?? '', name: car!.kit!.name },
      conditions: conditionsOf(setup),
      notesMarkdown: setup.notesMd,
      revision: { number: revision!.number, createdAt: revision!.createdAt.toISOString(), changeNote },
      values: revision!.values,
    },
  };
}

function csvCell(value: unknown): string {
  const s = value === undefined || value === null ? '' : String(value);
  // Quote always; double inner quotes; a leading =,+,- or @ is prefixed so spreadsheets never run it.
  const safe = /^[=+\-@\t\r]/.test(s) && !/^-?\d/.test(s) ? `'${s}` : s;
  return `"${safe.replace(/"/g, '""')}"`;
}

/** One row per template field: section, field key, label, value, unit. */
export async function exportSetupCsv(db: Database, setup: Setup): Promise<string> {
  const revision = await db.models.SetupRevision.findByPk(setup.currentRevisionId!);
  const template = getTemplate(setup.vehicleClass);
  const rows = [['section', 'key', 'label', 'value', 'unit'].map(csvCell).join(',')];
  for (const section of template.sections) {
    for (const field of section.fields) {
      const unit = 'unit' in field && field.unit ? field.unit : '';
      rows.push([section.label, field.key, field.label, revision!.values[field.key], unit].map(csvCell).join(','));
    }
  }
  return `${rows.join('\r\n')}\r\n`;
}

/** Reads our JSON document and creates a new private setup on one of my cars. */
export async function importSetupDocument(db: Database, owner: User, carId: number, document: unknown): Promise<Setup> {
  const parsed = setupDocumentSchema.safeParse(document);
  if (!parsed.success) {
    const details: Record<string, string> = {};
    for (const issue of parsed.error.issues) details[`document.${issue.path.join('.')}`] = issue.message;
    throw ApiError.validation(details, 'That file is not a Tunefork setup document (format tunefork.setup, version 1).');
  }
  const known = new Set(listFields(getTemplate(parsed.data.setup.vehicleClass)).map((f) => f.key));
  const unknown = Object.keys(parsed.data.setup.values).filter((k) => !known.has(k));
  if (unknown.length) {
    throw ApiError.validation(Object.fromEntries(unknown.map((k) => [`values.${k}`, `"${k}" is not a field of this class's sheet.`])));
  }
  return createSetupWithValues(db, owner, carId, parsed.data);
}
