import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { evaluateMethod, findMethod } from '../registry.js';
import { gradeNames } from './tables/standard-tolerance-grades.js';
import { holeLetters, shaftLetters } from './parse-tolerance-class.js';
import { iso286FitMethod, type Iso286FitOutputs } from './iso286-fit.method.js';

type Unit = 'mm' | 'in';
const evaluate = (inputs: Record<string, unknown>, unit: Unit = 'mm') => iso286FitMethod.evaluate(iso286FitMethod.inputSchema.parse(inputs), { unit });
const outputsOf = (inputs: Record<string, unknown>, unit: Unit = 'mm') => evaluate(inputs, unit).outputs as Iso286FitOutputs;
const um = (mm: number | null | undefined) => (mm === null || mm === undefined ? mm : Math.round(mm * 100_000) / 100);

function engineError(run: () => unknown): EngineError {
  try {
    run();
  } catch (error) {
    if (error instanceof EngineError) return error;
    throw error;
  }
  throw new Error('expected an EngineError');
}

describe('iso286-fit method', () => {
  // Hole-basis fits [D from ISO 286-1 tables; shaft limits cross-checked against a vendor's ISO tolerance
  // table; H7/s6 at 50 mm against Bhandari, Design of Machine Elements, Example 3.3] (team reference sheet §2).
  it.each([
    ['H7', 'g6', 10, [0, 15], [-14, -5], 29, 5, 'clearance'],
    ['H7', 'g6', 50, [0, 25], [-25, -9], 50, 9, 'clearance'],
    ['H7', 'h6', 25, [0, 21], [-13, 0], 34, 0, 'clearance'],
    ['H7', 'k6', 50, [0, 25], [2, 18], 23, -18, 'transition'],
    ['H7', 'n6', 100, [0, 35], [23, 45], 12, -45, 'transition'],
    ['H7', 'p6', 10, [0, 15], [15, 24], 0, -24, 'interference'],
    ['H7', 's6', 50, [0, 25], [43, 59], -18, -59, 'interference'],
    ['H7', 's6', 100, [0, 35], [71, 93], -36, -93, 'interference'],
  ] as const)('%s/%s at %s mm [D, reference sheet §2]', (hole, shaft, size, [holeLower, holeUpper], [shaftLower, shaftUpper], maxCl, minCl, type) => {
    const outputs = outputsOf({ nominalSize: size, hole, shaft });
    expect([um(outputs.hole?.lowerDeviation), um(outputs.hole?.upperDeviation)]).toEqual([holeLower, holeUpper]);
    expect([um(outputs.shaft?.lowerDeviation), um(outputs.shaft?.upperDeviation)]).toEqual([shaftLower, shaftUpper]);
    expect([um(outputs.maxClearance), um(outputs.minClearance), outputs.fitType]).toEqual([maxCl, minCl, type]);
  });

  it('returns exact decimals in mm: limits, IT and clearances without float noise', () => {
    const outputs = outputsOf({ nominalSize: 10, hole: 'H7', shaft: 'g6' });
    expect(outputs.hole).toEqual({
      designation: 'H7', upperDeviation: 0.015, lowerDeviation: 0, maxSize: 10.015, minSize: 10, itGrade: 'IT7',
      toleranceValue: 0.015, standardTolerance: 0.015, deviationSizeRange: { over: 6, upTo: 10 },
    });
    expect(outputs.shaft).toMatchObject({ upperDeviation: -0.005, lowerDeviation: -0.014, maxSize: 9.995, minSize: 9.986 });
    expect(outputs).toMatchObject({ maxClearance: 0.029, minClearance: 0.005, sizeRange: { over: 6, upTo: 10 } });
    expect(outputsOf({ nominalSize: 3, hole: 'K3' }).hole).toMatchObject({ upperDeviation: 0, lowerDeviation: -0.002 });
    expect(outputsOf({ nominalSize: 5, shaft: 'js3' }).shaft).toMatchObject({ upperDeviation: 0.00125, lowerDeviation: -0.00125 });
  });

  it('gives one side alone with null clearances and fit type', () => {
    const outputs = outputsOf({ nominalSize: 40, shaft: 'f7' });
    expect(outputs.hole).toBeNull();
    expect(outputs).toMatchObject({ maxClearance: null, minClearance: null, fitType: null });
    expect(outputs.shaft).toMatchObject({ upperDeviation: -0.025, lowerDeviation: -0.05 });
  });

  it('answers in inches for an inch request, the same fit as in mm (0.5 in = 12.7 mm, range 10–18) [D]', () => {
    const outputs = outputsOf({ nominalSize: 0.5, hole: 'H7', shaft: 'p6' }, 'in');
    expect(outputs.hole).toMatchObject({ upperDeviation: 0.0007087, lowerDeviation: 0, maxSize: 0.5007087 });
    expect(outputs.shaft).toMatchObject({ upperDeviation: 0.0011417, lowerDeviation: 0.0007087 });
    expect(outputs).toMatchObject({ maxClearance: 0, minClearance: -0.0011417, fitType: 'interference' });
    expect(outputs.sizeRange).toEqual({ over: 0.3937008, upTo: 0.7086614 });
  });

  it('shows the derivation: range, IT, fundamental deviation with Δ, other deviation, limits, clearances, fit type', () => {
    const { steps } = evaluate({ nominalSize: 50, hole: 'N8', shaft: 'h7' });
    expect(steps.map((step) => step.label)).toEqual([
      'Nominal size range',
      'Standard tolerance of N8',
      'Δ for N8',
      'Fundamental deviation of N8 from shaft n plus Δ',
      'Other deviation of N8',
      'Limits of N8',
      'Standard tolerance of h7',
      'Fundamental deviation of h7',
      'Other deviation of h7',
      'Limits of h7',
      'Maximum clearance',
      'Minimum clearance',
      'Fit type',
    ]);
    expect(steps[2]?.latex).toBe('\\Delta = \\mathrm{IT}8 - \\mathrm{IT}7 = 39 - 25 = 14\\,\\mu\\text{m}');
    expect(steps[3]?.latex).toBe('ES = -ei_{n} + \\Delta = -17 + 14 = -3\\,\\mu\\text{m}');
    expect(steps[10]?.latex).toBe('C_{max} = ES - ei = -3 - \\left(-25\\right) = 22\\,\\mu\\text{m}');
    expect(steps.at(-1)?.value).toBe('transition fit (N8/h7)');
  });

  it('warns where js/JS rounds an odd IT and where IT1–IT5 are used above 500 mm', () => {
    expect(evaluate({ nominalSize: 25, shaft: 'js7' }).warnings).toEqual([expect.stringMatching(/odd.*±10 µm/)]);
    expect(evaluate({ nominalSize: 25, shaft: 'js6' }).warnings).toEqual([]);
    expect(evaluate({ nominalSize: 800, hole: 'H5' }).warnings).toEqual([expect.stringMatching(/experimental/)]);
  });

  it('refuses sizes outside 0–3150 mm, in the unit of the request', () => {
    expect(outputsOf({ nominalSize: 3150, hole: 'H7' }).hole).toMatchObject({ upperDeviation: 0.21 });
    const over = engineError(() => evaluate({ nominalSize: 3150.001, hole: 'H7' }));
    expect(over.code).toBe('INVALID_INPUT');
    expect(over.fields.nominalSize).toMatch(/at most 3150 mm/);
    expect(engineError(() => evaluate({ nominalSize: 125, hole: 'H7' }, 'in')).fields.nominalSize).toMatch(/124\.0157 in/);
    expect(() => iso286FitMethod.inputSchema.parse({ nominalSize: 0, hole: 'H7' })).toThrow(/greater than zero/);
  });

  it('accepts 3150 mm typed in inches despite float noise in the conversion', () => {
    expect(outputsOf({ nominalSize: 3150 / 25.4, shaft: 'h7' }, 'in').sizeRange).toEqual({ over: 98.4251969, upTo: 124.015748 });
  });

  it('refuses malformed classes as invalid input, per field, and undefined ones as not defined by the standard', () => {
    const malformed = engineError(() => evaluate({ nominalSize: 10, hole: 'h7', shaft: 'G6' }));
    expect(malformed.code).toBe('INVALID_INPUT');
    expect(malformed.fields.hole).toMatch(/Holes use capital letters/);
    expect(malformed.fields.shaft).toMatch(/Shafts use lower-case letters/);

    const notDefined = engineError(() => evaluate({ nominalSize: 12, hole: 'K9', shaft: 'cd7' }));
    expect(notDefined.code).toBe('NOT_DEFINED_BY_STANDARD');
    expect(notDefined.fields.hole).toMatch(/K9: ISO 286-1 gives K above IT8 only up to 3 mm/);
    expect(notDefined.fields.shaft).toMatch(/cd only up to 10 mm/);
  });

  it('needs a hole or a shaft class', () => {
    expect(() => iso286FitMethod.inputSchema.parse({ nominalSize: 10 })).toThrow(/hole class .* shaft class/);
    expect(() => iso286FitMethod.inputSchema.parse({ nominalSize: 10, hole: ' ' })).toThrow();
  });

  it('is registered and reports field paths under inputs through evaluateMethod', () => {
    const error = engineError(() => evaluateMethod(iso286FitMethod, { nominalSize: 10, hole: 'W7' }, 'mm'));
    expect(error.fields['inputs.hole']).toMatch(/no fundamental deviation "W"/);
    expect(findMethod('iso286-fit')).toBe(iso286FitMethod);
    expect(evaluateMethod(iso286FitMethod, { nominalSize: 10, hole: 'H7' }, 'mm').method).toBe('iso286-fit');
  });
});

describe('iso286-fit properties', () => {
  const sizeArbitrary = fc.oneof(
    fc.constantFrom(0.5, 1, 1.001, 3, 3.001, 6, 10, 10.001, 14, 18, 24, 30, 50, 50.001, 65, 80, 100, 250, 315, 355, 500, 500.001, 630, 1000, 2500, 3150),
    fc.double({ min: 0.01, max: 3150, noNaN: true }).map((value) => Math.round(value * 1000) / 1000 || 0.001),
  );
  const gradeArbitrary = fc.constantFrom(...gradeNames);
  const defined = (inputs: Record<string, unknown>) => {
    try {
      return outputsOf(inputs);
    } catch (error) {
      if (error instanceof EngineError && error.code === 'NOT_DEFINED_BY_STANDARD') return undefined;
      throw error;
    }
  };
  const evenRounded = (letter: string, grade: string, itUm: number) =>
    letter.toLowerCase() === 'js' && Number(grade) >= 7 && Number(grade) <= 11 && itUm % 2 === 1;

  it('tolerance = upper − lower = IT for every defined class (js/JS 7–11 with odd IT: IT − 1 µm)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...holeLetters, ...shaftLetters), gradeArbitrary, sizeArbitrary, (letter, grade, size) => {
        const field = letter === letter.toUpperCase() ? 'hole' : 'shaft';
        const outputs = defined({ nominalSize: size, [field]: `${letter}${grade}` });
        const side = outputs?.[field];
        if (!side) return;
        const it = um(side.standardTolerance) as number;
        expect(um(side.upperDeviation)! - um(side.lowerDeviation)!).toBeCloseTo(um(side.toleranceValue)!, 9);
        expect(um(side.toleranceValue)).toBe(evenRounded(letter, grade, it) ? it - 1 : it);
        expect(um(side.maxSize! - side.minSize!)).toBeCloseTo(um(side.toleranceValue)!, 6);
      }),
      { numRuns: 2000 },
    );
  });

  it('H has EI = 0, h has es = 0, js/JS are symmetric, A–H mirror a–h', () => {
    fc.assert(
      fc.property(gradeArbitrary, sizeArbitrary, fc.constantFrom('A', 'B', 'C', 'CD', 'D', 'E', 'EF', 'F', 'FG', 'G', 'H'), (grade, size, letter) => {
        const h = defined({ nominalSize: size, hole: `H${grade}`, shaft: `h${grade}` });
        if (h) {
          expect(h.hole?.lowerDeviation).toBe(0);
          expect(h.shaft?.upperDeviation).toBe(0);
        }
        const js = defined({ nominalSize: size, hole: `JS${grade}`, shaft: `js${grade}` });
        if (js) {
          expect(js.hole?.upperDeviation).toBe(-js.hole!.lowerDeviation);
          expect(js.shaft?.upperDeviation).toBe(-js.shaft!.lowerDeviation);
        }
        const mirror = defined({ nominalSize: size, hole: `${letter}${grade}`, shaft: `${letter.toLowerCase()}${grade}` });
        if (mirror) expect(mirror.hole?.lowerDeviation).toBe(-mirror.shaft!.upperDeviation || 0);
      }),
      { numRuns: 1000 },
    );
  });

  it('max clearance = ES − ei, min clearance = EI − es, and the fit type follows from them', () => {
    fc.assert(
      fc.property(fc.constantFrom(...holeLetters), fc.constantFrom(...shaftLetters), gradeArbitrary, gradeArbitrary, sizeArbitrary, (holeLetter, shaftLetter, holeGrade, shaftGrade, size) => {
        const outputs = defined({ nominalSize: size, hole: `${holeLetter}${holeGrade}`, shaft: `${shaftLetter}${shaftGrade}` });
        if (!outputs?.hole || !outputs.shaft) return;
        expect(um(outputs.maxClearance)).toBeCloseTo(um(outputs.hole.upperDeviation)! - um(outputs.shaft.lowerDeviation)!, 9);
        expect(um(outputs.minClearance)).toBeCloseTo(um(outputs.hole.lowerDeviation)! - um(outputs.shaft.upperDeviation)!, 9);
        const expected = outputs.minClearance! >= 0 ? 'clearance' : outputs.maxClearance! <= 0 ? 'interference' : 'transition';
        expect(outputs.fitType).toBe(expected);
      }),
      { numRuns: 2000 },
    );
  });

  it('gives the same fit in mm and in inches (converted by 25.4)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...holeLetters), fc.constantFrom(...shaftLetters), gradeArbitrary, sizeArbitrary, (holeLetter, shaftLetter, grade, size) => {
        const inputs = { nominalSize: size, hole: `${holeLetter}${grade}`, shaft: `${shaftLetter}${grade}` };
        const mm = defined(inputs);
        if (!mm) return;
        const inch = outputsOf({ ...inputs, nominalSize: size / 25.4 }, 'in');
        // Inch deviations are rounded to 7 decimals; limits also carry the 9-decimal rounding of nominal + deviation.
        const close = (inchValue: number | null | undefined, mmValue: number | null | undefined) =>
          expect(Math.abs((inchValue as number) * 25.4 - (mmValue as number))).toBeLessThanOrEqual((0.5e-7 + 0.5e-9) * 25.4 + 1e-12);
        close(inch.hole?.upperDeviation, mm.hole?.upperDeviation);
        close(inch.hole?.lowerDeviation, mm.hole?.lowerDeviation);
        close(inch.shaft?.upperDeviation, mm.shaft?.upperDeviation);
        close(inch.shaft?.lowerDeviation, mm.shaft?.lowerDeviation);
        close(inch.maxClearance, mm.maxClearance);
        close(inch.minClearance, mm.minClearance);
        close(inch.hole?.maxSize, mm.hole?.maxSize);
        expect(inch.fitType).toBe(mm.fitType);
      }),
      { numRuns: 1000 },
    );
  });
});
