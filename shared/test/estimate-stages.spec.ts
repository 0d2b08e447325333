import { applyTaxMinor, formatMoney, planFixPath, type FixPathDto, type PlanInput } from '../src/index';
import { buildStages, toMinor } from '../src/estimate/stages';

const FUEL = { key: 'fuel-vapour', title: 'Fuel vapour', points: ["Follow the vehicle maker's procedure, local regulations and licensed practice."], sources: [] };

/** A fix path as the knowledge service gives it, for a planner input in minor units. */
function fixPath(input: PlanInput, opts: { escalation?: string } = {}): FixPathDto {
  return {
    code: 'P0456',
    title: null,
    vehicle: {},
    listScope: null,
    money: { currency: 'GBP', locale: 'en-GB', labourRateMinor: 12000, taxRateBp: 2000 },
    input,
    plan: planFixPath(input),
    causes: input.causes.map((c) => ({
      key: c.key,
      label: c.label ?? c.key,
      system: 'evap',
      probability: c.probability,
      likelihood: { probability: c.probability, lower: 0, upper: 1, evidence: 0, inheritedEvidence: 0, priorWeight: c.probability },
      partCost: { minor: 0, currency: 'GBP', original: null, indicative: false },
      replaceHours: 0,
      labourCostMinor: 0,
      replaceCostMinor: c.replaceCost,
      check: c.checkCost === undefined ? null : { description: `Look at the ${c.label ?? c.key}.`, hours: 0.1, costMinor: c.checkCost, mustPrecede: c.checkFirst ?? false },
      teardown: c.teardown ?? null,
      teardownName: c.teardown ? 'Drop the fuel tank' : null,
      cautions: ['fuel-vapour'],
    })),
    teardowns: Object.entries(input.teardowns).map(([key, cost]) => ({ key, name: 'Drop the fuel tank', hours: 1, openCostMinor: cost, cautions: [] })),
    verification: { hours: 0.5, costMinor: input.verificationCost, procedure: 'Cold soak and drive', monitor: 'EVAP monitor' },
    escalation: input.escalationCost === undefined ? null : { hours: 1, costMinor: input.escalationCost, description: opts.escalation ?? 'Smoke test by a specialist' },
    cautions: [FUEL],
    deferTo: "Follow the vehicle maker's procedure, local regulations and licensed practice.",
    addOns: [],
    addOnCosts: [],
    excluded: [],
    notListed: [],
    indicative: false,
    note: null,
  };
}

/** Tax by the stated rule, worked by hand in integers: net × bp / 10 000, half away from zero (a charge: half up). */
const taxByHand = (net: number, bp: number) => Math.floor((net * bp + 5000) / 10_000);

describe('staged-estimate money', () => {
  it('prices a stage with and without sales tax: 120.00 before 20 % VAT is 144.00 with it (product.md)', () => {
    // product.md, "the trade's facts" (common practice: prices shown with and without sales tax).
    const fp = fixPath({ causes: [{ key: 'fuel-cap', label: 'Fuel cap', probability: 1, replaceCost: 11000 }], teardowns: {}, verificationCost: 1000, unlistedProbability: 0 });
    const { stages, totals } = buildStages([{ code: 'P0456', title: null, fixPath: fp }], 2000);
    expect(stages).toHaveLength(1);
    expect(stages[0].price).toEqual({ net: 12000, tax: 2400, gross: 14400 });
    expect(formatMoney(stages[0].price.net, 'GBP', 'en-GB')).toBe('£120.00');
    expect(formatMoney(stages[0].price.gross, 'GBP', 'en-GB')).toBe('£144.00');
    expect(totals).toEqual({ expected: { net: 12000, tax: 2400, gross: 14400 }, allStages: { net: 12000, tax: 2400, gross: 14400 } });
    expect(stages[0]).toMatchObject({ kind: 'replace', title: 'Replace Fuel cap', fixProbability: 1, fixProbabilityIfReached: 1, cumulativeFixProbability: 1 });
    expect(stages[0].ifNotFixed).toMatch(/No further stage is planned/);
    expect(stages[0].cautions).toEqual([FUEL]);
  });

  it('rounds fractional expected costs half up to whole minor units, tax per stage, totals as the sums of the lines', () => {
    const input: PlanInput = {
      causes: [
        { key: 'fuel-cap', label: 'Fuel cap', probability: 0.35, replaceCost: 2345, checkCost: 190 },
        { key: 'vent-valve', label: 'Vent valve', probability: 0.35, replaceCost: 9999, checkCost: 1125, teardown: 'tank' },
        { key: 'evap-canister', label: 'EVAP canister', probability: 0.15, replaceCost: 15001, checkCost: 950, teardown: 'tank' },
      ],
      teardowns: { tank: 28500 },
      verificationCost: 4750,
      escalationCost: 33333,
      unlistedProbability: 0.15,
    };
    const fp = fixPath(input);
    for (const bp of [2000, 2300, 1750]) {
      const { stages, totals } = buildStages([{ code: 'P0456', title: null, fixPath: fp }], bp);
      expect(stages.length).toBe(fp.plan.stages.length);
      stages.forEach((s, i) => {
        const net = Math.floor(fp.plan.stages[i].cost + 0.5);
        expect(Number.isInteger(s.price.net) && Number.isInteger(s.price.tax) && Number.isInteger(s.price.gross)).toBe(true);
        expect(s.price).toEqual({ net, tax: taxByHand(net, bp), gross: net + taxByHand(net, bp) });
        expect(s.price).toEqual(applyTaxMinor(net, bp));
      });
      const sum = (k: 'net' | 'tax' | 'gross') => stages.reduce((x, s) => x + s.price[k], 0);
      expect(totals.allStages).toEqual({ net: sum('net'), tax: sum('tax'), gross: sum('gross') });
      const expectedNet = Math.floor(fp.plan.expectedCost + 0.5);
      expect(totals.expected).toEqual({ net: expectedNet, tax: taxByHand(expectedNet, bp), gross: expectedNet + taxByHand(expectedNet, bp) });
    }
  });

  it('a half minor unit of tax goes up for a charge (half away from zero)', () => {
    expect(toMinor(12.5)).toBe(13);
    expect(toMinor(12.4999)).toBe(12);
    // 5 × 1000 bp = 0.5 of a minor unit of tax.
    expect(applyTaxMinor(5, 1000)).toEqual({ net: 5, tax: 1, gross: 6 });
  });

  it('says what each stage may cost at most, what happens next and the chances, cumulative as the path goes', () => {
    const fp = fixPath({
      causes: [
        { key: 'vent-valve', label: 'Vent valve', probability: 0.5, replaceCost: 10000, checkCost: 1000, checkFirst: true, teardown: 'tank' },
        { key: 'evap-canister', label: 'EVAP canister', probability: 0.3, replaceCost: 20000, checkCost: 1000, checkFirst: true, teardown: 'tank' },
      ],
      teardowns: { tank: 30000 },
      verificationCost: 5000,
      escalationCost: 200000,
      unlistedProbability: 0.2,
    });
    const { stages } = buildStages([{ code: 'P0456', title: null, fixPath: fp }], 2000);
    const check = stages.find((s) => s.kind === 'check')!;
    // At most: open the tank once, run both checks, replace the dearer part, verify.
    expect(check.priceUpTo).toEqual(applyTaxMinor(30000 + 1000 + 1000 + 20000 + 5000, 2000));
    expect(check.description).toMatch(/^Takes apart: Drop the fuel tank\. Vent valve: Look at the Vent valve\./);
    const last = stages[stages.length - 1];
    expect(last.kind).toBe('escalate');
    expect(last.title).toBe('Further diagnosis by a specialist');
    expect(stages[0].ifNotFixed).toBe(`Next: stage 2 — ${stages[1].title}.`);
    let cumulative = 0;
    for (const s of stages) {
      cumulative += s.fixProbability;
      expect(s.cumulativeFixProbability).toBeCloseTo(cumulative, 12);
    }
    expect(check.fixProbabilityIfReached).toBeCloseTo(0.8, 12);
  });
});
