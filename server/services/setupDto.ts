import type { SetupConditions, SetupSummary } from '../../shared/types/setups';
import type { Setup } from '../models/Setup';

export function conditionsOf(setup: Setup): SetupConditions {
  return { trackType: setup.trackType, temperatureC: setup.temperatureC, grip: setup.grip };
}

export function toSetupSummary(setup: Setup): SetupSummary {
  return {
    id: setup.id,
    title: setup.title,
    visibility: setup.visibility,
    carId: setup.carId,
    vehicleClass: setup.vehicleClass,
    revisionCount: setup.revisionCount,
    updatedAt: setup.updatedAt.toISOString(),
    conditions: conditionsOf(setup),
  };
}
