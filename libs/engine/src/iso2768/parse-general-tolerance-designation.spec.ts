import { describe, expect, it } from 'vitest';
import { parseGeneralToleranceDesignation } from './parse-general-tolerance-designation.js';

describe('parseGeneralToleranceDesignation', () => {
  it('reads title-block notes of ISO 2768-1 and -2 [C form "ISO 2768-mK": ISO 2768-2 clause 5]', () => {
    expect(parseGeneralToleranceDesignation('ISO 2768-mK')).toEqual({ ok: true, value: { linearClass: 'm', geometricClass: 'K', envelope: false } });
    expect(parseGeneralToleranceDesignation(' ISO 2768 - fH ')).toEqual({ ok: true, value: { linearClass: 'f', geometricClass: 'H', envelope: false } });
    expect(parseGeneralToleranceDesignation('ISO 2768-c')).toEqual({ ok: true, value: { linearClass: 'c', envelope: false } });
    expect(parseGeneralToleranceDesignation('ISO 2768-L')).toEqual({ ok: true, value: { geometricClass: 'L', envelope: false } });
    expect(parseGeneralToleranceDesignation('ISO 2768-mK-E')).toEqual({ ok: true, value: { linearClass: 'm', geometricClass: 'K', envelope: true } });
    expect(parseGeneralToleranceDesignation('vL')).toEqual({ ok: true, value: { linearClass: 'v', geometricClass: 'L', envelope: false } });
  });

  it.each(['ISO 2768-', 'ISO 2768-Mk', 'ISO 2768-x', 'ISO 286-mK', 'mK7', ''])('refuses %j', (text) => {
    expect(parseGeneralToleranceDesignation(text)).toMatchObject({ ok: false, message: expect.stringMatching(/not an ISO 2768 designation/) });
  });
});
