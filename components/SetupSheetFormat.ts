import { formatForDisplay, type UnitKind } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import type { SetupConditions } from '../shared/types/setups';
import type { FieldUnit, SetupFieldValue, TemplateField, TemplateSection } from '../shared/types/templates';
import { trackTypeLabel } from '../shared/types/trackTypes';

/** Only lengths and temperatures follow the racer's preference; other units show as stored. */
function unitKind(unit: FieldUnit | null): UnitKind {
  if (unit === 'mm') return 'length';
  if (unit === '°C') return 'temperature';
  return unit ?? '';
}

// Angles are written touching the number (2.5°), so the template's "deg" reads as the symbol.
function passThroughLabel(unit: FieldUnit | null): string {
  if (unit === 'deg') return '°';
  return unit ?? '';
}

/**
 * A stored value as the racer reads it: lengths and temperatures in their units, choices by their
 * label, hole positions and yes/no in words. Null when the sheet has no value for the field.
 */
export function formatFieldValue(field: TemplateField, value: SetupFieldValue | undefined, units: UnitPreferences): string | null {
  if (value === undefined || value === '') return null;
  switch (field.type) {
    case 'number':
    case 'integer':
      return typeof value === 'number' && Number.isFinite(value)
        ? formatForDisplay(value, unitKind(field.unit), units, passThroughLabel(field.unit)).text
        : String(value);
    case 'position':
      return `Hole ${String(value)}`;
    case 'boolean':
      return value === true ? 'Yes' : value === false ? 'No' : String(value);
    case 'choice':
      return field.options.find((o) => o.value === value)?.label ?? String(value);
    case 'text':
      return String(value);
  }
}

/** "Front diff oil" → "Diff oil": the name a front/rear pair shares. */
export function pairLabel(field: TemplateField): string {
  const bare = field.label.replace(/^(front|rear)\s+/i, '');
  return bare.charAt(0).toUpperCase() + bare.slice(1);
}

export type SheetPair = { key: string; label: string; front: TemplateField | null; rear: TemplateField | null };

/** Consecutive fields of one shape: front/rear pairs shown side by side, or single settings. */
export type SheetRun = { kind: 'pairs'; pairs: SheetPair[] } | { kind: 'singles'; fields: TemplateField[] };

/**
 * A section's fields in sheet order, grouped so pairs sit in a Front/Rear table and the other
 * settings in a plain one; runs keep the template's order so the sheet reads like the kit manual.
 */
export function sheetRuns(section: TemplateSection): SheetRun[] {
  const runs: SheetRun[] = [];
  const pairsByKey = new Map<string, SheetPair>();
  for (const field of section.fields) {
    const last = runs[runs.length - 1];
    if (field.pairKey && field.side) {
      const existing = pairsByKey.get(field.pairKey);
      if (existing) {
        existing[field.side] = field;
        continue;
      }
      const pair: SheetPair = { key: field.pairKey, label: pairLabel(field), front: null, rear: null };
      pair[field.side] = field;
      pairsByKey.set(field.pairKey, pair);
      if (last?.kind === 'pairs') last.pairs.push(pair);
      else runs.push({ kind: 'pairs', pairs: [pair] });
    } else if (last?.kind === 'singles') {
      last.fields.push(field);
    } else {
      runs.push({ kind: 'singles', fields: [field] });
    }
  }
  return runs;
}

const GRIP_LABELS = { low: 'Low grip', medium: 'Medium grip', high: 'High grip' } as const;

/** Track type, temperature in the racer's unit and grip, each only when set. */
export function conditionParts(conditions: SetupConditions, units: UnitPreferences): string[] {
  const parts: string[] = [];
  if (conditions.trackType) parts.push(trackTypeLabel(conditions.trackType));
  if (conditions.temperatureC !== null) parts.push(formatForDisplay(conditions.temperatureC, 'temperature', units).text);
  if (conditions.grip) parts.push(GRIP_LABELS[conditions.grip]);
  return parts;
}

/** "2 Dec 2026": dates on sheets and lists need the day, not the time. */
export function formatDay(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '';
  return date.toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}
