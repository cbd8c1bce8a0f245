import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { MM_PER_INCH } from '../core/units.js';
import { evaluateMethod } from '../registry.js';
import { wallThicknessMethod, type WallThicknessOutputs } from './wall-thickness-method.js';

type Limits = { featureType: 'internal' | 'external'; lowerLimit: number; upperLimit: number };
type WallInputs = {
  arrangement: 'coaxial' | 'side-by-side';
  basicDistance?: number;
  feature: Limits;
  datum: Limits | { featureType: 'plane' };
  positionTolerance: number;
  toleranceModifier: 'MMC' | 'LMC' | 'RFS';
  datumModifier?: 'MMB' | 'LMB' | 'RMB';
  requiredMinWall?: number;
};

const run = (inputs: unknown, unit: 'mm' | 'in' = 'mm') => {
  const result = evaluateMethod(wallThicknessMethod, inputs, unit);
  return { ...result, outputs: result.outputs as unknown as WallThicknessOutputs };
};

const fieldsOf = (inputs: unknown): Record<string, string> => {
  try {
    run(inputs);
  } catch (error) {
    if (error instanceof EngineError) return error.fields;
    throw error;
  }
  throw new Error('expected an EngineError');
};

// reference.md §5 coaxial example [D]: boss Ø30 ±0.1 (datum), bore Ø20 ±0.1, position Ø0.2
// (ASME Y14.5M-1994 §5.3.5 "LMC to protect wall thickness" as reproduced in training texts [C]).
const boreInBoss = (toleranceModifier: WallInputs['toleranceModifier'], datumModifier: WallInputs['datumModifier']): WallInputs => ({
  arrangement: 'coaxial',
  feature: { featureType: 'internal', lowerLimit: 19.9, upperLimit: 20.1 },
  datum: { featureType: 'external', lowerLimit: 29.9, upperLimit: 30.1 },
  positionTolerance: 0.2,
  toleranceModifier,
  datumModifier,
});

// reference.md §5 plane example [D]: hole Ø10 +0.2/0 at 8.0 basic from a plane datum, position Ø0.3.
const holeNearEdge = (toleranceModifier: WallInputs['toleranceModifier']): WallInputs => ({
  arrangement: 'side-by-side',
  basicDistance: 8,
  feature: { featureType: 'internal', lowerLimit: 10, upperLimit: 10.2 },
  datum: { featureType: 'plane' },
  positionTolerance: 0.3,
  toleranceModifier,
});

describe('wall-thickness method: check values', () => {
  it('coaxial LMC/LMB: 4.80 at every produced pair of sizes, shown as constant (reference.md §5 [D])', () => {
    const { outputs, steps } = run(boreInBoss('LMC', 'LMB'));
    expect(outputs.minWall).toBe(4.8);
    expect(outputs.minWallIsConstant).toBe(true);
    expect(outputs.minWallSpread).toBe(0);
    expect(outputs.sweep.series.flatMap((series) => series.minWall).every((wall) => wall === 4.8)).toBe(true);
    const constancy = steps.find((step) => step.label === 'Minimum wall across all produced sizes');
    expect(constancy?.value).toBe('constant: 4.8 mm at every produced size');
  });

  it('coaxial RFS/RMB: 4.80 at the LMC sizes to 5.00 at the MMC sizes (reference.md §5 [D])', () => {
    const { outputs } = run(boreInBoss('RFS', 'RMB'));
    expect(outputs.minWall).toBe(4.8);
    expect(outputs.minWallAt).toEqual({ featureSize: 20.1, datumSize: 29.9 });
    expect(outputs.minWallIsConstant).toBe(false);
    const atMmcSizes = outputs.sweep.series.find((series) => series.datumSize === 30.1)!.minWall[0];
    expect(atMmcSizes).toBe(5);
    expect(outputs.minWallSpread).toBe(0.2);
  });

  it('coaxial MMC/MMB: worst case 4.60 at the LMC sizes, bonus and datum shift reported apart (reference.md §5 [D])', () => {
    const { outputs, warnings } = run(boreInBoss('MMC', 'MMB'));
    expect(outputs).toMatchObject({
      minWall: 4.6,
      minWallAt: { featureSize: 20.1, datumSize: 29.9 },
      bonusAtMinWall: 0.2,
      datumShiftAtMinWall: 0.2,
      positionAllowanceAtMinWall: 0.6,
      offsetAtMinWall: 0.3,
      minWallIsConstant: false,
    });
    expect(warnings.join(' ')).toMatch(/thinnest at LMC sizes/);
  });

  it('coaxial RFS maximum wall: (30.1 − 19.9)/2 + 0.1 = 5.20 (derived from reference.md §5 wall formula)', () => {
    const { outputs } = run(boreInBoss('RFS', 'RMB'));
    expect(outputs.maxWall).toBe(5.2);
    expect(outputs.maxWallAt).toEqual({ featureSize: 19.9, datumSize: 30.1 });
  });

  it('a boss located to its bore gives the same walls as the bore located to its boss (derived from reference.md §5 by symmetry)', () => {
    const tube = run({
      ...boreInBoss('MMC', 'MMB'),
      feature: { featureType: 'external', lowerLimit: 29.9, upperLimit: 30.1 },
      datum: { featureType: 'internal', lowerLimit: 19.9, upperLimit: 20.1 },
    }).outputs;
    expect(tube.minWall).toBe(4.6);
    expect(tube.minWallAt).toEqual({ featureSize: 29.9, datumSize: 20.1 });
  });

  it('hole near a plane datum: LMC 2.75 constant, RFS 2.75 to 2.85, MMC worst 2.65 (reference.md §5 [D])', () => {
    const lmc = run(holeNearEdge('LMC')).outputs;
    expect([lmc.minWall, lmc.minWallIsConstant]).toEqual([2.75, true]);
    const rfs = run(holeNearEdge('RFS')).outputs;
    expect([rfs.minWall, rfs.minWallSpread, rfs.sweep.series[0]!.minWall[0]]).toEqual([2.75, 0.1, 2.85]);
    const mmc = run(holeNearEdge('MMC')).outputs;
    expect([mmc.minWall, mmc.bonusAtMinWall, mmc.datumShiftAtMinWall, mmc.minWallAt.datumSize]).toEqual([2.65, 0.2, 0, null]);
  });

  it('two holes side by side: Ø10–10.2 datum, Ø8–8.1 at 15 basic, position Ø0.2 at LMC, datum at LMB → 15 − 0.1 − 4.05 − 5.1 = 5.75 at every size (common practice, computed by hand)', () => {
    const { outputs } = run({
      arrangement: 'side-by-side',
      basicDistance: 15,
      feature: { featureType: 'internal', lowerLimit: 8, upperLimit: 8.1 },
      datum: { featureType: 'internal', lowerLimit: 10, upperLimit: 10.2 },
      positionTolerance: 0.2,
      toleranceModifier: 'LMC',
      datumModifier: 'LMB',
    });
    expect([outputs.minWall, outputs.minWallIsConstant]).toEqual([5.75, true]);
    // Thickest: MMC sizes moved apart by (0.2 + 0.1 + 0.2)/2: 15.25 − 4 − 5 = 6.25.
    expect(outputs.maxWall).toBe(6.25);
  });

  it('an off-centre hole Ø6–6.1 at 10 basic inside a boss Ø30 ±0.1, position Ø0.2 at MMC/MMB: 14.95 − 3.05 − 10 − (0.2 + 0.1 + 0.2)/2 = 1.65 (common practice, computed by hand)', () => {
    const { outputs } = run({
      arrangement: 'side-by-side',
      basicDistance: 10,
      feature: { featureType: 'internal', lowerLimit: 6, upperLimit: 6.1 },
      datum: { featureType: 'external', lowerLimit: 29.9, upperLimit: 30.1 },
      positionTolerance: 0.2,
      toleranceModifier: 'MMC',
      datumModifier: 'MMB',
    });
    expect(outputs.minWall).toBe(1.65);
  });

  // reference.md §5 coaxial example converted to inch (÷25.4 exactly): boss 1.177–1.185, bore .783–.791, position .008.
  it('works in inch: bore .783–.791 in boss 1.177–1.185, position .008 at LMC/LMB → (1.177 − .791 − .008)/2 = .189 constant', () => {
    const { outputs } = run(
      {
        arrangement: 'coaxial',
        feature: { featureType: 'internal', lowerLimit: 0.783, upperLimit: 0.791 },
        datum: { featureType: 'external', lowerLimit: 1.177, upperLimit: 1.185 },
        positionTolerance: 0.008,
        toleranceModifier: 'LMC',
        datumModifier: 'LMB',
      },
      'in',
    );
    expect([outputs.minWall, outputs.minWallIsConstant]).toEqual([0.189, true]);
  });
});

describe('wall-thickness method: derivation and verdict', () => {
  it('substitutes the numbers at the minimum-wall sizes', () => {
    const { steps } = run(boreInBoss('MMC', 'MMB'));
    const latex = Object.fromEntries(steps.map((step) => [step.label, step.latex]));
    expect(latex['Wall along the line of centres']).toBe('w = \\tfrac{D_d}{2} - \\tfrac{D_f}{2} - \\delta');
    expect(latex['Bonus at the minimum-wall sizes']).toBe('B = \\lvert 20.1 - 19.9 \\rvert = 0.2');
    expect(latex['Datum feature shift at the minimum-wall sizes']).toBe('S = \\lvert 29.9 - 30.1 \\rvert = 0.2');
    expect(latex['Offset allowance at the minimum-wall sizes']).toBe('e = \\tfrac{0.2 + 0.2 + 0.2}{2} = 0.3');
    expect(latex['Minimum wall']).toBe('w_{\\min} = \\tfrac{29.9}{2} - \\tfrac{20.1}{2} - 0.3 = 4.6');
  });

  it('gives a verdict against a required minimum wall', () => {
    expect(run({ ...boreInBoss('LMC', 'LMB'), requiredMinWall: 4.5 }).verdict?.pass).toBe(true);
    const failing = run({ ...boreInBoss('MMC', 'MMB'), requiredMinWall: 4.7 });
    expect(failing.verdict).toMatchObject({ pass: false, summary: 'Minimum wall 4.6 mm is below the required 4.7 mm' });
    expect(run(boreInBoss('MMC', 'MMB')).verdict).toBeUndefined();
  });
});

describe('wall-thickness method: refused inputs', () => {
  it('refuses a basic distance on coaxial features and requires it side by side', () => {
    expect(fieldsOf({ ...boreInBoss('LMC', 'LMB'), basicDistance: 5 })).toEqual({
      'inputs.basicDistance': 'Coaxial features share one axis: leave the basic distance empty',
    });
    const { basicDistance: _omitted, ...withoutDistance } = holeNearEdge('LMC');
    expect(Object.keys(fieldsOf(withoutDistance))).toEqual(['inputs.basicDistance']);
  });

  it('refuses inverted limits and negative tolerances per field', () => {
    expect(
      fieldsOf({
        ...boreInBoss('LMC', 'LMB'),
        feature: { featureType: 'internal', lowerLimit: 20.1, upperLimit: 19.9 },
        datum: { featureType: 'external', lowerLimit: 30.1, upperLimit: 29.9 },
        positionTolerance: -0.1,
      }),
    ).toEqual({
      'inputs.feature.lowerLimit': 'Lower limit must not exceed the upper limit',
      'inputs.datum.lowerLimit': 'Lower limit must not exceed the upper limit',
      'inputs.positionTolerance': 'Position tolerance must not be negative',
    });
  });

  it('refuses two coaxial internal features: no wall between them', () => {
    const fields = fieldsOf({ ...boreInBoss('LMC', 'LMB'), datum: { featureType: 'internal', lowerLimit: 29.9, upperLimit: 30.1 } });
    expect(fields['inputs.feature.featureType']).toMatch(/no wall/);
  });

  it('refuses a bore that does not fit inside its boss', () => {
    const fields = fieldsOf({ ...boreInBoss('RFS', 'RMB'), feature: { featureType: 'internal', lowerLimit: 29.8, upperLimit: 30 } });
    expect(fields['inputs.feature.upperLimit']).toMatch(/leaves no wall inside the datum feature/);
  });

  it('refuses a position tolerance that lets the bore break through', () => {
    const fields = fieldsOf({ ...boreInBoss('MMC', 'MMB'), positionTolerance: 9.5 });
    expect(fields['inputs.positionTolerance']).toMatch(/breaks through/);
  });

  it('refuses side-by-side holes that touch at worst case and says how far apart they must be', () => {
    // 10.2/2 + 8.1/2 + (0.2 + 0.1 + 0.2)/2 = 9.4: at 9.4 basic they touch.
    const fields = fieldsOf({
      arrangement: 'side-by-side',
      basicDistance: 9.4,
      feature: { featureType: 'internal', lowerLimit: 8, upperLimit: 8.1 },
      datum: { featureType: 'internal', lowerLimit: 10, upperLimit: 10.2 },
      positionTolerance: 0.2,
      toleranceModifier: 'MMC',
      datumModifier: 'MMB',
    });
    expect(fields['inputs.basicDistance']).toMatch(/touch or overlap .* the basic distance must exceed 9\.4 mm$/);
  });

  it('refuses a hole that breaks out through a plane datum face at worst case', () => {
    // 10.2/2 + (0.3 + 0.2)/2 = 5.35 needed; at 5.3 the hole breaks out at LMC size (reference.md §5 plane example, MMC).
    expect(fieldsOf({ ...holeNearEdge('MMC'), basicDistance: 5.3 })['inputs.basicDistance']).toMatch(/breaks out through the datum face .* must exceed 5\.35 mm$/);
  });

  it('refuses MMB or LMB on a plane datum, and limits given to a plane', () => {
    expect(fieldsOf({ ...holeNearEdge('LMC'), datumModifier: 'LMB' })).toEqual({
      'inputs.datumModifier': 'A plane datum has no size, so MMB or LMB cannot apply: use RMB or leave it empty',
    });
    expect(Object.keys(fieldsOf({ ...holeNearEdge('LMC'), datum: { featureType: 'plane', lowerLimit: 1 } }))).toEqual(['inputs.datum.lowerLimit']);
    expect(run({ ...holeNearEdge('LMC'), datumModifier: 'RMB' }).outputs.minWall).toBe(2.75);
  });

  it('requires a datum modifier and datum limits for a datum feature of size', () => {
    const { datumModifier: _omitted, ...inputs } = boreInBoss('LMC', 'LMB');
    expect(Object.keys(fieldsOf({ ...inputs, datum: { featureType: 'external' } })).sort()).toEqual([
      'inputs.datum.lowerLimit',
      'inputs.datum.upperLimit',
      'inputs.datumModifier',
    ]);
  });
});

// ---------------------------------------------------------------------------------------------
// Properties. The brute force below is written independently of the engine: it places the located
// feature's centre at every point of a polar grid inside its allowed zone (radius = (t + bonus +
// datum shift)/2 about its basic location, in 2D) and measures the true distance between the two
// circles (or the circle and the plane), over a fine grid of both produced sizes.

type Config = WallInputs & { datum: Limits | { featureType: 'plane' } };

function bruteForceThinnestBySize(config: Config, steps = 20): number[] {
  const { feature, datum } = config;
  const featureMmc = feature.featureType === 'internal' ? feature.lowerLimit : feature.upperLimit;
  const featureLmc = feature.featureType === 'internal' ? feature.upperLimit : feature.lowerLimit;
  const L = config.basicDistance ?? 0;
  const walls: number[] = [];
  const datumSizes = datum.featureType === 'plane' ? [0] : grid(datum.lowerLimit, datum.upperLimit, steps);
  for (const datumSize of datumSizes) {
    for (const featureSize of grid(feature.lowerLimit, feature.upperLimit, steps)) {
      const bonus =
        config.toleranceModifier === 'MMC' ? Math.abs(featureSize - featureMmc) : config.toleranceModifier === 'LMC' ? Math.abs(featureSize - featureLmc) : 0;
      let shift = 0;
      if (datum.featureType !== 'plane' && config.datumModifier !== 'RMB') {
        const datumMmb = datum.featureType === 'internal' ? datum.lowerLimit : datum.upperLimit;
        const datumLmb = datum.featureType === 'internal' ? datum.upperLimit : datum.lowerLimit;
        shift = Math.abs(datumSize - (config.datumModifier === 'MMB' ? datumMmb : datumLmb));
      }
      const radius = (config.positionTolerance + bonus + shift) / 2;
      let thinnest = Infinity;
      for (let ring = 0; ring <= 4; ring += 1) {
        for (let angle = 0; angle < 360; angle += 7.5) {
          const x = L + ((radius * ring) / 4) * Math.cos((angle * Math.PI) / 180);
          const y = ((radius * ring) / 4) * Math.sin((angle * Math.PI) / 180);
          thinnest = Math.min(thinnest, distanceBetweenSurfaces(config, featureSize, datumSize, x, y));
        }
      }
      walls.push(thinnest);
    }
  }
  return walls;
}

/** Material between the surfaces, with the feature centre at (x, y) and the datum centre (or plane) at x = 0. */
function distanceBetweenSurfaces(config: Config, featureSize: number, datumSize: number, x: number, y: number): number {
  const centres = Math.hypot(x, y);
  if (config.datum.featureType === 'plane') return x - featureSize / 2;
  if (config.feature.featureType === 'internal' && config.datum.featureType === 'internal') return centres - featureSize / 2 - datumSize / 2;
  const [outer, inner] = config.feature.featureType === 'external' ? [featureSize, datumSize] : [datumSize, featureSize];
  return outer / 2 - inner / 2 - centres;
}

function grid(from: number, to: number, steps: number): number[] {
  return Array.from({ length: steps + 1 }, (_, index) => from + ((to - from) * index) / steps);
}

const microns = (min: number, max: number) => fc.integer({ min, max }).map((value) => value / 1000);

/** Valid configurations: sizes and distances chosen so that a wall remains even at worst case. */
const configArbitrary = (modifiers?: { tolerance: WallInputs['toleranceModifier']; datum: WallInputs['datumModifier'] }) =>
  fc
    .record({
      layout: fc.constantFrom('bore-in-boss', 'boss-around-bore', 'holes-side-by-side', 'hole-in-boss-off-centre', 'boss-around-bore-off-centre', 'hole-near-plane'),
      innerLower: microns(1000, 60_000),
      featureSizeTol: microns(0, 500),
      datumSizeTol: microns(0, 500),
      tolerance: microns(0, 600),
      margin: microns(50, 20_000),
      offCentre: microns(1000, 20_000),
      toleranceModifier: fc.constantFrom('MMC' as const, 'LMC' as const, 'RFS' as const),
      datumModifier: fc.constantFrom('MMB' as const, 'LMB' as const, 'RMB' as const),
    })
    .map((draw): Config => {
      const toleranceModifier = modifiers?.tolerance ?? draw.toleranceModifier;
      const datumModifier = modifiers?.datum ?? draw.datumModifier;
      const allowance = draw.tolerance + draw.featureSizeTol + draw.datumSizeTol;
      const limits = (featureType: Limits['featureType'], lower: number, sizeTol: number): Limits => ({
        featureType,
        lowerLimit: round3(lower),
        upperLimit: round3(lower + sizeTol),
      });
      const common = { positionTolerance: draw.tolerance, toleranceModifier, datumModifier };
      switch (draw.layout) {
        case 'bore-in-boss': {
          const feature = limits('internal', draw.innerLower, draw.featureSizeTol);
          return { ...common, arrangement: 'coaxial', feature, datum: limits('external', feature.upperLimit + allowance + draw.margin, draw.datumSizeTol) };
        }
        case 'boss-around-bore': {
          const datum = limits('internal', draw.innerLower, draw.datumSizeTol);
          return { ...common, arrangement: 'coaxial', datum, feature: limits('external', datum.upperLimit + allowance + draw.margin, draw.featureSizeTol) };
        }
        case 'holes-side-by-side': {
          const feature = limits('internal', draw.innerLower, draw.featureSizeTol);
          const datum = limits('internal', draw.innerLower / 2 + 1, draw.datumSizeTol);
          const basicDistance = round3(feature.upperLimit / 2 + datum.upperLimit / 2 + allowance / 2 + draw.margin);
          return { ...common, arrangement: 'side-by-side', basicDistance, feature, datum };
        }
        case 'hole-in-boss-off-centre': {
          const feature = limits('internal', draw.innerLower, draw.featureSizeTol);
          const datum = limits('external', feature.upperLimit + 2 * draw.offCentre + allowance + draw.margin, draw.datumSizeTol);
          return { ...common, arrangement: 'side-by-side', basicDistance: draw.offCentre, feature, datum };
        }
        case 'boss-around-bore-off-centre': {
          const datum = limits('internal', draw.innerLower, draw.datumSizeTol);
          const feature = limits('external', datum.upperLimit + 2 * draw.offCentre + allowance + draw.margin, draw.featureSizeTol);
          return { ...common, arrangement: 'side-by-side', basicDistance: draw.offCentre, feature, datum };
        }
        case 'hole-near-plane': {
          const feature = limits('internal', draw.innerLower, draw.featureSizeTol);
          const basicDistance = round3(feature.upperLimit / 2 + allowance / 2 + draw.margin);
          return { ...common, arrangement: 'side-by-side', basicDistance, feature, datum: { featureType: 'plane' }, datumModifier: undefined };
        }
      }
    });

function round3(value: number): number {
  return Math.round(value * 1000) / 1000;
}

const resolutionMm = 0.0001;

describe('wall-thickness method: properties', () => {
  it('under LMC with the datum at LMB the minimum wall is the same for every produced pair of sizes', () => {
    fc.assert(
      fc.property(configArbitrary({ tolerance: 'LMC', datum: 'LMB' }), (config) => {
        const bySize = bruteForceThinnestBySize(config);
        expect(Math.max(...bySize) - Math.min(...bySize)).toBeLessThan(1e-9);
        const { outputs } = run(config);
        expect(outputs.minWallIsConstant).toBe(true);
        expect(Math.abs(outputs.minWall - Math.min(...bySize))).toBeLessThanOrEqual(resolutionMm / 2 + 1e-9);
      }),
      { numRuns: 60 },
    );
  });

  it('the minimum wall equals a brute-force search over sizes and offsets', () => {
    fc.assert(
      fc.property(configArbitrary(), (config) => {
        const bruteForce = Math.min(...bruteForceThinnestBySize(config));
        const { outputs } = run(config);
        expect(Math.abs(outputs.minWall - bruteForce)).toBeLessThanOrEqual(resolutionMm / 2 + 1e-9);
      }),
      { numRuns: 80 },
    );
  });

  it('reports bonus between zero and the size tolerance, and datum shift between zero and the datum size tolerance', () => {
    fc.assert(
      fc.property(configArbitrary(), (config) => {
        const { outputs } = run(config);
        const featureSizeTol = config.feature.upperLimit - config.feature.lowerLimit;
        const datumSizeTol = config.datum.featureType === 'plane' ? 0 : config.datum.upperLimit - config.datum.lowerLimit;
        expect(outputs.bonusAtMinWall).toBeGreaterThanOrEqual(0);
        expect(outputs.bonusAtMinWall).toBeLessThanOrEqual(featureSizeTol + resolutionMm);
        expect(outputs.datumShiftAtMinWall).toBeGreaterThanOrEqual(0);
        expect(outputs.datumShiftAtMinWall).toBeLessThanOrEqual(datumSizeTol + resolutionMm);
        expect(outputs.maxWall).toBeGreaterThanOrEqual(outputs.minWall);
      }),
      { numRuns: 60 },
    );
  });

  it('mm and inch results agree', () => {
    const toInch = (value: number) => value / MM_PER_INCH;
    const limitsToInch = (limits: Config['datum']) =>
      limits.featureType === 'plane' ? limits : { ...limits, lowerLimit: toInch(limits.lowerLimit), upperLimit: toInch(limits.upperLimit) };
    fc.assert(
      fc.property(configArbitrary(), (config) => {
        const inMm = run(config).outputs;
        const inchConfig = {
          ...config,
          ...(config.basicDistance === undefined ? {} : { basicDistance: toInch(config.basicDistance) }),
          positionTolerance: toInch(config.positionTolerance),
          feature: limitsToInch(config.feature),
          datum: limitsToInch(config.datum),
        };
        const inInch = run(inchConfig, 'in').outputs;
        // Both sides are rounded for display: 0.0001 mm and 0.00001 in (0.000254 mm).
        const within = resolutionMm / 2 + (0.00001 * MM_PER_INCH) / 2 + 1e-9;
        for (const key of ['minWall', 'maxWall', 'bonusAtMinWall', 'datumShiftAtMinWall', 'positionAllowanceAtMinWall'] as const) {
          expect(Math.abs(inMm[key] - inInch[key] * MM_PER_INCH)).toBeLessThanOrEqual(within);
        }
      }),
      { numRuns: 60 },
    );
  });
});
