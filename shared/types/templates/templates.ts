import type { VehicleClassKey } from '../vehicleClasses';
import type { ClassProfile } from './profile';
import { EIGHTH_PROFILES } from './profilesEighth';
import { TENTH_PROFILES } from './profilesTenth';
import { bodyAndWingSection } from './sections/body';
import { brakesSection, chassisSection } from './sections/chassis';
import { differentialsSection, gearingSection, rearDriveSection } from './sections/drivetrain';
import { electronicsSection } from './sections/electronics';
import { engineSection } from './sections/engine';
import { motorSection } from './sections/motor';
import { rearSuspensionSection } from './sections/rearSuspension';
import { shocksSection } from './sections/shocks';
import { frontSuspensionSection, suspensionPairsSection } from './sections/suspension';
import { tiresSection } from './sections/tires';
import type { SetupTemplate, TemplateSection } from './types';

/**
 * Version of each class's template. Raise a class's number when one of its fields changes range,
 * options or meaning, so stored sheets can say which template they were filled against.
 */
const TEMPLATE_VERSIONS: Record<VehicleClassKey, number> = {
  'buggy-1-8-nitro': 1,
  'buggy-1-8-electric': 1,
  'truggy-1-8-nitro': 1,
  'truggy-1-8-electric': 1,
  'buggy-1-10-4wd': 1,
  'buggy-1-10-2wd': 1,
};

function buildTemplate(p: ClassProfile): SetupTemplate {
  const sections: Array<TemplateSection | null> = [
    differentialsSection(p),
    rearDriveSection(p),
    gearingSection(p),
    suspensionPairsSection(p),
    frontSuspensionSection(p),
    rearSuspensionSection(),
    shocksSection(p),
    chassisSection(p),
    brakesSection(p),
    p.power === 'nitro' ? engineSection() : motorSection(p),
    electronicsSection(p),
    tiresSection(p),
    bodyAndWingSection(p),
  ];
  return {
    vehicleClass: p.vehicleClass,
    label: p.label,
    version: TEMPLATE_VERSIONS[p.vehicleClass],
    sections: sections.filter((s): s is TemplateSection => s !== null),
  };
}

/** One setup-sheet template per vehicle class, built once at load. */
export const TEMPLATES: Readonly<Record<VehicleClassKey, SetupTemplate>> = Object.fromEntries(
  [...EIGHTH_PROFILES, ...TENTH_PROFILES].map((p) => [p.vehicleClass, buildTemplate(p)]),
) as Record<VehicleClassKey, SetupTemplate>;

export function getTemplate(vehicleClassKey: VehicleClassKey): SetupTemplate {
  return TEMPLATES[vehicleClassKey];
}

export function templateVersion(vehicleClassKey: VehicleClassKey): number {
  return TEMPLATE_VERSIONS[vehicleClassKey];
}
