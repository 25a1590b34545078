import fc from 'fast-check';
import { computeTotalRearToeDeg } from '../../../shared/compute/setup';

describe('total rear toe', () => {
  // Common practice, no source: blocks are labelled by the toe they add, and the labels sum.
  it('gives 1.75° toe-in from 2.75° rear blocks and a −1° front block', () => {
    expect(computeTotalRearToeDeg({ frontBlockDeg: -1, rearBlockDeg: 2.75 })).toBe(1.75);
  });

  it('adds toe built into the hub', () => {
    expect(computeTotalRearToeDeg({ frontBlockDeg: -1, rearBlockDeg: 2.75, hubToeDeg: 0.5 })).toBe(2.25);
  });

  it('reports toe-out as a negative angle', () => {
    expect(computeTotalRearToeDeg({ frontBlockDeg: -2, rearBlockDeg: 1, hubToeDeg: 0 })).toBe(-1);
  });

  it('flips sign when every angle flips sign', () => {
    const angle = fc.double({ min: -10, max: 10, noNaN: true });
    fc.assert(
      fc.property(angle, angle, angle, (front, rear, hub) => {
        const toe = computeTotalRearToeDeg({ frontBlockDeg: front, rearBlockDeg: rear, hubToeDeg: hub });
        const mirrored = computeTotalRearToeDeg({ frontBlockDeg: -front, rearBlockDeg: -rear, hubToeDeg: -hub });
        expect(mirrored).toBeCloseTo(-toe, 12);
      }),
    );
  });
});
