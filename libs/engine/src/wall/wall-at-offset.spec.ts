import { describe, expect, it } from 'vitest';
import { roundTo } from '../core/units.js';
import { wallAtOffset } from './wall-at-offset.js';

const wall = (...args: Parameters<typeof wallAtOffset>) => roundTo(wallAtOffset(...args), 6);

describe('wallAtOffset', () => {
  it('coaxial bore Ø20 in boss Ø30: (30 − 20)/2 less the offset toward the thin side', () => {
    const geometry = { kind: 'inside', basicDistance: 0, outer: 'datum' } as const;
    expect(wall(geometry, 20, 30, 0)).toBe(5);
    expect(wall(geometry, 20, 30, 0.1)).toBe(4.9);
    expect(wall(geometry, 20, 30, -0.1)).toBe(5.1);
  });

  it('a boss around its datum bore uses the feature as the outer surface', () => {
    expect(wall({ kind: 'inside', basicDistance: 0, outer: 'feature' }, 30, 20, 0.1)).toBe(4.9);
  });

  it('two holes Ø10 and Ø8 at 15 apart: 15 − 5 − 4, thinner as they move together', () => {
    const geometry = { kind: 'between', basicDistance: 15, datumIsPlane: false } as const;
    expect(wall(geometry, 8, 10, 0)).toBe(6);
    expect(wall(geometry, 8, 10, -0.2)).toBe(5.8);
  });

  it('a hole Ø10 at 8 from a plane datum face: 8 − 5', () => {
    expect(wall({ kind: 'between', basicDistance: 8, datumIsPlane: true }, 10, 0, 0)).toBe(3);
  });

  it('an off-centre hole Ø6 at 10 from the axis of a boss Ø30: 15 − 3 − 10', () => {
    expect(wall({ kind: 'inside', basicDistance: 10, outer: 'datum' }, 6, 30, 0.5)).toBe(1.5);
  });
});
