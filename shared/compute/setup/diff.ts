type Values = Readonly<Record<string, number | string | boolean>>;

export type FieldChange = { key: string; before: number | string | boolean | undefined; after: number | string | boolean | undefined };

/** Fields whose value differs between two sheets (a field present on one side only counts), sorted by key. */
export function diffSetupValues(before: Values, after: Values): FieldChange[] {
  // Own properties only: a field named like a built-in ("constructor") must read as empty, not a function.
  const read = (values: Values, key: string) => (Object.prototype.hasOwnProperty.call(values, key) ? values[key] : undefined);
  const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
  return [...keys]
    .filter((key) => !Object.is(read(before, key), read(after, key)))
    .sort()
    .map((key) => ({ key, before: read(before, key), after: read(after, key) }));
}
