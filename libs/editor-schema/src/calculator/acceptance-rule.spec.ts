import { describe, expect, it } from 'vitest';
import { acceptanceRuleSchema, formatAcceptanceRule, parseAcceptanceRule } from './acceptance-rule.js';

describe('parseAcceptanceRule', () => {
  it('reads a comparison with a unit', () => {
    expect(parseAcceptanceRule('minWall >= 1.5 mm')).toEqual({ ok: true, rule: { output: 'minWall', operator: '>=', value: 1.5, unit: 'mm' } });
  });

  it('reads typographic operators, no unit and a dotted output', () => {
    expect(parseAcceptanceRule('fit.minClearance ≥ 0')).toEqual({ ok: true, rule: { output: 'fit.minClearance', operator: '>=', value: 0 } });
    expect(parseAcceptanceRule('ppm ≤ 63')).toEqual({ ok: true, rule: { output: 'ppm', operator: '<=', value: 63 } });
    expect(parseAcceptanceRule('verdictCode = 1')).toEqual({ ok: true, rule: { output: 'verdictCode', operator: '==', value: 1 } });
  });

  it('reads a range', () => {
    expect(parseAcceptanceRule('endPlay between 0.05 and 0.25 mm')).toEqual({
      ok: true,
      rule: { output: 'endPlay', operator: 'between', value: 0.05, value2: 0.25, unit: 'mm' },
    });
  });

  it('refuses a reversed range, an unknown operator and a unit it does not know', () => {
    expect(parseAcceptanceRule('endPlay between 0.25 and 0.05')).toMatchObject({ ok: false, message: 'The upper limit is below the lower limit' });
    expect(parseAcceptanceRule('minWall => 1.5')).toMatchObject({ ok: false });
    expect(parseAcceptanceRule('minWall >= 1.5 cm')).toMatchObject({ ok: false });
    expect(parseAcceptanceRule('<script> >= 1')).toMatchObject({ ok: false });
  });

  it('reads back what formatAcceptanceRule writes', () => {
    for (const text of ['minWall >= 1.5 mm', 'maxClearance < 0.002 in', 'gap between -0.1 and 0.3', 'count == 4']) {
      const parsed = parseAcceptanceRule(text);
      if (!parsed.ok) throw new Error(parsed.message);
      expect(formatAcceptanceRule(parsed.rule)).toBe(text);
    }
  });
});

describe('acceptanceRuleSchema', () => {
  it('needs a second limit exactly for a range', () => {
    expect(acceptanceRuleSchema.safeParse({ output: 'gap', operator: 'between', value: 0 }).success).toBe(false);
    expect(acceptanceRuleSchema.safeParse({ output: 'gap', operator: '>=', value: 0, value2: 1 }).success).toBe(false);
  });
});
