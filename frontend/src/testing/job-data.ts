import {
  planFixPath,
  type CautionDto,
  type FixPathCauseDto,
  type FixPathDto,
  type JobCodeDto,
  type JobDto,
  type PlanInput,
  type VehicleDto,
} from '@causeway/shared';

/** Invented test data for vehicles, jobs and fix paths: nothing here describes a real vehicle or shop. */

export const TEST_JOB_ID = '3c1f0a52-7d7e-4b1a-9a55-1f2e3d4c5b6a';
export const TEST_VEHICLE_ID = '7a9e2b10-2c44-4e1f-8d3a-6b5c4d3e2f10';

export const FUEL_CAUTION: CautionDto = {
  key: 'fuel-vapour',
  title: 'Fuel and fuel vapour',
  points: ['Keep every ignition source away.', "Follow the vehicle maker's procedure, local regulations and licensed practice: they govern this work."],
  sources: ['Test source'],
};

export interface TestCause {
  key: string;
  label: string;
  probability: number;
  replaceCost: number;
  checkCost?: number;
}

/** A fix path as the server sends it, planned with the shared planner from a few causes (GBP, 20 % tax). */
export function makeFixPath(code: string, causes: TestCause[], extra: Partial<Pick<PlanInput, 'verificationCost' | 'escalationCost' | 'unlistedProbability'>> = {}): FixPathDto {
  const input: PlanInput = {
    causes: causes.map((c) => ({ key: c.key, label: c.label, probability: c.probability, replaceCost: c.replaceCost, ...(c.checkCost !== undefined ? { checkCost: c.checkCost } : {}) })),
    teardowns: {},
    verificationCost: extra.verificationCost ?? 2_000,
    ...(extra.escalationCost !== undefined ? { escalationCost: extra.escalationCost } : {}),
    unlistedProbability: extra.unlistedProbability ?? 0,
  };
  const fixCauses: FixPathCauseDto[] = causes.map((c) => ({
    key: c.key,
    label: c.label,
    system: 'evap',
    probability: c.probability,
    likelihood: { probability: c.probability, lower: Math.max(0, c.probability - 0.2), upper: Math.min(1, c.probability + 0.2), evidence: 2, inheritedEvidence: 1, priorWeight: c.probability },
    partCost: { minor: Math.round(c.replaceCost / 2), currency: 'GBP', original: null, indicative: false },
    replaceHours: 0.5,
    labourCostMinor: Math.round(c.replaceCost / 2),
    replaceCostMinor: c.replaceCost,
    check: c.checkCost !== undefined ? { description: `Test ${c.label}`, hours: 0.2, costMinor: c.checkCost, mustPrecede: false } : null,
    teardown: null,
    teardownName: null,
    cautions: ['fuel-vapour'],
  }));
  return {
    code,
    title: 'Evaporative system leak (test)',
    vehicle: { make: 'Halden', model: 'Tarn' },
    listScope: null,
    money: { currency: 'GBP', locale: 'en-GB', labourRateMinor: 10_000, taxRateBp: 2_000 },
    input,
    plan: planFixPath(input),
    causes: fixCauses,
    teardowns: [],
    verification: { hours: 0.2, costMinor: input.verificationCost, procedure: 'Clear, drive, confirm.', monitor: 'EVAP monitor' },
    escalation: extra.escalationCost !== undefined ? { hours: 4, costMinor: extra.escalationCost, description: 'Smoke test.' } : null,
    cautions: [FUEL_CAUTION],
    deferTo: "Follow the vehicle maker's procedure, local regulations and licensed practice.",
    addOns: [],
    addOnCosts: [],
    excluded: [],
    notListed: [],
    indicative: false,
    note: null,
  };
}

export function makeJobCode(fixPath: FixPathDto | null, overrides: Partial<JobCodeDto> = {}): JobCodeDto {
  return {
    code: fixPath?.code ?? 'P0456',
    display: fixPath?.code ?? 'P0456',
    title: 'Evaporative system leak (test)',
    status: 'pending',
    freezeFrame: { RPM: 720 },
    state: 'open',
    excludedParts: [],
    foundPart: null,
    clearedBy: [],
    expectedCostAtOpenMinor: 30_000,
    fixPath,
    fixPathNote: null,
    outcome: null,
    cautions: [FUEL_CAUTION],
    ...overrides,
  };
}

export function makeJob(codes: JobCodeDto[], overrides: Partial<JobDto> = {}): JobDto {
  return {
    id: TEST_JOB_ID,
    status: 'open',
    resolution: null,
    complaint: 'Warning lamp after refuelling (test)',
    openedAt: '2026-03-02T09:00:00.000Z',
    closedAt: null,
    vehicle: { id: TEST_VEHICLE_ID, vin: 'YHATR6G24KH104382', make: 'Halden', model: 'Tarn', engine: '1.6 T', year: 2019, plate: 'TE57 ABC' },
    codes,
    technician: { id: '0b9c1d2e-3f40-4a5b-8c6d-7e8f90a1b2c3', displayName: 'Robin Tester' },
    stepCount: 0,
    actualCostMinor: 0,
    expectedCostAtOpenMinor: 30_000,
    currency: 'GBP',
    odometerKm: 84_200,
    odometer: 52_319,
    distanceUnit: 'mi',
    steps: [],
    closeNotes: null,
    verificationPassed: null,
    estimates: [],
    taxRateBp: 2_000,
    locale: 'en-GB',
    ...overrides,
  };
}

export function makeVehicle(overrides: Partial<VehicleDto> = {}): VehicleDto {
  return {
    id: TEST_VEHICLE_ID,
    vin: 'YHATR6G24KH104382',
    make: 'Halden',
    model: 'Tarn',
    engine: '1.6 T',
    year: 2019,
    plate: 'TE57 ABC',
    odometerKm: 84_200,
    odometer: 52_319,
    distanceUnit: 'mi',
    ownerName: 'Test Owner',
    ownerEmail: 'owner@example.test',
    warnings: [],
    createdAt: '2026-01-01T09:00:00.000Z',
    updatedAt: '2026-01-01T09:00:00.000Z',
    ...overrides,
  };
}
