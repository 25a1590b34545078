import { requireFiniteResult, requireInteger, requirePositive, requireTeeth } from './validate';

/**
 * Gear geometry from the module, for straight-cut (spur) external gears, which is what RC
 * pinions, clutch bells and spurs are. Module m is in mm: the reference (pitch) diameter divided
 * by the number of teeth. Helical and internal gears need other formulas and are not covered.
 */

/**
 * Reference (pitch) diameter d = m · z, in mm.
 * @param input.moduleMm gear module, mm (e.g. 0.8 or 1.0)
 * @param input.teeth number of teeth
 * @throws RangeError when the module is not above zero or the teeth are not a whole number ≥ 1
 */
export function computePitchDiameterMm({ moduleMm, teeth }: { moduleMm: number; teeth: number }): number {
  const m = requirePositive('moduleMm', moduleMm);
  return requireFiniteResult('pitch diameter', m * requireTeeth('teeth', teeth));
}

/**
 * Centre distance of an external gear pair a = m (z1 + z2) / 2, in mm: how far apart the pinion
 * (or clutch bell) shaft and the spur shaft sit when the mesh is exact.
 * @param input.moduleMm module shared by both gears, mm
 * @param input.spurTeeth teeth on the spur
 * @param input.pinionTeeth teeth on the pinion or clutch bell
 * @throws RangeError when the module is not above zero or a tooth count is not a whole number ≥ 1
 */
export function computeCentreDistanceMm({
  moduleMm,
  spurTeeth,
  pinionTeeth,
}: {
  moduleMm: number;
  spurTeeth: number;
  pinionTeeth: number;
}): number {
  const m = requirePositive('moduleMm', moduleMm);
  const z1 = requireTeeth('spurTeeth', spurTeeth);
  const z2 = requireTeeth('pinionTeeth', pinionTeeth);
  return requireFiniteResult('centre distance', (m * (z1 + z2)) / 2);
}

/**
 * How far the engine or motor must move, in mm, when the pinion or clutch bell changes by
 * `pinionTeethChange` teeth on the same spur. Positive = away from the spur (bigger pinion),
 * negative = towards it. Mathematically m · n / 2; computed as the difference of the two centre
 * distances so that it is, by construction, the change in centre distance and so that +n then
 * −n cancels exactly.
 * @param input.moduleMm module, mm
 * @param input.spurTeeth teeth on the spur
 * @param input.pinionTeeth teeth on the pinion or clutch bell now fitted
 * @param input.pinionTeethChange signed change in pinion teeth, e.g. +1 or −2
 * @throws RangeError when an input is invalid or the new pinion would have fewer than 1 tooth
 */
export function computeCentreDistanceChangeMm({
  moduleMm,
  spurTeeth,
  pinionTeeth,
  pinionTeethChange,
}: {
  moduleMm: number;
  spurTeeth: number;
  pinionTeeth: number;
  pinionTeethChange: number;
}): number {
  const change = requireInteger('pinionTeethChange', pinionTeethChange);
  const before = computeCentreDistanceMm({ moduleMm, spurTeeth, pinionTeeth });
  const newPinionTeeth = pinionTeeth + change;
  if (newPinionTeeth < 1) {
    throw new RangeError(
      `pinionTeethChange ${change} would leave a ${newPinionTeeth}-tooth pinion; the new pinion needs 1 tooth or more`,
    );
  }
  const after = computeCentreDistanceMm({ moduleMm, spurTeeth, pinionTeeth: newPinionTeeth });
  return after - before;
}
