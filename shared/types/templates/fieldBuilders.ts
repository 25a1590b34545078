import type {
  ChoiceOption,
  DistributiveOmit,
  NumericRange,
  Side,
  TemplateField,
} from './types';

/** A field as a section builder writes it; `paired` adds the key, side and pair key. */
export type FieldSpec = DistributiveOmit<TemplateField, 'key' | 'pairKey' | 'side'>;

const SIDE_LABEL: Record<Side, string> = { front: 'Front', rear: 'Rear' };

/**
 * Front and rear halves of one setting. Keys differ only in the side segment
 * (`shock.front.oil` / `shock.rear.oil`) so stored values line up with the pair key `shock.oil`.
 * `build` gets the side so ranges and help can differ between the ends.
 */
export function paired(
  group: string,
  name: string,
  build: (side: Side) => FieldSpec,
): TemplateField[] {
  return (['front', 'rear'] as const).map((side): TemplateField => {
    const spec = build(side);
    return {
      ...spec,
      key: `${group}.${side}.${name}`,
      label: `${SIDE_LABEL[side]} ${spec.label}`,
      pairKey: `${group}.${name}`,
      side,
    } as TemplateField;
  });
}

/** Hard limits refuse a value; the optional plausible band only warns. */
export function range(
  min: number,
  max: number,
  step: number,
  plausibleMin?: number,
  plausibleMax?: number,
): NumericRange {
  if (plausibleMin === undefined || plausibleMax === undefined) return { min, max, step };
  return { min, max, step, plausible: { min: plausibleMin, max: plausibleMax } };
}

export function options(...pairs: ReadonlyArray<readonly [string, string]>): ChoiceOption[] {
  return pairs.map(([value, label]) => ({ value, label }));
}

export const STIFFNESS_OPTIONS = options(['soft', 'Soft'], ['medium', 'Medium'], ['hard', 'Hard']);

export const BRACE_OPTIONS = options(
  ['none', 'None fitted'],
  ['flexible', 'Flexible'],
  ['standard', 'Standard'],
  ['stiff', 'Stiff'],
);
