type Values = Readonly<Record<string, number | string | boolean>>;

export type FieldChange = { key: string; before: number | string | boolean | undefined; after: number | string | boolean | undefined };

/** Fields whose value differs between two sheets (a field present on one side only counts), sorted by key. */
export function diffSetupValues(before: Values, after: Values): FieldChange[] {
  const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
  return [...keys]
    .filter((key) => !Object.is(before[key], after[key]))
    .sort()
    .map((key) => ({ key, before: before[key], after: after[key] }));
}
