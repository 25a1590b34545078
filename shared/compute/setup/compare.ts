import { fieldsByKey, getTemplate, type SetupTemplate } from '../../types/templates';
import type { VehicleClassKey } from '../../types/vehicleClasses';
import { computeSetupSummary, type SetupSummaryFigures } from './summary';

type Value = number | string | boolean;
type Values = Readonly<Record<string, Value>>;

/** One side of a comparison: a sheet's stored values and the class whose template reads them. */
export type ComparedSheet = { vehicleClass: VehicleClassKey; values: Values };

/** A field both sheets can hold; `null` where a sheet leaves it empty. */
export type CompareRow = { key: string; label: string; a: Value | null; b: Value | null; changed: boolean };

export type CompareSection = { key: string; title: string; rows: CompareRow[] };

/** A field only one side's class has, with that side's value and the section it sits in there. */
export type OneSideField = { key: string; label: string; section: string; value: Value };

/** How a computed figure reads: a ratio, a length in mm, an angle in degrees or a speed in km/h. */
export type ComputedUnit = 'ratio' | 'mm' | 'deg' | 'km/h';

export type ComputedRow = {
  key: keyof SetupSummaryFigures;
  label: string;
  unit: ComputedUnit;
  a: number | null;
  b: number | null;
  changed: boolean;
};

export type SheetComparison = {
  /** Fields both classes have, grouped by A's sections in A's order; empty on both sides left out. */
  sections: CompareSection[];
  onlyInA: OneSideField[];
  onlyInB: OneSideField[];
  /** The summary figures of each sheet (summary.ts), where either side has one. */
  computed: ComputedRow[];
  /** Changed rows across `sections`: fields only one class has are not counted as changes. */
  changedCount: number;
};

/** Section of values whose key neither side's template knows (a field retired from the sheet). */
export const OTHER_SECTION = { key: 'other', title: 'Not on the current sheet' } as const;

const COMPUTED: ReadonlyArray<{ key: keyof SetupSummaryFigures; label: string; unit: ComputedUnit }> = [
  { key: 'gearRatio', label: 'Gear ratio', unit: 'ratio' },
  { key: 'internalDiffRatio', label: 'Diff ratio', unit: 'ratio' },
  { key: 'finalDriveRatio', label: 'Final drive', unit: 'ratio' },
  { key: 'rolloutMm', label: 'Rollout per turn', unit: 'mm' },
  { key: 'totalRearToeDeg', label: 'Total rear toe', unit: 'deg' },
  { key: 'electricTopSpeedKmh', label: 'Top speed with no load', unit: 'km/h' },
];

// Own properties only, as in diff.ts: a field named like a built-in must read as empty.
function read(values: Values, key: string): Value | null {
  return Object.prototype.hasOwnProperty.call(values, key) ? values[key] : null;
}

function sectionOf(template: SetupTemplate): Map<string, { key: string; title: string }> {
  const map = new Map<string, { key: string; title: string }>();
  for (const section of template.sections) {
    for (const field of section.fields) map.set(field.key, { key: section.key, title: section.label });
  }
  return map;
}

function oneSide(template: SetupTemplate, values: Values, otherTemplate: SetupTemplate, otherValues: Values): OneSideField[] {
  const other = fieldsByKey(otherTemplate);
  return template.sections.flatMap((section) =>
    section.fields
      // A stray value on the other side under this key makes it a compared row instead.
      .filter((field) => !other.has(field.key) && read(otherValues, field.key) === null)
      .flatMap((field) => {
        const value = read(values, field.key);
        return value === null ? [] : [{ key: field.key, label: field.label, section: section.label, value }];
      }),
  );
}

// Two computations of one figure from equal inputs agree exactly; this only absorbs the last bit
// of float noise between, say, 46/17 and 92/34 (common practice).
function sameFigure(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  return Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));
}

function computedRows(a: ComparedSheet, b: ComparedSheet): ComputedRow[] {
  const figuresA = computeSetupSummary(a.vehicleClass, a.values);
  const figuresB = computeSetupSummary(b.vehicleClass, b.values);
  return COMPUTED.flatMap(({ key, label, unit }) => {
    const va = figuresA[key].value;
    const vb = figuresB[key].value;
    if (va === null && vb === null) return [];
    return [{ key, label, unit, a: va, b: vb, changed: !sameFigure(va, vb) }];
  });
}

/** Keys compared as rows: on both templates, or outside the template of the side that holds them. */
function rowKeys(a: ComparedSheet, b: ComparedSheet, fieldsA: ReadonlyMap<string, unknown>, fieldsB: ReadonlyMap<string, unknown>): string[] {
  const shared = [...fieldsA.keys()].filter((key) => fieldsB.has(key));
  const stray = [
    ...Object.keys(a.values).filter((key) => !fieldsA.has(key)),
    ...Object.keys(b.values).filter((key) => !fieldsB.has(key)),
  ].sort();
  return [...new Set([...shared, ...stray])];
}

/**
 * Two sheets side by side, for the compare screen: every field both classes have, in the order of
 * A's sheet, marked changed where the stored values differ (compared like diffSetupValues, so a
 * value on one side only is a change); fields only one class has (a nitro clutch bell against an
 * electric pinion) listed apart; and the computed figures of each, worked out by summary.ts.
 */
export function compareSheets(a: ComparedSheet, b: ComparedSheet): SheetComparison {
  const templateA = getTemplate(a.vehicleClass);
  const templateB = getTemplate(b.vehicleClass);
  const fieldsA = fieldsByKey(templateA);
  const fieldsB = fieldsByKey(templateB);
  const sectionsA = sectionOf(templateA);
  const sections = new Map<string, CompareSection>();
  for (const section of templateA.sections) sections.set(section.key, { key: section.key, title: section.label, rows: [] });
  sections.set(OTHER_SECTION.key, { ...OTHER_SECTION, rows: [] });
  let changedCount = 0;
  for (const key of rowKeys(a, b, fieldsA, fieldsB)) {
    const va = read(a.values, key);
    const vb = read(b.values, key);
    if (va === null && vb === null) continue;
    const changed = !Object.is(va, vb);
    if (changed) changedCount += 1;
    const inBoth = fieldsA.has(key) && fieldsB.has(key);
    const section = inBoth ? sectionsA.get(key)!.key : OTHER_SECTION.key;
    const label = fieldsA.get(key)?.label ?? fieldsB.get(key)?.label ?? key;
    sections.get(section)!.rows.push({ key, label, a: va, b: vb, changed });
  }
  return {
    sections: [...sections.values()].filter((section) => section.rows.length > 0),
    onlyInA: oneSide(templateA, a.values, templateB, b.values),
    onlyInB: oneSide(templateB, b.values, templateA, a.values),
    computed: computedRows(a, b),
    changedCount,
  };
}
