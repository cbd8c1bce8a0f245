import { describe, expect, it } from 'vitest';
import { bonusTable } from './bonus-table.js';
import { materialConditionSizes } from './material-condition-sizes.js';

describe('bonusTable', () => {
  const hole = materialConditionSizes('internal', 10, 10.2);

  // Bonus = departure from the stated material condition, total = t + bonus (reference.md §4 [C]).
  it('runs from MMC to LMC for a tolerance at MMC, without float noise', () => {
    const rows = bonusTable('MMC', hole, 0.1, 'mm');
    expect(rows).toHaveLength(11);
    expect(rows[0]).toEqual({ actualSize: 10, bonus: 0, totalTolerance: 0.1 });
    expect(rows[3]).toEqual({ actualSize: 10.06, bonus: 0.06, totalTolerance: 0.16 });
    expect(rows.at(-1)).toEqual({ actualSize: 10.2, bonus: 0.2, totalTolerance: 0.3 });
  });

  it('runs from LMC to MMC for a tolerance at LMC', () => {
    const rows = bonusTable('LMC', hole, 0.1, 'mm');
    expect(rows[0]).toEqual({ actualSize: 10.2, bonus: 0, totalTolerance: 0.1 });
    expect(rows.at(-1)).toEqual({ actualSize: 10, bonus: 0.2, totalTolerance: 0.3 });
  });

  it('keeps the tolerance constant at RFS', () => {
    const rows = bonusTable('RFS', hole, 0.1, 'mm');
    expect(rows.every((row) => row.bonus === 0 && row.totalTolerance === 0.1)).toBe(true);
  });

  // reference.md §4 inch example [C]: hole .073–.077, position .005 at LMC.
  it('tabulates the inch hole .073–.077 at LMC in .0005 steps', () => {
    const rows = bonusTable('LMC', materialConditionSizes('internal', 0.073, 0.077), 0.005, 'in');
    expect(rows.map((row) => row.actualSize)).toEqual([0.077, 0.0765, 0.076, 0.0755, 0.075, 0.0745, 0.074, 0.0735, 0.073]);
    expect(rows.at(-1)).toEqual({ actualSize: 0.073, bonus: 0.004, totalTolerance: 0.009 });
  });
});
