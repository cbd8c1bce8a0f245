import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { wallGeometry } from './wall-geometry.js';

const fieldsOf = (run: () => unknown): Record<string, string> => {
  try {
    run();
  } catch (error) {
    if (error instanceof EngineError) return error.fields;
    throw error;
  }
  throw new Error('expected an EngineError');
};

describe('wallGeometry', () => {
  it('puts a coaxial bore inside its datum boss, and a boss around its datum bore', () => {
    expect(wallGeometry('coaxial', 'internal', 'external', undefined)).toEqual({ kind: 'inside', basicDistance: 0, outer: 'datum' });
    expect(wallGeometry('coaxial', 'external', 'internal', null)).toEqual({ kind: 'inside', basicDistance: 0, outer: 'feature' });
  });

  it('takes the wall between two holes side by side, or between a hole and a plane datum face', () => {
    expect(wallGeometry('side-by-side', 'internal', 'internal', 15)).toEqual({ kind: 'between', basicDistance: 15, datumIsPlane: false });
    expect(wallGeometry('side-by-side', 'internal', 'plane', 8)).toEqual({ kind: 'between', basicDistance: 8, datumIsPlane: true });
  });

  it('takes the boss material beside an off-centre hole within it', () => {
    expect(wallGeometry('side-by-side', 'internal', 'external', 6)).toEqual({ kind: 'inside', basicDistance: 6, outer: 'datum' });
    expect(wallGeometry('side-by-side', 'external', 'internal', 2)).toEqual({ kind: 'inside', basicDistance: 2, outer: 'feature' });
  });

  it('refuses pairs that bound no wall', () => {
    expect(Object.keys(fieldsOf(() => wallGeometry('coaxial', 'internal', 'internal', undefined)))).toEqual(['feature.featureType']);
    expect(fieldsOf(() => wallGeometry('coaxial', 'external', 'external', undefined))['feature.featureType']).toMatch(/no wall/);
    expect(Object.keys(fieldsOf(() => wallGeometry('coaxial', 'internal', 'plane', undefined)))).toEqual(['datum.featureType']);
    expect(fieldsOf(() => wallGeometry('side-by-side', 'external', 'external', 20))['feature.featureType']).toMatch(/gap between them, not a wall/);
    expect(Object.keys(fieldsOf(() => wallGeometry('side-by-side', 'external', 'plane', 20)))).toEqual(['feature.featureType']);
  });
});
