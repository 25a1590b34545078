type Value = number | string | boolean;
type Values = Readonly<Record<string, Value>>;

export type MergeStatus = 'unchanged' | 'theirs-only' | 'mine-only' | 'both-same' | 'conflict';

export type FieldMerge = {
  key: string;
  base: Value | undefined;
  theirs: Value | undefined;
  mine: Value | undefined;
  status: MergeStatus;
};

export type MergeChoice = 'theirs' | 'mine';

// Own properties only: a field named like an Object.prototype member ("constructor", "toString")
// must read as empty when it is missing, not as the inherited function.
function readField(values: Values, key: string): Value | undefined {
  return Object.prototype.hasOwnProperty.call(values, key) ? values[key] : undefined;
}

function classify(base: Value | undefined, theirs: Value | undefined, mine: Value | undefined): MergeStatus {
  const theirsChanged = !Object.is(base, theirs);
  const mineChanged = !Object.is(base, mine);
  if (theirsChanged && !mineChanged) return 'theirs-only';
  if (mineChanged && !theirsChanged) return 'mine-only';
  if (theirsChanged && mineChanged) return Object.is(theirs, mine) ? 'both-same' : 'conflict';
  return 'unchanged';
}

/**
 * Field-by-field three-way comparison of a fork (mine) against the original it was forked from
 * (base) and the original as it is now (theirs). One row per field present in any of the three,
 * sorted by key; a missing field counts as empty.
 */
export function threeWayMerge(base: Values, theirs: Values, mine: Values): FieldMerge[] {
  const keys = new Set([...Object.keys(base), ...Object.keys(theirs), ...Object.keys(mine)]);
  return [...keys].sort().map((key) => {
    const b = readField(base, key);
    const t = readField(theirs, key);
    const m = readField(mine, key);
    return { key, base: b, theirs: t, mine: m, status: classify(b, t, m) };
  });
}

/** The rows a racer can be offered: the original changed them (alone, or differently from the fork). */
export function upstreamChanges(rows: readonly FieldMerge[]): FieldMerge[] {
  return rows.filter((row) => row.status === 'theirs-only' || row.status === 'conflict');
}

// Entries instead of assignment so that a field called "__proto__" stays an ordinary field.
function withField(entries: Map<string, Value>, key: string, value: Value | undefined): void {
  if (value === undefined) entries.delete(key);
  else entries.set(key, value);
}

/**
 * The fork after taking the original's changes the racer chose. Only theirs-only and conflict
 * rows can change anything, and only when chosen 'theirs'; everything else keeps mine. Taking an
 * empty field removes it.
 */
export function applyMerge(
  mine: Values,
  rows: readonly FieldMerge[],
  choices: Readonly<Record<string, MergeChoice>>,
): Record<string, Value> {
  const entries = new Map(Object.entries(mine));
  for (const row of upstreamChanges(rows)) {
    if (readField(choices, row.key) === 'theirs') withField(entries, row.key, row.theirs);
  }
  return Object.fromEntries(entries);
}

/** The sheet with each change's `after` applied in order; an `after` of undefined removes the field. */
export function applyDiff(
  values: Values,
  changes: ReadonlyArray<{ key: string; after: Value | undefined }>,
): Record<string, Value> {
  const entries = new Map(Object.entries(values));
  for (const change of changes) withField(entries, change.key, change.after);
  return Object.fromEntries(entries);
}
