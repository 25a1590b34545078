import { options, STIFFNESS_OPTIONS } from '../fieldBuilders';
import type { TemplateField, TemplateSection } from '../types';

// Ranges below are common practice, no source; from memory.

/** Generic heat ranges only: plug makers use their own numbers, which do not line up. */
const GLOW_PLUG_HEAT = options(['hot', 'Hot'], ['medium', 'Medium'], ['cold', 'Cold']);

const ENGINE_FIELDS: TemplateField[] = [
  {
    key: 'engine.size',
    label: 'Engine size',
    type: 'choice',
    options: options(['3.5cc', '3.5 cc (.21)'], ['4.6cc', '4.6 cc (.28)']),
    help: 'Engine displacement. The smaller size is the usual racing engine; the bigger one gives more torque for heavy cars where the rules allow it.',
  },
  {
    key: 'engine.exhaust',
    label: 'Exhaust pipe',
    type: 'choice',
    options: options(['short', 'Short pipe'], ['medium', 'Medium pipe'], ['long', 'Long pipe']),
    help: 'Length class of the tuned pipe. A shorter pipe revs higher for long straights; a longer pipe gives more low-down torque and smoother power.',
  },
  {
    key: 'engine.manifold-length',
    label: 'Exhaust manifold length',
    type: 'number',
    unit: 'mm',
    min: 30,
    max: 150,
    step: 1,
    plausible: { min: 55, max: 95 },
    help: 'Length of the manifold between engine and pipe. A shorter manifold lets the engine rev higher; a longer one moves power lower for tight tracks.',
  },
  {
    key: 'engine.glow-plug',
    label: 'Glow plug heat range',
    type: 'choice',
    options: GLOW_PLUG_HEAT,
    help: 'How hot the glow plug runs. Use a hotter plug in cold weather or with low-nitro fuel; a colder plug on hot days or with high nitro.',
  },
  {
    key: 'engine.fuel-nitro',
    label: 'Fuel nitro content',
    type: 'number',
    unit: '%',
    min: 0,
    max: 40,
    step: 1,
    plausible: { min: 12, max: 30 },
    help: 'Share of nitromethane in the fuel. More nitro gives more power but runs hotter and uses more fuel; less is easier on the engine.',
  },
  {
    key: 'engine.head-shim',
    label: 'Head shims',
    type: 'number',
    unit: 'mm',
    min: 0,
    max: 1.5,
    step: 0.05,
    plausible: { min: 0.1, max: 0.6 },
    help: 'Total thickness of shims under the cylinder head. More shims lower compression for a cooler, softer engine; fewer raise power and heat.',
  },
  {
    key: 'engine.target-temp',
    label: 'Engine temperature',
    type: 'number',
    unit: '°C',
    min: 20,
    max: 180,
    step: 1,
    plausible: { min: 90, max: 130 },
    help: 'Head temperature you tune the needles for, read with a temperature gun after a run. Too hot wears the engine fast; too cool usually means it runs rich and slow.',
  },
  {
    key: 'clutch.shoes',
    label: 'Clutch shoes',
    type: 'choice',
    options: options(['aluminium', 'Aluminium'], ['steel', 'Steel'], ['composite', 'Composite']),
    help: 'Material of the clutch shoes. Metal shoes grab hard for strong pull; composite shoes engage more smoothly on slippery tracks.',
  },
  {
    key: 'clutch.springs',
    label: 'Clutch springs',
    type: 'choice',
    options: STIFFNESS_OPTIONS,
    help: 'How stiff the clutch springs are. Harder springs engage later, at higher revs, for a harder hit; softer springs engage earlier and smoother.',
  },
  {
    key: 'clutch.gap',
    label: 'Clutch shoe gap',
    type: 'number',
    unit: 'mm',
    min: 0.1,
    max: 2,
    step: 0.05,
    plausible: { min: 0.3, max: 1 },
    help: 'Gap between the clutch shoes and the bell at rest. A bigger gap engages later and harder; a smaller gap engages sooner and smoother.',
  },
];

export function engineSection(): TemplateSection {
  return { key: 'engine', label: 'Engine and clutch', fields: ENGINE_FIELDS };
}
