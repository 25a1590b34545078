import type { StoredSetupValues } from '../../shared/types/setups';
import { getTemplate, listFields, validateSetupValues, type TemplateField } from '../../shared/types/templates';
import type { VehicleClassKey } from '../../shared/types/vehicleClasses';

/** A value near the middle of what the field allows, on its step: the neutral starting point. */
function neutralValue(field: TemplateField): number | string | boolean | undefined {
  switch (field.type) {
    case 'number':
    case 'integer': {
      const band = field.plausible ?? field;
      const mid = (band.min + band.max) / 2;
      const stepped = Math.round(mid / field.step) * field.step;
      return Number(stepped.toFixed(6));
    }
    case 'position':
      return Math.round((field.min + field.max) / 2);
    case 'choice':
      return field.options[0]?.value;
    case 'boolean':
      return false;
    case 'text':
      return undefined;
  }
}

/**
 * Stock sheets of the invented demo kits: every field starts neutral, then the settings that
 * define each kit are set by hand. Values are plausible for the class, made up for Tunefork.
 */
const KIT_OVERRIDES: Record<string, StoredSetupValues> = {
  'ottervale-stoat-8n': {
    'diff.front.oil': 7000, 'diff.centre.oil': 7000, 'diff.rear.oil': 3000,
    'gear.spur': 46, 'gear.clutch-bell': 13, 'gear.diff-ring': 43, 'gear.diff-pinion': 10,
    'susp.front.ride-height': 26, 'susp.rear.ride-height': 28, 'susp.front.camber': -1, 'susp.rear.camber': -2,
    'susp.rear.toe-block-fore': -1, 'susp.rear.toe-block-aft': 3, 'susp.rear.hub-toe': 0,
    'shock.front.oil': 550, 'shock.rear.oil': 450, 'tire.front.diameter': 110, 'tire.rear.diameter': 110,
  },
  'ottervale-stoat-8e': {
    'diff.front.oil': 10000, 'diff.centre.oil': 10000, 'diff.rear.oil': 3000,
    'gear.spur': 46, 'gear.pinion': 17, 'gear.diff-ring': 43, 'gear.diff-pinion': 10,
    'motor.kv': 2000, 'battery.cells': 4, 'battery.voltage': 14.8,
    'susp.front.ride-height': 27, 'susp.rear.ride-height': 29,
    'susp.rear.toe-block-fore': -1, 'susp.rear.toe-block-aft': 3,
    'shock.front.oil': 600, 'shock.rear.oil': 500, 'tire.front.diameter': 110, 'tire.rear.diameter': 110,
  },
  'cinderfell-gantry-t8': {
    'diff.front.oil': 10000, 'diff.centre.oil': 20000, 'diff.rear.oil': 5000,
    'gear.spur': 48, 'gear.clutch-bell': 13, 'gear.diff-ring': 43, 'gear.diff-pinion': 10,
    'shock.front.oil': 600, 'shock.rear.oil': 500, 'tire.front.diameter': 145, 'tire.rear.diameter': 145,
  },
  'marrowby-wren-10': {
    'diff.front.oil': 7000, 'diff.centre.oil': 5000, 'diff.rear.oil': 2000,
    'gear.spur': 84, 'gear.pinion': 22, 'motor.kv': 4000, 'battery.cells': 2, 'battery.voltage': 7.4,
    'shock.front.oil': 450, 'shock.rear.oil': 350,
  },
  'marrowby-wren-10-two': {
    'gear.spur': 84, 'gear.pinion': 24, 'motor.kv': 3800, 'battery.cells': 2, 'battery.voltage': 7.4,
    'shock.front.oil': 400, 'shock.rear.oil': 300,
  },
};

/** Option parts of the demo kits: choice options NOT in the box (everything else is). */
const KIT_OPTION_PARTS: Record<string, Record<string, string[]>> = {
  'ottervale-stoat-8n': { 'chassis.front-brace': ['stiff'], 'chassis.rear-brace': ['stiff'] },
  'ottervale-stoat-8e': {
    'chassis.front-brace': ['stiff'],
    'chassis.rear-brace': ['stiff'],
    'susp.front.arm-stiffness': ['hard'],
    'body.style': ['high-downforce'],
  },
};

export type StockSheet = { values: StoredSetupValues; inBox: Record<string, string[]>; templateVersion: number };

/** Builds and validates a demo kit's stock sheet against its class template. */
export function buildStockSheet(kitSlug: string, vehicleClass: VehicleClassKey): StockSheet {
  const template = getTemplate(vehicleClass);
  const fields = listFields(template);
  const values: StoredSetupValues = {};
  for (const field of fields) {
    const v = neutralValue(field);
    if (v !== undefined) values[field.key] = v;
  }
  for (const [key, v] of Object.entries(KIT_OVERRIDES[kitSlug] ?? {})) {
    if (fields.some((f) => f.key === key)) values[key] = v;
  }
  const optionParts = KIT_OPTION_PARTS[kitSlug] ?? {};
  const inBox: Record<string, string[]> = {};
  for (const field of fields) {
    if (field.type === 'choice') inBox[field.key] = field.options.map((o) => o.value).filter((o) => !(optionParts[field.key] ?? []).includes(o));
  }
  const checked = validateSetupValues(template, values);
  if (!checked.ok) throw new Error(`stock sheet of ${kitSlug} is invalid: ${JSON.stringify(checked.errors)}`);
  return { values: checked.values as StoredSetupValues, inBox, templateVersion: template.version };
}
