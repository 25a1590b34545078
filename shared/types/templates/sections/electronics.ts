import { options } from '../fieldBuilders';
import type { ClassProfile } from '../profile';
import type { TemplateField, TemplateSection } from '../types';

// Ranges below are common practice, no source; from memory.

const SUPPLY_VOLTAGE = { type: 'number' as const, unit: 'V' as const, min: 3, max: 9, step: 0.1 };

const servoText = (key: string, label: string, help: string): TemplateField => ({
  key,
  label,
  type: 'text',
  maxLength: 60,
  help,
});

/** Nitro cars carry a receiver pack and a throttle servo; electric ones are fed by the speed controller. */
export function electronicsSection(p: ClassProfile): TemplateSection {
  const nitro = p.power === 'nitro';
  const fields: TemplateField[] = [
    servoText(
      'electronics.steering-servo',
      'Steering servo',
      'The steering servo you use, described your way, for example its speed and torque. A faster, stronger servo makes the steering more precise.',
    ),
  ];
  if (nitro) {
    fields.push(
      servoText(
        'electronics.throttle-servo',
        'Throttle servo',
        'The throttle and brake servo you use, described your way. A faster servo makes throttle and brakes respond sooner.',
      ),
    );
  }
  fields.push({
    key: 'electronics.servo-saver',
    label: 'Servo saver',
    type: 'choice',
    options: options(['soft', 'Soft'], ['medium', 'Medium'], ['stiff', 'Stiff'], ['locked', 'Locked solid']),
    help: 'How stiff the servo saver spring is. A stiffer saver gives more direct steering; a softer one protects the servo in crashes and smooths the steering.',
  });
  if (nitro) {
    fields.push(
      {
        key: 'electronics.rx-battery',
        label: 'Receiver battery type',
        type: 'choice',
        options: options(['lipo', 'LiPo'], ['life', 'LiFe'], ['li-ion', 'Li-ion'], ['nimh', 'NiMH']),
        help: 'Chemistry of the receiver battery. Check that your servos accept its voltage, or fit a regulator.',
      },
      {
        key: 'electronics.rx-voltage',
        label: 'Receiver voltage',
        ...SUPPLY_VOLTAGE,
        plausible: { min: 4.8, max: 8.4 },
        help: 'Voltage the receiver and servos run on. Higher voltage makes servos faster and stronger, as long as they are rated for it.',
      },
    );
  } else {
    fields.push({
      key: 'electronics.bec-voltage',
      label: 'Speed controller servo voltage',
      ...SUPPLY_VOLTAGE,
      plausible: { min: 5, max: 8.4 },
      help: 'Voltage the speed controller supplies to the receiver and servos. Higher voltage makes servos faster and stronger, as long as they are rated for it.',
    });
  }
  fields.push({
    key: 'electronics.steering-expo',
    label: 'Steering expo',
    type: 'number',
    unit: '%',
    min: -100,
    max: 100,
    step: 1,
    plausible: { min: -60, max: 60 },
    help: 'Steering curve around centre; positive softens small movements here, whatever sign your transmitter uses. Soften it for calmer straights; sharpen it for quicker reactions.',
  });
  return { key: 'electronics', label: 'Electronics', fields };
}
