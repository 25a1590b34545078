import type { ForkPreview, StockChoice } from '../../types/forks';
import { fieldValueSchema, getTemplate, type SetupFieldValue, type SetupTemplate, type TemplateField } from '../../types/templates';
import { VEHICLE_CLASSES, type VehicleClassKey } from '../../types/vehicleClasses';

type Value = SetupFieldValue;
type Values = Readonly<Record<string, Value>>;

export type OptionPartRow = ForkPreview['optionParts'][number];
export type DroppedRow = ForkPreview['dropped'][number];
export type FilledFromStockRow = ForkPreview['filledFromStock'][number];

/** What forking a sheet onto a car changes: the rows a racer is shown before the fork is made. */
export type StockForkPlan = {
  optionParts: OptionPartRow[];
  dropped: DroppedRow[];
  filledFromStock: FilledFromStockRow[];
};

export type StockForkInput = {
  sourceClass: VehicleClassKey;
  sourceValues: Values;
  targetClass: VehicleClassKey;
  /** The target car's kit: its stock sheet, and for choice fields the options that come in the box. */
  targetStock: { values: Values; inBox: Readonly<Record<string, readonly string[]>> };
  /** Flag choice values the target kit does not have in the box (stock car, or another kit). */
  checkOptionParts: boolean;
};

/** Section heading for a stored key that no sheet of either class has. */
const NOT_ON_SHEET_SECTION = 'Not on the sheet';

// Own properties only: a field named like an Object.prototype member ("constructor", "toString")
// must read as empty when it is missing, not as the inherited function.
function readField<T>(record: Readonly<Record<string, T>>, key: string): T | undefined {
  return Object.prototype.hasOwnProperty.call(record, key) ? record[key] : undefined;
}

function scaleOf(vehicleClass: string): string | undefined {
  return VEHICLE_CLASSES.find((c) => c.key === vehicleClass)?.scale;
}

/**
 * Whether a setup of one class can be forked onto a car of another: same scale only (1/8 with 1/8,
 * 1/10 with 1/10), because across scales hardly a number on the sheet means the same thing.
 */
export function forkCompatible(sourceClass: VehicleClassKey, targetClass: VehicleClassKey): boolean {
  const scale = scaleOf(sourceClass);
  return scale !== undefined && scale === scaleOf(targetClass);
}

type Placed = { field: TemplateField; section: string; index: number };
const placesCache = new WeakMap<SetupTemplate, ReadonlyMap<string, Placed>>();

/** Each field of a template with its section title and its position on the sheet. */
function places(template: SetupTemplate): ReadonlyMap<string, Placed> {
  let map = placesCache.get(template);
  if (!map) {
    const entries: Array<[string, Placed]> = [];
    for (const section of template.sections) {
      for (const field of section.fields) entries.push([field.key, { field, section: section.label, index: entries.length }]);
    }
    map = new Map(entries);
    placesCache.set(template, map);
  }
  return map;
}

/** Whether the field can hold the value as it is (type, options, hard limits, text length). */
function fits(field: TemplateField, value: unknown): boolean {
  return value !== undefined && fieldValueSchema(field).safeParse(value).success;
}

/**
 * A choice value the kit does not have in the box. A field the kit's record says nothing about is
 * not flagged (there is nothing to compare with), and neither is the kit's own stock value.
 */
function isOptionPart(inBox: StockForkInput['targetStock']['inBox'], key: string, value: Value, stockValue: Value): boolean {
  const options = readField(inBox, key);
  return Array.isArray(options) && !Object.is(value, stockValue) && !options.includes(String(value));
}

function rowOf(place: Placed | undefined, key: string): { key: string; label: string; section: string } {
  return place ? { key, label: place.field.label, section: place.section } : { key, label: key, section: NOT_ON_SHEET_SECTION };
}

/**
 * What a fork of `sourceValues` onto a car of `targetClass` keeps, drops and fills in, field by
 * field, in the order of the target sheet (dropped fields in the order of the source sheet):
 * - a source field the target sheet lacks is dropped;
 * - a target field the source lacks, or whose source value the target field cannot hold, takes the
 *   kit's stock value (filledFromStock); without a stock value the field stays empty, and a value
 *   the field cannot hold is dropped;
 * - with `checkOptionParts`, a kept choice value that the kit does not have in the box is an option
 *   part, listed beside the stock value the racer may take instead.
 */
export function planStockFork(input: StockForkInput): StockForkPlan {
  const target = places(getTemplate(input.targetClass));
  const source = places(getTemplate(input.sourceClass));
  const plan: StockForkPlan = { optionParts: [], dropped: [], filledFromStock: [] };
  const droppedAt: number[] = [];
  const drop = (key: string, value: Value, place: Placed | undefined) => {
    plan.dropped.push({ ...rowOf(place, key), value });
    droppedAt.push(source.get(key)?.index ?? Number.MAX_SAFE_INTEGER);
  };

  for (const [key, place] of target) {
    const stock = readField(input.targetStock.values, key);
    const stockValue = stock !== undefined && fits(place.field, stock) ? stock : undefined;
    const value = readField(input.sourceValues, key);
    if (value !== undefined && fits(place.field, value)) {
      if (input.checkOptionParts && place.field.type === 'choice' && stockValue !== undefined && isOptionPart(input.targetStock.inBox, key, value, stockValue)) {
        plan.optionParts.push({ ...rowOf(place, key), value, stockValue });
      }
    } else if (stockValue !== undefined) {
      plan.filledFromStock.push({ ...rowOf(place, key), value: value ?? null, stockValue });
    } else if (value !== undefined) {
      drop(key, value, place);
    }
  }
  for (const [key, value] of Object.entries(input.sourceValues)) {
    if (value !== undefined && !target.has(key)) drop(key, value, source.get(key));
  }
  plan.dropped = plan.dropped
    .map((row, i) => ({ row, at: droppedAt[i] }))
    .sort((a, b) => a.at - b.at || (a.row.key < b.row.key ? -1 : a.row.key > b.row.key ? 1 : 0))
    .map(({ row }) => row);
  return plan;
}

/**
 * The fork's values: the source sheet without the dropped fields, with stock values where the plan
 * fills from stock, and for each option part the stock value when the racer chose 'stock' (kept
 * otherwise, or when nothing was chosen).
 */
export function applyStockFork(
  plan: StockForkPlan,
  sourceValues: Values,
  targetStockValues: Values,
  choices: Readonly<Record<string, StockChoice>>,
): Record<string, Value> {
  // A Map, then entries, so that a field called "__proto__" stays an ordinary field.
  const entries = new Map(Object.entries(sourceValues).filter(([, v]) => v !== undefined));
  for (const row of plan.dropped) entries.delete(row.key);
  for (const row of plan.filledFromStock) entries.set(row.key, readField(targetStockValues, row.key) ?? row.stockValue);
  for (const row of plan.optionParts) {
    if (readField(choices, row.key) === 'stock') entries.set(row.key, readField(targetStockValues, row.key) ?? row.stockValue);
  }
  return Object.fromEntries(entries);
}
