import { requireFinite, requireFiniteResult } from './validate';

/**
 * The angles that together set rear toe on a hinge-pin car, each in degrees and each signed by
 * the toe it adds to the wheel: positive = toe-in (front of the wheel towards the car's
 * centreline), negative = toe-out. A front block stamped "−1°" that takes toe away is entered as
 * −1; a rear block stamped "2.75°" that adds toe-in is entered as 2.75.
 */
export interface RearToeAngles {
  /** Toe added by the front hinge-pin block of the rear arms, degrees (+ = toe-in). */
  frontBlockDeg: number;
  /** Toe added by the rear hinge-pin block of the rear arms, degrees (+ = toe-in). */
  rearBlockDeg: number;
  /** Toe built into the rear hub or carrier, degrees (+ = toe-in). Zero when the hub has none. */
  hubToeDeg?: number;
}

/**
 * Total rear toe per side, degrees, positive = toe-in: front block + rear block + hub toe.
 * The angles simply add because blocks and hubs are labelled by the toe each contributes; this
 * follows that labelling convention and is not a 3-D suspension calculation.
 * @throws RangeError when any angle is not a finite number
 */
export function computeTotalRearToeDeg({ frontBlockDeg, rearBlockDeg, hubToeDeg = 0 }: RearToeAngles): number {
  const front = requireFinite('frontBlockDeg', frontBlockDeg);
  const rear = requireFinite('rearBlockDeg', rearBlockDeg);
  const hub = requireFinite('hubToeDeg', hubToeDeg);
  return requireFiniteResult('total rear toe', front + rear + hub);
}
