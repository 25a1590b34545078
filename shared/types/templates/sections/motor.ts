import { options } from '../fieldBuilders';
import type { ElectricRanges } from '../profile';
import type { TemplateSection } from '../types';

// Ranges below are common practice, no source; from memory.

/** Generic steps, because speed controllers count punch on different scales. */
const PUNCH = options(
  ['very-soft', 'Very soft'],
  ['soft', 'Soft'],
  ['medium', 'Medium'],
  ['strong', 'Strong'],
  ['very-strong', 'Very strong'],
);

const percent = (plausibleMax: number) => ({
  type: 'number' as const,
  unit: '%' as const,
  min: 0,
  max: 100,
  step: 1,
  plausible: { min: 0, max: plausibleMax },
});

export function motorSection(ranges: ElectricRanges): TemplateSection {
  return {
    key: 'motor',
    label: 'Motor, speed controller and battery',
    fields: [
      {
        key: 'motor.kv',
        label: 'Motor kV',
        type: 'number',
        unit: 'kV',
        ...ranges.motorKv,
        help: 'Motor speed rating in rpm per volt. Higher kV gives more top speed and heat; lower kV gives more torque and runs cooler.',
      },
      {
        key: 'motor.timing',
        label: 'Motor timing',
        type: 'number',
        unit: 'deg',
        min: 0,
        max: 60,
        step: 1,
        plausible: { min: 0, max: 45 },
        help: 'Timing set on the motor itself, where it can be adjusted. More timing adds top-end power and heat; less runs cooler with more low-down torque.',
      },
      {
        key: 'esc.timing-boost',
        label: 'Speed controller timing boost',
        type: 'number',
        unit: 'deg',
        min: 0,
        max: 64,
        step: 1,
        plausible: { min: 0, max: 40 },
        help: 'Extra timing the speed controller adds at high revs. More boost gives more top speed but much more heat; set 0 where the rules ask for it.',
      },
      {
        key: 'esc.punch',
        label: 'Punch',
        type: 'choice',
        options: PUNCH,
        help: 'How hard the speed controller lets the motor accelerate from low speed. Less punch helps traction on slippery tracks; more suits high grip.',
      },
      {
        key: 'esc.brake',
        label: 'Brake strength',
        ...percent(100),
        help: 'Maximum braking from the speed controller. Less stops the wheels locking on slippery tracks; more stops harder on high grip.',
      },
      {
        key: 'esc.drag-brake',
        label: 'Drag brake',
        ...percent(30),
        help: 'Braking applied when the trigger is at neutral. A little helps the car slow into corners on its own; too much makes it feel sluggish.',
      },
      {
        key: 'battery.cells',
        label: 'Battery cells',
        type: 'integer',
        unit: null,
        ...ranges.cells,
        help: 'Number of lithium cells in series in the pack. More cells give more voltage and speed; check what your motor and speed controller accept.',
      },
      {
        key: 'battery.voltage',
        label: 'Battery voltage',
        type: 'number',
        unit: 'V',
        ...ranges.voltage,
        help: 'Nominal voltage printed on the pack. Higher voltage means more speed and more heat in the motor and speed controller.',
      },
      {
        key: 'motor.max-temp',
        label: 'Motor temperature after a run',
        type: 'number',
        unit: '°C',
        min: 0,
        max: 150,
        step: 1,
        plausible: { min: 30, max: 80 },
        help: 'Hottest motor temperature read with a temperature gun after a run. If it runs too hot, gear down with a smaller pinion or bigger spur.',
      },
    ],
  };
}
