import type { KitSummary } from '../../shared/types/catalog';
import type { KitStock } from '../../shared/types/setups';
import { setupValuesSchema } from '../../shared/types/setups';
import { getTemplate, listFields, validateSetupValues } from '../../shared/types/templates';
import { vehicleClassKeySchema } from '../../shared/types/vehicleClasses';
import { z } from 'zod';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import { getKitStock } from './catalog';

export const kitCreateSchema = z.object({
  makerName: z.string().trim().min(2, 'Name the maker.').max(120),
  name: z.string().trim().min(1, 'Name the kit.').max(120),
  vehicleClass: vehicleClassKeySchema,
  releasedYear: z.number().int().min(1970).max(2100).nullable().default(null),
});

export const kitStockUpdateSchema = z.object({
  values: setupValuesSchema,
  /** For each choice field, the options in the box; options not listed are option parts. */
  inBox: z.record(z.string(), z.array(z.string())),
});

const slugify = (s: string) => s.normalize('NFKD').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 80);

/** Adds a kit (and its maker when new). Its stock sheet starts empty until an admin fills it. */
export async function createKit(db: Database, input: unknown): Promise<KitSummary> {
  const data = kitCreateSchema.parse(input);
  const makerSlug = slugify(data.makerName);
  if (!makerSlug) throw ApiError.validation({ makerName: 'Use letters or digits in the maker name.' });
  const [maker] = await db.models.Maker.findOrCreate({ where: { slug: makerSlug }, defaults: { slug: makerSlug, name: data.makerName } });
  const slug = slugify(`${maker.slug}-${data.name}`);
  if (await db.models.Kit.findOne({ where: { slug } })) {
    throw new ApiError(409, 'conflict', 'That maker already has a kit with this name.', { name: 'Already in the catalogue.' });
  }
  const kit = await db.models.Kit.create({
    slug,
    name: data.name,
    makerId: maker.id,
    vehicleClass: data.vehicleClass,
    releasedYear: data.releasedYear,
    templateVersion: getTemplate(data.vehicleClass).version,
  });
  return { id: kit.id, slug: kit.slug, name: kit.name, makerName: maker.name, vehicleClass: kit.vehicleClass, releasedYear: kit.releasedYear };
}

/** Replaces a kit's stock sheet, checked against its class template like any setup. */
export async function updateKitStock(db: Database, kitId: number, input: unknown): Promise<KitStock> {
  const kit = Number.isSafeInteger(kitId) ? await db.models.Kit.findByPk(kitId) : null;
  if (!kit) throw ApiError.notFound('That kit');
  const data = kitStockUpdateSchema.parse(input);
  const template = getTemplate(kit.vehicleClass);
  const checked = validateSetupValues(template, data.values);
  if (!checked.ok) throw ApiError.validation(checked.errors, 'Some stock values need fixing.');
  const choices = new Map(listFields(template).flatMap((f) => (f.type === 'choice' ? [[f.key, f.options.map((o) => o.value)] as const] : [])));
  const problems: Record<string, string> = {};
  for (const [key, options] of Object.entries(data.inBox)) {
    const allowed = choices.get(key);
    if (!allowed) problems[`inBox.${key}`] = `"${key}" is not a choice on this class's sheet.`;
    else if (options.some((o) => !allowed.includes(o))) problems[`inBox.${key}`] = `Pick options from: ${allowed.join(', ')}.`;
  }
  for (const [key, value] of Object.entries(checked.values)) {
    const inBox = data.inBox[key];
    if (choices.has(key) && inBox && !inBox.includes(String(value)) && !problems[`inBox.${key}`]) problems[`inBox.${key}`] = 'The stock value must be one of the options in the box.';
  }
  if (Object.keys(problems).length) throw ApiError.validation(problems, 'The in-the-box options need fixing.');
  await kit.update({ stockValues: checked.values as KitStock['values'], stockInBox: data.inBox, templateVersion: template.version });
  return getKitStock(db, kit.id);
}
