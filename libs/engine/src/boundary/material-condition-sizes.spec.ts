import { describe, expect, it } from 'vitest';
import { materialConditionSizes } from './material-condition-sizes.js';

describe('materialConditionSizes', () => {
  // ASME Y14.5-2018 definitions of MMC and LMC: most material is the smallest hole and the largest pin.
  it('puts MMC at the lower limit of an internal feature', () => {
    expect(materialConditionSizes('internal', 10, 10.2)).toEqual({ mmcSize: 10, lmcSize: 10.2 });
  });

  it('puts MMC at the upper limit of an external feature', () => {
    expect(materialConditionSizes('external', 9.8, 10)).toEqual({ mmcSize: 10, lmcSize: 9.8 });
  });
});
