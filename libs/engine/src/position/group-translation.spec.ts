import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { groupTranslation, type Disc } from './group-translation.js';

const inside = (point: { x: number; y: number }, disc: Disc, epsilon = 1e-9) => Math.hypot(point.x - disc.x, point.y - disc.y) <= disc.r + epsilon;

describe('groupTranslation', () => {
  it('finds a common point of overlapping discs, inside every one', () => {
    const discs = [
      { x: 0, y: 0, r: 0.05 },
      { x: 0.06, y: 0, r: 0.05 },
      { x: 0.06, y: 0.01, r: 0.05 },
    ];
    const found = groupTranslation(discs, 1e-12);
    expect(found.feasible).toBe(true);
    if (found.feasible) for (const disc of discs) expect(inside(found, disc)).toBe(true);
  });

  it('reports no common point when two discs are apart', () => {
    expect(groupTranslation([{ x: 0, y: 0, r: 0.05 }, { x: 0.09, y: 0, r: 0.05 }, { x: -0.09, y: 0, r: 0.05 }], 1e-12).feasible).toBe(false);
  });

  it('accepts discs that only touch, and a disc of zero radius inside the others', () => {
    expect(groupTranslation([{ x: 0, y: 0, r: 0.05 }, { x: 0.1, y: 0, r: 0.05 }], 1e-12)).toMatchObject({ feasible: true });
    const found = groupTranslation([{ x: 0.02, y: 0.01, r: 0 }, { x: 0, y: 0, r: 0.05 }], 1e-12);
    expect(found).toMatchObject({ feasible: true });
    if (found.feasible) expect([found.x, found.y].map((v) => Math.round(v * 1e9) / 1e9)).toEqual([0.02, 0.01]);
  });

  it('agrees with a fine grid search on random small instances', () => {
    // Oracle: a grid point clearly inside every disc proves the intersection is not empty.
    fc.assert(
      fc.property(
        fc.array(fc.record({ x: fc.double({ min: -1, max: 1, noNaN: true }), y: fc.double({ min: -1, max: 1, noNaN: true }), r: fc.double({ min: 0.05, max: 1.5, noNaN: true }) }), {
          minLength: 1,
          maxLength: 6,
        }),
        (discs) => {
          const found = groupTranslation(discs, 1e-12);
          if (found.feasible) for (const disc of discs) expect(inside(found, disc, 1e-9)).toBe(true);
          let gridHit = false;
          for (let i = -60; i <= 60 && !gridHit; i += 1) {
            for (let j = -60; j <= 60 && !gridHit; j += 1) {
              const point = { x: i / 30, y: j / 30 };
              if (discs.every((disc) => Math.hypot(point.x - disc.x, point.y - disc.y) <= disc.r - 1e-6)) gridHit = true;
            }
          }
          if (gridHit) expect(found.feasible).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });
});
