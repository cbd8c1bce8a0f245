// Method input schemas carry names and descriptions but no display labels; these give the
// form the words an engineer expects, and say which numbers are lengths (and so take a unit).

const labelsByPath: Record<string, string> = {
  feature: 'Located feature',
  datum: 'Datum feature',
};

const labelsByName: Record<string, string> = {
  arrangement: 'Arrangement',
  basicDistance: 'Basic distance',
  featureType: 'Feature type',
  lowerLimit: 'Lower limit of size',
  upperLimit: 'Upper limit of size',
  positionTolerance: 'Position tolerance',
  toleranceModifier: 'Tolerance modifier',
  datumModifier: 'Datum modifier',
  requiredMinWall: 'Required minimum wall',
  tolerance: 'Geometric tolerance',
  modifier: 'Material condition',
  nominalSize: 'Nominal size',
  hole: 'Hole tolerance class',
  shaft: 'Shaft tolerance class',
  holeSize: 'Hole size (H)',
  fastenerSize: 'Fastener size (F)',
  toleranceThreaded: 'Fixed part tolerance (T2)',
  projection: 'Projection (P)',
  engagementDepth: 'Engagement depth (D)',
  class: 'Tolerance class',
  designation: 'Title-block designation',
  feature: 'Feature',
  shorterLegLength: 'Shorter leg length',
  characteristic: 'Characteristic',
  length: 'Length',
  contributors: 'Contributors',
  lowerSpec: 'Lower spec limit',
  upperSpec: 'Upper spec limit',
  acceptance: 'Acceptance criterion',
  trials: 'Monte Carlo trials',
  seed: 'Random seed',
  name: 'Name',
  sense: 'Sense',
  nominal: 'Nominal',
  plusTol: '+ Tol',
  minusTol: '− Tol',
  distribution: 'Distribution',
  cpk: 'Cpk',
  sigma: 'σ',
  expressions: 'Expressions',
  values: 'Values',
  checks: 'Checks',
  features: 'Measured features',
  label: 'Label',
  basicX: 'Basic X',
  basicY: 'Basic Y',
  measuredX: 'Measured X',
  measuredY: 'Measured Y',
  actualSize: 'Actual size',
};

// In the fastener methods T1 is the clearance holes' tolerance.
const labelsInContext: Record<string, string> = {
  'fastener-fixed:positionTolerance': 'Hole position tolerance (T1)',
  'fastener-floating:positionTolerance': 'Position tolerance (T)',
  'position-check:datum': 'Datum feature of size (optional)',
};

const lengthNames = new Set([
  'lowerLimit',
  'upperLimit',
  'basicDistance',
  'positionTolerance',
  'requiredMinWall',
  'tolerance',
  'nominalSize',
  'holeSize',
  'fastenerSize',
  'toleranceThreaded',
  'projection',
  'engagementDepth',
  'shorterLegLength',
  'length',
  'nominal',
  'plusTol',
  'minusTol',
  'sigma',
  'lowerSpec',
  'upperSpec',
  'basicX',
  'basicY',
  'measuredX',
  'measuredY',
  'actualSize',
]);

export function humanize(name: string): string {
  const words = name
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/[-_]+/g, ' ')
    .trim()
    .toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

export function fieldLabel(name: string, path: string, parentName?: string, method?: string): string {
  if (method && labelsInContext[`${method}:${name}`]) return labelsInContext[`${method}:${name}`] as string;
  if (labelsByPath[path]) return labelsByPath[path] as string;
  if (parentName === 'datum' && name === 'featureType') return 'Datum feature type';
  return labelsByName[name] ?? humanize(name);
}

/** Whether a numeric input is a length, so it shows the unit and converts between mm and inch. */
export function isLengthField(name: string, description?: string): boolean {
  return lengthNames.has(name) || /in the request unit/i.test(description ?? '');
}

const optionLabels: Record<string, string> = {
  'side-by-side': 'Side by side',
  'radius-chamfer': 'Radius or chamfer',
  'circular-run-out': 'Circular run-out',
  'worst-case': 'Worst case',
  rss: 'RSS',
  'inflated-rss': '1.5 × RSS',
};

export function optionLabel(name: string, value: string | number): string {
  if (name === 'sense' && (value === 1 || value === -1)) return value === 1 ? '+1 adds' : '−1 subtracts';
  const text = String(value);
  if (optionLabels[text]) return optionLabels[text] as string;
  // Modifiers (MMC, LMB…) and classes (H, K, m…) are written as the standards write them.
  if (/^[A-Z]+$/.test(text) || text.length <= 2) return text;
  return humanize(text);
}

// Keys inside object and table outputs, for their labels and to tell lengths from counts and ratios.
const outputKeyLabels: Record<string, string> = {
  min: 'Min',
  max: 'Max',
  tolerance: 'Tolerance',
  mean: 'Mean',
  stdDev: 'Std. deviation',
  predictedStdDev: 'Predicted std. deviation',
  sigma: 'σ',
  cp: 'Cp',
  cpk: 'Cpk',
  ppmBelow: 'Below lower limit',
  ppmAbove: 'Above upper limit',
  ppmTotal: 'Out of spec, total',
  trials: 'Trials',
  seed: 'Seed',
  featureSize: 'Located feature size',
  datumSize: 'Datum feature size',
  actualSize: 'Actual size',
  bonus: 'Bonus',
  totalTolerance: 'Total tolerance',
  designation: 'Class',
  upperDeviation: 'Upper deviation',
  lowerDeviation: 'Lower deviation',
  maxSize: 'Max size',
  minSize: 'Min size',
  itGrade: 'Grade',
  toleranceValue: 'Tolerance',
  standardTolerance: 'Standard tolerance',
  deviationSizeRange: 'Deviation size range',
  over: 'Over',
  upTo: 'Up to',
  percent: 'Share',
  name: 'Contributor',
  label: 'Feature',
  dx: 'Δx',
  dy: 'Δy',
  deviation: 'Position ⌀',
  allowed: 'Allowed ⌀',
  sizeConforms: 'Size OK',
  conformsAsMeasured: 'As measured',
  deviationWithShift: '⌀ after shift',
};

const lengthOutputKeys = new Set([
  'min',
  'max',
  'tolerance',
  'mean',
  'stdDev',
  'predictedStdDev',
  'sigma',
  'featureSize',
  'datumSize',
  'actualSize',
  'bonus',
  'totalTolerance',
  'upperDeviation',
  'lowerDeviation',
  'maxSize',
  'minSize',
  'toleranceValue',
  'standardTolerance',
  'over',
  'upTo',
  'dx',
  'dy',
  'deviation',
  'allowed',
  'deviationWithShift',
]);

export function outputKeyLabel(key: string): string {
  return outputKeyLabels[key] ?? humanize(key);
}

/** The unit shown after a value found at `key` inside an object or table output. */
export function outputKeyUnit(key: string, unit: string): string {
  if (lengthOutputKeys.has(key)) return unit;
  if (key === 'percent') return '%';
  if (key.startsWith('ppm')) return 'ppm';
  return '';
}
