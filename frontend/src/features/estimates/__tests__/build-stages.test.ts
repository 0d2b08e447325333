import { describe, expect, it } from 'vitest';
import { makeFixPath } from '@/testing/job-data';
import { buildStages } from '@causeway/shared';

describe('buildStages (the estimate preview)', () => {
  it('prices a stage net, with tax per stage and gross: 20 % VAT on 120.00 is 24.00, 144.00 in all (product.md)', () => {
    const fixPath = makeFixPath('P0456', [{ key: 'vent-valve', label: 'EVAP vent valve', probability: 1, replaceCost: 10_000 }], { verificationCost: 2_000 });
    const { stages, totals } = buildStages([{ code: 'P0456', title: null, fixPath }], 2_000);
    expect(stages).toHaveLength(1);
    expect(stages[0].price).toEqual({ net: 12_000, tax: 2_400, gross: 14_400 });
    expect(stages[0].cumulativeFixProbability).toBeCloseTo(1);
    expect(totals.allStages).toEqual({ net: 12_000, tax: 2_400, gross: 14_400 });
    expect(stages[0].ifNotFixed).toMatch(/No further stage is planned/);
  });

  it('rounds the tax of each stage half away from zero to a whole minor unit', () => {
    // A stage of 2 minor units: 25 % is exactly half a minor unit (→ 1); 24 % is 0.48 (→ 0).
    const fixPath = makeFixPath('P0456', [{ key: 'a', label: 'A', probability: 1, replaceCost: 1 }], { verificationCost: 1 });
    expect(buildStages([{ code: 'P0456', title: null, fixPath }], 2_500).stages[0].price).toEqual({ net: 2, tax: 1, gross: 3 });
    expect(buildStages([{ code: 'P0456', title: null, fixPath }], 2_400).stages[0].price).toEqual({ net: 2, tax: 0, gross: 2 });
  });
});
