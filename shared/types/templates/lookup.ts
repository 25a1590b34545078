import type { SetupTemplate, TemplateField } from './types';

const byKeyCache = new WeakMap<SetupTemplate, ReadonlyMap<string, TemplateField>>();

/** Every field of a template in sheet order, sections flattened. */
export function listFields(template: SetupTemplate): TemplateField[] {
  return template.sections.flatMap((section) => section.fields);
}

/**
 * Fields by key. A Map rather than an object so keys such as `constructor` or `__proto__` never
 * resolve to something inherited when checking whether a submitted key exists.
 */
export function fieldsByKey(template: SetupTemplate): ReadonlyMap<string, TemplateField> {
  let map = byKeyCache.get(template);
  if (!map) {
    map = new Map(listFields(template).map((field) => [field.key, field]));
    byKeyCache.set(template, map);
  }
  return map;
}
