import {
  FIELD_UNITS,
  TEMPLATES,
  getTemplate,
  listFields,
  fieldsByKey,
  templateVersion,
  type SetupTemplate,
  type TemplateField,
} from '../../../shared/types/templates';
import { VEHICLE_CLASSES } from '../../../shared/types/vehicleClasses';

const templates: Array<[string, SetupTemplate]> = Object.entries(TEMPLATES);

function decimals(n: number): number {
  return (String(n).split('.')[1] ?? '').length;
}

describe('the template set', () => {
  it('has exactly one template per vehicle class, labelled like the class', () => {
    expect(Object.keys(TEMPLATES).sort()).toEqual(VEHICLE_CLASSES.map((c) => c.key).sort());
    for (const vehicleClass of VEHICLE_CLASSES) {
      const template = getTemplate(vehicleClass.key);
      expect(template.vehicleClass).toBe(vehicleClass.key);
      expect(template.label).toBe(vehicleClass.label);
    }
  });

  it('starts every template at version 1 and reports it through templateVersion', () => {
    for (const vehicleClass of VEHICLE_CLASSES) {
      expect(templateVersion(vehicleClass.key)).toBe(1);
      expect(getTemplate(vehicleClass.key).version).toBe(1);
    }
  });

  it('gives each class the field count it was designed with, all between 60 and 100', () => {
    const counts = Object.fromEntries(templates.map(([key, t]) => [key, listFields(t).length]));
    expect(counts).toEqual({
      'buggy-1-8-nitro': 98,
      'buggy-1-8-electric': 94,
      'truggy-1-8-nitro': 98,
      'truggy-1-8-electric': 94,
      'buggy-1-10-4wd': 94,
      'buggy-1-10-2wd': 93,
    });
  });
});

describe.each(templates)('the %s template', (_key, template) => {
  const fields = listFields(template);

  it('uses every field key once and finds each through fieldsByKey', () => {
    const keys = fields.map((f) => f.key);
    expect(new Set(keys).size).toBe(keys.length);
    expect(fieldsByKey(template).size).toBe(keys.length);
    for (const field of fields) expect(fieldsByKey(template).get(field.key)).toBe(field);
  });

  it('writes keys as dotted lowercase words', () => {
    for (const field of fields) {
      expect(field.key).toMatch(/^[a-z][a-z0-9-]*(\.[a-z][a-z0-9-]*)+$/);
    }
  });

  it('uses each section key once and leaves no section empty', () => {
    const sectionKeys = template.sections.map((s) => s.key);
    expect(new Set(sectionKeys).size).toBe(sectionKeys.length);
    for (const section of template.sections) expect(section.fields.length).toBeGreaterThan(0);
  });

  it('explains every field in one or two plain sentences', () => {
    const sentenceCount = (help: string) => help.split(/[.!?](?:\s|$)/).filter((s) => s.trim() !== '').length;
    const unclear = fields
      .filter((f) => f.label.trim() === '' || !f.help.endsWith('.') || f.help.length > 220 || ![1, 2].includes(sentenceCount(f.help)))
      .map((f) => f.key);
    expect(unclear).toEqual([]);
  });

  it('stores every number in a known unit and declares the unit of every integer', () => {
    for (const field of fields) {
      if (field.type === 'number') expect(FIELD_UNITS).toContain(field.unit);
      if (field.type === 'integer') {
        expect(field).toHaveProperty('unit');
        if (field.unit !== null) expect(FIELD_UNITS).toContain(field.unit);
      }
    }
  });

  it('keeps numeric limits ordered, plausible bands inside them, and limits on the step grid', () => {
    for (const field of fields) {
      if (field.type !== 'number' && field.type !== 'integer') continue;
      expect(field.min).toBeLessThan(field.max);
      expect(field.step).toBeGreaterThan(0);
      expect(decimals(field.min)).toBeLessThanOrEqual(decimals(field.step));
      expect(decimals(field.max)).toBeLessThanOrEqual(decimals(field.step));
      if (field.type === 'integer') {
        expect([field.step, Number.isInteger(field.min), Number.isInteger(field.max)]).toEqual([1, true, true]);
      }
      if (field.plausible) {
        expect(field.plausible.min).toBeLessThan(field.plausible.max);
        expect(field.plausible.min).toBeGreaterThanOrEqual(field.min);
        expect(field.plausible.max).toBeLessThanOrEqual(field.max);
      }
    }
  });

  it('numbers holes from 1 and offers at least two choices per choice field', () => {
    for (const field of fields) {
      if (field.type === 'position') {
        expect(field.min).toBe(1);
        expect(Number.isInteger(field.max) && field.max >= 2).toBe(true);
      }
      if (field.type === 'choice') {
        const values = field.options.map((o) => o.value);
        expect(values.length).toBeGreaterThanOrEqual(2);
        expect(new Set(values).size).toBe(values.length);
        for (const option of field.options) expect(option.label.trim()).not.toBe('');
      }
      if (field.type === 'text') expect(Number.isInteger(field.maxLength) && field.maxLength > 0).toBe(true);
    }
  });

  it('has both halves of every front/rear pair, side by side in the same section', () => {
    const paired = fields.filter((f) => f.pairKey !== undefined);
    expect(paired.length).toBeGreaterThan(0);
    for (const section of template.sections) {
      section.fields.forEach((field, index) => {
        if (field.side !== 'front') return;
        const partner: TemplateField | undefined = section.fields[index + 1];
        expect(partner?.pairKey).toBe(field.pairKey);
        expect(partner?.side).toBe('rear');
        expect(partner?.key).toBe(field.key.replace('.front.', '.rear.'));
        expect(partner?.type).toBe(field.type);
        expect(partner?.label.replace(/^Rear /, '')).toBe(field.label.replace(/^Front /, ''));
      });
    }
    const byPair = new Map<string, string[]>();
    for (const f of paired) byPair.set(f.pairKey!, [...(byPair.get(f.pairKey!) ?? []), f.side!]);
    for (const sides of byPair.values()) expect(sides).toEqual(['front', 'rear']);
  });

  it('gives a side only to fields that belong to a pair', () => {
    for (const field of fields) expect(field.side === undefined).toBe(field.pairKey === undefined);
  });
});
