/** One representative input per built-in method, for benchmarks and smoke checks. */
export const methodSamples: Record<string, Record<string, unknown>> = {
  'feature-boundary': { featureType: 'internal', lowerLimit: 10.0, upperLimit: 10.2, tolerance: 0.1, modifier: 'MMC' },
  'wall-thickness': {
    arrangement: 'coaxial',
    feature: { featureType: 'internal', lowerLimit: 19.9, upperLimit: 20.1 },
    datum: { featureType: 'external', lowerLimit: 29.9, upperLimit: 30.1 },
    positionTolerance: 0.2,
    toleranceModifier: 'LMC',
    datumModifier: 'LMB',
  },
  'fastener-floating': { holeSize: 10.5, fastenerSize: 10 },
  'fastener-fixed': { holeSize: 10.5, fastenerSize: 10, toleranceThreaded: 0.3 },
  'iso286-fit': { nominalSize: 50, hole: 'H7', shaft: 'g6' },
  iso2768: { nominalSize: 75, class: 'm' },
  'iso2768-angular': { shorterLegLength: 40, class: 'm' },
  'iso2768-geometric': { characteristic: 'flatness', length: 150, class: 'K' },
  'stack-1d': {
    contributors: [
      { name: 'Bore depth', sense: 1, nominal: 40, plusTol: 0.1, minusTol: 0.1 },
      { name: 'Spacer', sense: -1, nominal: 25, plusTol: 0.05, minusTol: 0.05 },
      { name: 'Ring', sense: -1, nominal: 2, plusTol: 0.03, minusTol: 0.03 },
      { name: 'Shoulder', sense: -1, nominal: 10, plusTol: 0.05, minusTol: 0.05 },
    ],
    lowerSpec: 2.8,
    upperSpec: 3.2,
    trials: 10_000,
    seed: 1,
  },
  // Eight holes on a Ø120 circle, all 0.06 off in x: conform only with the pattern shifted by the datum bore's MMB departure.
  'position-check': {
    featureType: 'internal',
    lowerLimit: 10.5,
    upperLimit: 10.68,
    positionTolerance: 0.1,
    toleranceModifier: 'MMC',
    datum: { featureType: 'internal', lowerLimit: 40, upperLimit: 40.025, actualSize: 40.025 },
    datumModifier: 'MMB',
    features: Array.from({ length: 8 }, (_, index) => {
      const angle = (index * Math.PI) / 4;
      const basicX = 60 * Math.cos(angle);
      const basicY = 60 * Math.sin(angle);
      return { label: `H${index + 1}`, basicX, basicY, measuredX: basicX + 0.06, measuredY: basicY, actualSize: 10.5 };
    }),
  },
  formula: {
    expressions: ['squeeze = (grooveDepth - (crossSection - compression)) ', 'ratio = compression / crossSection * 100'],
    values: { grooveDepth: '2.6 mm', crossSection: '3.53 mm', compression: '0.8 mm' },
    checks: [{ expression: 'ratio > 15 and ratio < 30', message: 'Squeeze within 15–30 %' }],
  },
};
