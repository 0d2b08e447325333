import {
  planFixPath,
  type CauseRankingDto,
  type FixPathCauseDto,
  type FixPathDto,
  type PlanInput,
  type PossibleCauseRowDto,
  type TeardownUseDto,
} from '@causeway/shared';

/**
 * Invented test data shaped like the server's answers for an EVAP code on a fictional car.
 * Costs are GBP minor units at 95.00 an hour; every labour figure below is hours × 9500.
 */
const RATE = 9_500;

const tankDrop: TeardownUseDto = { key: 'tank-drop', name: 'Lower and refit the fuel tank', hours: 1.9, openCostMinor: 18_050, cautions: ['fuel-vapour', 'lifted-vehicle'] };

function cause(
  key: string,
  label: string,
  probability: number,
  partMinor: number,
  replaceHours: number,
  checkHours: number,
  teardown: TeardownUseDto | null,
  cautions: string[],
): FixPathCauseDto {
  const labour = Math.round(replaceHours * RATE);
  return {
    key,
    label,
    system: 'evap',
    probability,
    likelihood: { probability, lower: probability / 2, upper: Math.min(1, probability * 1.6), evidence: 3, inheritedEvidence: 1, priorWeight: probability },
    partCost: { minor: partMinor, currency: 'GBP', original: null, indicative: false },
    replaceHours,
    labourCostMinor: labour,
    replaceCostMinor: partMinor + labour,
    check: { description: `Test ${label.toLowerCase()}`, hours: checkHours, costMinor: Math.round(checkHours * RATE), mustPrecede: false },
    teardown: teardown?.key ?? null,
    teardownName: teardown?.name ?? null,
    cautions,
  };
}

export const CAUSES: FixPathCauseDto[] = [
  cause('vent-valve', 'Canister vent valve', 0.45, 3_900, 0.3, 0.2, tankDrop, ['fuel-vapour', 'lifted-vehicle']),
  cause('fuel-cap', 'Fuel filler cap', 0.3, 2_400, 0.1, 0.2, null, ['fuel-vapour']),
  cause('purge-valve', 'Purge valve', 0.15, 4_800, 0.3, 0.3, null, ['fuel-vapour']),
];

/** The planner's input at 95.00 an hour, written out by hand. */
export const INPUT: PlanInput = {
  causes: [
    { key: 'vent-valve', label: 'Canister vent valve', probability: 0.45, replaceCost: 6_750, checkCost: 1_900, teardown: 'tank-drop' },
    { key: 'fuel-cap', label: 'Fuel filler cap', probability: 0.3, replaceCost: 3_350, checkCost: 1_900 },
    { key: 'purge-valve', label: 'Purge valve', probability: 0.15, replaceCost: 7_650, checkCost: 2_850 },
  ],
  teardowns: { 'tank-drop': 18_050 },
  verificationCost: 4_750,
  escalationCost: 42_750,
  unlistedProbability: 0.1,
  addOns: [{ key: 'fuel-filter', label: 'In-tank fuel filter', teardown: 'tank-drop', cost: 6_350 }],
};

/** The same input at another labour rate, written out by hand: 50.00 an hour. */
export const INPUT_AT_50: PlanInput = {
  causes: [
    { key: 'vent-valve', label: 'Canister vent valve', probability: 0.45, replaceCost: 3_900 + 1_500, checkCost: 1_000, teardown: 'tank-drop' },
    { key: 'fuel-cap', label: 'Fuel filler cap', probability: 0.3, replaceCost: 2_400 + 500, checkCost: 1_000 },
    { key: 'purge-valve', label: 'Purge valve', probability: 0.15, replaceCost: 4_800 + 1_500, checkCost: 1_500 },
  ],
  teardowns: { 'tank-drop': 9_500 },
  verificationCost: 2_500,
  escalationCost: 22_500,
  unlistedProbability: 0.1,
  addOns: [{ key: 'fuel-filter', label: 'In-tank fuel filter', teardown: 'tank-drop', cost: 3_500 + 1_500 }],
};

const CAUTIONS = [
  { key: 'fuel-vapour', title: 'Fuel and fuel vapour', points: ['Keep every ignition source away.'], sources: [] },
  { key: 'lifted-vehicle', title: 'Working under a lifted vehicle', points: ['Never work under a vehicle held only by a jack.'], sources: [] },
];

export function makeFixPath(): FixPathDto {
  const plan = planFixPath(INPUT);
  return {
    code: 'P0456',
    title: 'Evaporative Emission System Leak Detected (very small leak)',
    vehicle: { make: 'Halden', model: 'Tarn' },
    listScope: { make: 'Halden', model: 'Tarn', engine: '1.6 T', yearFrom: 2015, yearTo: null },
    money: { currency: 'GBP', locale: 'en-GB', labourRateMinor: RATE, taxRateBp: 2_000 },
    input: INPUT,
    plan,
    causes: CAUSES,
    teardowns: [tankDrop],
    verification: { hours: 0.5, costMinor: 4_750, procedure: 'Clear codes, stand overnight, drive.', monitor: 'EVAP monitor' },
    escalation: { hours: 4.5, costMinor: 42_750, description: 'Smoke test of the whole system.' },
    cautions: CAUTIONS,
    deferTo: "Follow the vehicle maker's procedure, local regulations and licensed practice.",
    addOns: plan.addOns.map((a) => ({
      key: a.key,
      label: 'In-tank fuel filter',
      teardown: a.teardown,
      costMinor: 6_350,
      partCost: { minor: 3_500, currency: 'GBP', original: null, indicative: false },
      hours: 0.3,
      stageIndex: a.stageIndex,
      reachProbability: a.reachProbability,
      savedMinor: a.savedCost,
      savedHours: 1.9,
    })),
    addOnCosts: [{ key: 'fuel-filter', partCost: { minor: 3_500, currency: 'GBP', original: null, indicative: false }, hours: 0.3 }],
    excluded: [],
    notListed: [],
    indicative: false,
    note: null,
  };
}

export function makeRanking(): CauseRankingDto {
  return {
    code: 'P0456',
    title: 'Evaporative Emission System Leak Detected (very small leak)',
    vehicle: { make: 'Halden', model: 'Tarn' },
    listScope: { make: 'Halden', model: 'Tarn', engine: '1.6 T', yearFrom: 2015, yearTo: null },
    levels: [{ scope: 'Halden Tarn', evidence: 9 }],
    money: { currency: 'GBP', locale: 'en-GB', labourRateMinor: RATE, taxRateBp: 2_000 },
    causes: CAUSES.map((c) => ({
      ...c.likelihood,
      key: c.key,
      partName: c.label,
      system: c.system,
      partCost: c.partCost,
      replaceHours: c.replaceHours,
      labourCostMinor: c.labourCostMinor,
      replaceCostMinor: c.replaceCostMinor,
      check: c.check,
      teardown: c.teardown ? { key: 'tank-drop', name: 'Lower and refit the fuel tank', hours: 1.9, openCostMinor: 18_050, cautions: ['fuel-vapour'] } : null,
      cautions: c.cautions,
    })),
    unlisted: { probability: 0.1, lower: 0.01, upper: 0.28, evidence: 0, inheritedEvidence: 0, priorWeight: 0.1 },
    totalEvidence: 9,
    capped: false,
    priorStrength: 10,
    cautions: CAUTIONS,
    deferTo: "Follow the vehicle maker's procedure, local regulations and licensed practice.",
    indicative: false,
  };
}

function row(make: string, model: string, engine: string, yearFrom: number): PossibleCauseRowDto {
  return {
    id: `${make}-${model}`,
    code: 'P0456',
    partKey: 'fuel-cap',
    partName: 'Fuel filler cap',
    prior: 0.3,
    partCostMinor: 2_400,
    currency: 'GBP',
    replaceHours: 0.1,
    teardownKey: null,
    check: null,
    make,
    model,
    engine,
    yearFrom,
    yearTo: null,
  };
}

export const CAUSE_ROWS: PossibleCauseRowDto[] = [row('Halden', 'Tarn', '1.6 T', 2015), row('Halden', 'Vey', '2.0 hybrid', 2018), row('Morrow', 'Strand', '3.0 V6', 2014)];
