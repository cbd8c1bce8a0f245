import { describe, expect, it } from 'vitest';
import { intermediateStepUpperBounds, mainStepUpperBounds } from './tables/size-steps.js';
import { findSizeStep } from './find-size-step.js';

describe('findSizeStep', () => {
  it('puts a size on a bound in the lower range (ISO 286-1 ranges are "over a up to and including b")', () => {
    expect(findSizeStep(10, mainStepUpperBounds)).toMatchObject({ over: 6, upTo: 10 });
    expect(findSizeStep(10.001, mainStepUpperBounds)).toMatchObject({ over: 10, upTo: 18 });
    expect(findSizeStep(50, mainStepUpperBounds)).toMatchObject({ over: 30, upTo: 50 });
    expect(findSizeStep(50.001, mainStepUpperBounds)).toMatchObject({ over: 50, upTo: 80 });
    expect(findSizeStep(500, mainStepUpperBounds)).toMatchObject({ over: 400, upTo: 500 });
    expect(findSizeStep(500.001, mainStepUpperBounds)).toMatchObject({ over: 500, upTo: 630 });
    expect(findSizeStep(3150, mainStepUpperBounds)).toMatchObject({ over: 2500, upTo: 3150 });
  });

  it('starts the first range at zero and ends the table at 3150 mm', () => {
    expect(findSizeStep(0.001, mainStepUpperBounds)).toMatchObject({ over: 0, upTo: 3 });
    expect(findSizeStep(3150.001, mainStepUpperBounds)).toBeUndefined();
    expect(findSizeStep(0, mainStepUpperBounds)).toBeUndefined();
    expect(findSizeStep(-1, mainStepUpperBounds)).toBeUndefined();
  });

  it('finds intermediate steps inside a main range (ISO 286-1 Table 2: 30–40, 40–50)', () => {
    expect(findSizeStep(40, intermediateStepUpperBounds)).toMatchObject({ over: 30, upTo: 40 });
    expect(findSizeStep(40.5, intermediateStepUpperBounds)).toMatchObject({ over: 40, upTo: 50 });
  });

  it('splits every main range into intermediate steps that tile it exactly', () => {
    for (const bound of mainStepUpperBounds) expect(intermediateStepUpperBounds).toContain(bound);
  });
});
