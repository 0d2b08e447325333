import type { AuthResponse, CauseRankingDto, FixPathDto, JobDto, JobSummaryDto, VehicleDto, VehicleScopeQuery } from '@causeway/shared';
import { bearer, createTestApp, KESTREL_SHOP, registerMember, registerOwner, type TestApp } from './utils/test-app';

/** α, the prior strength (PRIOR_STRENGTH unset): product.md §2. */
const ALPHA = 10;
const TARN: VehicleScopeQuery = { make: 'Halden', model: 'Tarn', engine: '1.6 T', year: 2019 };
const STRAND: VehicleScopeQuery = { make: 'Morrow', model: 'Strand', engine: '3.0 V6', year: 2021 };

const probOf = (fp: FixPathDto, key: string) => fp.causes.find((c) => c.key === key)?.probability;

describe('jobs: steps, the live fix path and outcomes that teach the ranking (e2e)', () => {
  let t: TestApp;
  let owner: AuthResponse;
  let tech: AuthResponse;
  let other: AuthResponse;
  let tarn: VehicleDto;
  let strand: VehicleDto;

  const ranking = async (code: string, v: VehicleScopeQuery) =>
    (await t.http().get(`/api/codes/${code}/causes`).query({ ...v }).set(...bearer(tech)).expect(200)).body as CauseRankingDto;
  const step = (id: string, body: Record<string, unknown>, as: AuthResponse = tech) => t.http().post(`/api/jobs/${id}/steps`).set(...bearer(as)).send(body);
  const openJob = async (vehicleId: string, codes: Array<{ code: string; status: string; freezeFrame?: Record<string, string | number> }>, extra: Record<string, unknown> = {}) =>
    (await t.http().post('/api/jobs').set(...bearer(tech)).send({ vehicleId, complaint: 'Engine warning lamp on', codes, ...extra }).expect(201)).body as JobDto;

  beforeAll(async () => {
    // The demo knowledge base (invented) gives the possible causes; the test shops are new.
    t = await createTestApp({ SEED_DEMO: 'true' });
    owner = await registerOwner(t);
    tech = await registerMember(t, owner);
    other = await registerOwner(t, { ...KESTREL_SHOP, name: 'Other Garage' });
    tarn = (await t.http().post('/api/vehicles').set(...bearer(tech)).send({ vin: 'YHATR6G24KH104382', make: 'Halden', model: 'Tarn', engine: '1.6 T', odometer: 52000, ownerEmail: 'priya@example.com' }).expect(201)).body;
    strand = (await t.http().post('/api/vehicles').set(...bearer(tech)).send({ vin: 'SMWSV3D6XMB220917', make: 'Morrow', model: 'Strand', engine: '3.0 V6' }).expect(201)).body;
  });
  afterAll(() => t.close());

  describe('vehicle → job → steps → close: the tried parts leave the path, the fix moves the likelihood', () => {
    let job: JobDto;
    let before: FixPathDto;

    it('opens a job with codes validated by the shared codec and a fix path per code', async () => {
      job = await openJob(tarn.id, [
        { code: 'po171', status: 'stored', freezeFrame: { 'LTFT B1 %': 24.2, RPM: 780 } },
        { code: 'P1275', status: 'pending' },
      ]);
      expect(job.codes.map((c) => [c.code, c.status, c.state])).toEqual([
        ['P0171', 'stored', 'open'],
        ['P1275', 'pending', 'open'],
      ]);
      expect(job.codes[0].freezeFrame).toEqual({ 'LTFT B1 %': 24.2, RPM: 780 });
      before = job.codes[0].fixPath!;
      expect(before.plan.stages.length).toBeGreaterThan(0);
      // The expected cost at opening is kept for the shop's insights (whole minor units).
      expect(job.codes[0].expectedCostAtOpenMinor).toBe(Math.round(before.plan.expectedCost));
      expect(job.expectedCostAtOpenMinor).toBe(job.codes.reduce((s, c) => s + (c.expectedCostAtOpenMinor ?? 0), 0));
      expect(job.technician?.id).toBe(tech.user.id);
      // Every code carries the cautions of its system, ending with the deferral (domain-reference §7).
      expect(job.codes[0].cautions.length).toBeGreaterThan(0);
      for (const c of job.codes[0].cautions) expect(c.points[c.points.length - 1]).toMatch(/vehicle maker's procedure, local regulations and licensed practice/);
    });

    it('a part checked not at fault leaves the path and the rest are renormalised (Bayes’ rule)', async () => {
      const missing = await step(job.id, { kind: 'check', parts: ['pcv-diaphragm'], result: 'not-at-fault', actualCostMinor: 950 }).expect(400);
      expect(missing.body.errors).toEqual([{ field: 'code', message: 'is required: this job has several codes (P0171, P1275)' }]);

      const res = await step(job.id, { code: 'P0171', kind: 'check', parts: ['pcv-diaphragm'], result: 'not-at-fault', actualCostMinor: 950, notes: 'No suction at the filler' }).expect(201);
      job = res.body;
      const fp = job.codes[0].fixPath!;
      expect(job.codes[0].excludedParts).toEqual(['pcv-diaphragm']);
      expect(fp.excluded).toEqual(['pcv-diaphragm']);
      expect(fp.causes.map((c) => c.key)).not.toContain('pcv-diaphragm');
      expect(fp.plan.stages.flatMap((s) => s.causes)).not.toContain('pcv-diaphragm');
      // Conditioning on "not the PCV diaphragm": P(i | not pcv) = p_i / (1 − p_pcv) (Bayes' rule; product.md §2).
      const pPcv = probOf(before, 'pcv-diaphragm')!;
      for (const c of fp.causes) expect(c.probability).toBeCloseTo(probOf(before, c.key)! / (1 - pPcv), 10);
      // The other code's path is untouched.
      expect(job.codes[1].excludedParts).toEqual([]);
      expect(job.steps).toHaveLength(1);
      expect(job.steps[0]).toMatchObject({ sequence: 1, code: 'P0171', kind: 'check', result: 'not-at-fault', actualCostMinor: 950, parts: [{ key: 'pcv-diaphragm' }] });
    });

    it('a replacement after which the code came back leaves the path too', async () => {
      job = (await step(job.id, { code: 'P0171', kind: 'replace', parts: ['charge-air-hose'], result: 'came-back', actualCostMinor: 8200 }).expect(201)).body;
      const fp = job.codes[0].fixPath!;
      expect(job.codes[0].excludedParts.sort()).toEqual(['charge-air-hose', 'pcv-diaphragm']);
      const gone = probOf(before, 'pcv-diaphragm')! + probOf(before, 'charge-air-hose')!;
      for (const c of fp.causes) expect(c.probability).toBeCloseTo(probOf(before, c.key)! / (1 - gone), 10);
    });

    it('a check that finds a part at fault narrows the path to replacing it', async () => {
      job = (await step(job.id, { code: 'P0171', kind: 'check', parts: ['maf-sensor'], result: 'at-fault', actualCostMinor: 1900 }).expect(201)).body;
      const c = job.codes[0];
      expect(c.state).toBe('cause-found');
      expect(c.foundPart).toBe('maf-sensor');
      const fp = c.fixPath!;
      expect(fp.plan.stages).toHaveLength(1);
      expect(fp.plan.stages[0]).toMatchObject({ kind: 'replace', causes: ['maf-sensor'], fixProbability: 1, cumulativeFixProbability: 1 });
      // replace cost R + verification V (product.md §3: cost(S) = ΣR + ΣO + V, the teardown already open).
      expect(fp.plan.stages[0].cost).toBe(fp.input.causes[0].replaceCost + fp.input.verificationCost);
    });

    it('the replacement that clears the code ends its path', async () => {
      job = (await step(job.id, { code: 'P0171', kind: 'replace', parts: ['maf-sensor'], result: 'cleared', actualCostMinor: 16400 }).expect(201)).body;
      expect(job.codes[0]).toMatchObject({ state: 'cleared', clearedBy: ['maf-sensor'], fixPath: null });
      expect(job.codes[0].fixPathNote).toMatch(/^Cleared by replacing maf-sensor\./);
      expect(job.actualCostMinor).toBe(950 + 8200 + 1900 + 16400);
    });

    it('closing as resolved needs the verification to have passed', async () => {
      const res = await t.http().post(`/api/jobs/${job.id}/close`).set(...bearer(tech)).send({ resolution: 'resolved' }).expect(400);
      expect(res.body.errors).toEqual([{ field: 'verificationPassed', message: expect.stringContaining('must be true to close as resolved') }]);
    });

    it('closing as resolved records the outcome and moves the likelihood by the posterior amount', async () => {
      const rankBefore = await ranking('P0171', TARN);
      const res = await t.http().post(`/api/jobs/${job.id}/close`).set(...bearer(tech)).send({ resolution: 'resolved', verificationPassed: true, notes: 'Trims back to +2 %' }).expect(200);
      job = res.body;
      expect(job).toMatchObject({ status: 'closed', resolution: 'resolved', verificationPassed: true, closeNotes: 'Trims back to +2 %' });
      // By default the code was fixed by its last clearing replacement; P1275 had none and records no outcome.
      expect(job.codes[0].outcome).toMatchObject({ code: 'P0171', credits: [{ causeKey: 'maf-sensor', parts: ['maf-sensor'], weight: 1 }], shared: false });
      expect(job.codes[1].outcome).toBeNull();

      const rankAfter = await ranking('P0171', TARN);
      expect(rankAfter.priorStrength).toBe(ALPHA);
      expect(rankAfter.totalEvidence).toBeCloseTo(rankBefore.totalEvidence + 1, 10);
      // Dirichlet posterior mean p_i = (α·w_i + n_i) / (α + N) (product.md §2; domain-reference §6 "Learning from outcomes"):
      // one more outcome for the MAF sensor adds 1 to its n and to N; every other cause only gains the 1 in N.
      const N = rankBefore.totalEvidence;
      for (const c of rankBefore.causes) {
        const n = c.evidence + (c.key === 'maf-sensor' ? 1 : 0);
        const expected = (ALPHA * c.priorWeight + n) / (ALPHA + N + 1);
        expect({ key: c.key, p: rankAfter.causes.find((x) => x.key === c.key)!.probability }).toEqual({ key: c.key, p: expect.closeTo(expected, 10) });
      }
      const maf = (r: CauseRankingDto) => r.causes.find((c) => c.key === 'maf-sensor')!;
      expect(maf(rankAfter).probability).toBeGreaterThan(maf(rankBefore).probability);
    });

    it('a step or a second close on a closed job is a 409', async () => {
      const res = await step(job.id, { code: 'P0171', kind: 'check', parts: ['fuel-pump'], result: 'not-at-fault', actualCostMinor: 100 }).expect(409);
      expect(res.body.message).toMatch(/closed/);
      await t.http().post(`/api/jobs/${job.id}/close`).set(...bearer(tech)).send({ resolution: 'unresolved' }).expect(409);
    });
  });

  describe('fractional credit when one stage replaced several parts', () => {
    it('splits the outcome by the parts’ current likelihoods and shows the split on the job', async () => {
      const rankBefore = await ranking('P0301', STRAND);
      const job = await openJob(strand.id, [{ code: 'P0301', status: 'stored' }]);
      await step(job.id, { kind: 'replace', parts: ['ignition-coil', 'spark-plug'], result: 'cleared', actualCostMinor: 38000 }).expect(201);
      const closed = (await t.http().post(`/api/jobs/${job.id}/close`).set(...bearer(tech)).send({ resolution: 'resolved', verificationPassed: true, fixedBy: [{ code: 'P0301', parts: ['ignition-coil', 'spark-plug'] }] }).expect(200)).body as JobDto;
      const pCoil = rankBefore.causes.find((c) => c.key === 'ignition-coil')!.probability;
      const pPlug = rankBefore.causes.find((c) => c.key === 'spark-plug')!.probability;
      // Credit in proportion to the current likelihoods (product.md §2: fractional counts).
      const shareCoil = pCoil / (pCoil + pPlug);
      const outcome = closed.codes[0].outcome!;
      expect(outcome.shared).toBe(true);
      expect(outcome.credits.find((c) => c.causeKey === 'ignition-coil')!.weight).toBeCloseTo(shareCoil, 10);
      expect(outcome.credits.find((c) => c.causeKey === 'spark-plug')!.weight).toBeCloseTo(1 - shareCoil, 10);
      expect(outcome.summary).toMatch(/shared/);

      const rankAfter = await ranking('P0301', STRAND);
      const N = rankBefore.totalEvidence;
      const coil = rankBefore.causes.find((c) => c.key === 'ignition-coil')!;
      expect(rankAfter.causes.find((c) => c.key === 'ignition-coil')!.probability).toBeCloseTo((ALPHA * coil.priorWeight + coil.evidence + shareCoil) / (ALPHA + N + 1), 10);
    });
  });

  describe('closing as unresolved', () => {
    it('records no outcome, and refuses a fixedBy', async () => {
      const rankBefore = await ranking('P0171', TARN);
      const job = await openJob(tarn.id, [{ code: 'P0171', status: 'stored' }]);
      const bad = await t.http().post(`/api/jobs/${job.id}/close`).set(...bearer(tech)).send({ resolution: 'unresolved', fixedBy: [{ code: 'P0171', parts: ['maf-sensor'] }] }).expect(400);
      expect(bad.body.errors[0].field).toBe('fixedBy');
      const closed = (await t.http().post(`/api/jobs/${job.id}/close`).set(...bearer(tech)).send({ resolution: 'unresolved', notes: 'Customer took the car away' }).expect(200)).body as JobDto;
      expect(closed).toMatchObject({ status: 'closed', resolution: 'unresolved' });
      expect((await ranking('P0171', TARN)).totalEvidence).toBe(rankBefore.totalEvidence);
    });

    it('a resolved close with nothing named as the fix is a 400', async () => {
      const job = await openJob(tarn.id, [{ code: 'P0171', status: 'stored' }]);
      const res = await t.http().post(`/api/jobs/${job.id}/close`).set(...bearer(tech)).send({ resolution: 'resolved', verificationPassed: true }).expect(400);
      expect(res.body.errors[0].field).toBe('fixedBy');
      const wrong = await t.http().post(`/api/jobs/${job.id}/close`).set(...bearer(tech)).send({ resolution: 'resolved', verificationPassed: true, fixedBy: [{ code: 'P0420', parts: [] }] }).expect(400);
      expect(wrong.body.errors).toEqual([{ field: 'fixedBy.0.code', message: 'P0420 is not a code of this job (P0171)' }]);
    });
  });

  describe('bad input', () => {
    it('names a code the codec rejects by its position', async () => {
      const res = await t.http().post('/api/jobs').set(...bearer(tech)).send({ vehicleId: tarn.id, complaint: 'x', codes: [{ code: 'P0171', status: 'stored' }, { code: 'P0G71', status: 'stored' }] }).expect(400);
      expect(res.body.errors).toEqual([{ field: 'codes.1.code', message: expect.stringMatching(/^position 3: /) }]);
    });

    it('names a wrong status, a duplicate code and a stranger as technician', async () => {
      const res = await t.http().post('/api/jobs').set(...bearer(tech)).send({ vehicleId: tarn.id, complaint: 'x', codes: [{ code: 'P0171', status: 'history' }] }).expect(400);
      expect(res.body.errors).toEqual([{ field: 'codes.0.status', message: 'must be one of stored, pending, permanent' }]);
      const dup = await t.http().post('/api/jobs').set(...bearer(tech)).send({ vehicleId: tarn.id, complaint: 'x', codes: [{ code: 'P0171', status: 'stored' }, { code: '01 71', status: 'pending' }], technicianId: other.user.id }).expect(400);
      expect(dup.body.errors).toEqual([
        { field: 'codes.1.code', message: 'P0171 is listed twice (also codes.0)' },
        { field: 'technicianId', message: 'is not an active member of this shop' },
      ]);
    });

    it('an odometer lower than the vehicle’s last reading needs confirming', async () => {
      const res = await t.http().post('/api/jobs').set(...bearer(tech)).send({ vehicleId: tarn.id, complaint: 'x', codes: [{ code: 'P0171', status: 'stored' }], odometer: 40000 }).expect(409);
      expect(res.body.details).toMatchObject({ reason: 'odometer-lower', lastReading: 52000, given: 40000, unit: 'mi' });
      const ok = await t.http().post('/api/jobs').set(...bearer(tech)).send({ vehicleId: tarn.id, complaint: 'x', codes: [{ code: 'P0171', status: 'stored' }], odometer: 40000, confirmOdometerLower: true }).expect(201);
      expect(ok.body.odometer).toBe(40000);
      await t.http().patch(`/api/vehicles/${tarn.id}`).set(...bearer(tech)).send({ odometer: 52000 }).expect(200);
    });

    it('names what is wrong with a step', async () => {
      const job = await openJob(tarn.id, [{ code: 'P0171', status: 'stored' }]);
      const two = await step(job.id, { kind: 'check', parts: ['maf-sensor', 'fuel-pump'], result: 'cleared', actualCostMinor: 1.5 }).expect(400);
      expect(two.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['actualCostMinor']);
      const two2 = await step(job.id, { kind: 'check', parts: ['maf-sensor', 'fuel-pump'], result: 'cleared', actualCostMinor: 150 }).expect(400);
      expect(two2.body.errors).toEqual([
        { field: 'parts', message: 'a check is on exactly one part' },
        { field: 'result', message: "a check's result is at-fault or not-at-fault" },
      ]);
      const unknown = await step(job.id, { kind: 'replace', parts: ['flux-capacitor'], result: 'cleared', actualCostMinor: 150 }).expect(400);
      expect(unknown.body.errors).toEqual([{ field: 'parts.0', message: "'flux-capacitor' is not a known part" }]);
      const wrongCode = await step(job.id, { code: 'P0420', kind: 'replace', parts: ['maf-sensor'], result: 'cleared', actualCostMinor: 150 }).expect(400);
      expect(wrongCode.body.errors).toEqual([{ field: 'code', message: 'P0420 is not a code of this job (P0171)' }]);
      expect((await t.http().get(`/api/jobs/${job.id}`).set(...bearer(tech)).expect(200)).body.steps).toEqual([]);
    });
  });

  describe('another shop', () => {
    it("cannot see, add a step to or close this shop's job, nor open one on its vehicle", async () => {
      const job = await openJob(tarn.id, [{ code: 'P0171', status: 'stored' }]);
      await t.http().get(`/api/jobs/${job.id}`).set(...bearer(other)).expect(404);
      await step(job.id, { kind: 'check', parts: ['maf-sensor'], result: 'at-fault', actualCostMinor: 100 }, other).expect(404);
      await t.http().post(`/api/jobs/${job.id}/close`).set(...bearer(other)).send({ resolution: 'unresolved' }).expect(404);
      await t.http().post('/api/jobs').set(...bearer(other)).send({ vehicleId: tarn.id, complaint: 'x', codes: [{ code: 'P0171', status: 'stored' }] }).expect(404);
      const list = await t.http().get('/api/jobs').set(...bearer(other)).expect(200);
      expect(list.body.total).toBe(0);
    });
  });

  describe('the job list', () => {
    it('filters by status, code, vehicle, technician and dates, sorts and pages on the server', async () => {
      const get = async (query: Record<string, string | number>) => (await t.http().get('/api/jobs').query(query).set(...bearer(owner)).expect(200)).body as { items: JobSummaryDto[]; total: number; page: number; pageSize: number };
      const all = await get({ pageSize: 100 });
      expect(all.total).toBeGreaterThanOrEqual(7);
      expect(all.items.every((j) => j.currency === 'GBP')).toBe(true);

      const closed = await get({ status: 'closed', pageSize: 100 });
      expect(closed.items.every((j) => j.status === 'closed')).toBe(true);
      const open = await get({ status: 'open', pageSize: 100 });
      expect(closed.total + open.total).toBe(all.total);

      const p0301 = await get({ code: 'p0301' });
      expect(p0301.items.map((j) => j.vehicle.id)).toEqual([strand.id]);
      const byVehicle = await get({ vehicleId: strand.id });
      expect(byVehicle.total).toBe(1);
      expect((await get({ technicianId: tech.user.id, pageSize: 100 })).total).toBe(all.total);
      expect((await get({ technicianId: owner.user.id })).total).toBe(0);

      const today = new Date().toISOString().slice(0, 10);
      expect((await get({ from: today, to: today, pageSize: 100 })).total).toBe(all.total);
      expect((await get({ to: '2020-01-01' })).total).toBe(0);

      const page1 = await get({ sort: 'openedAt', order: 'asc', pageSize: 2, page: 1 });
      const page2 = await get({ sort: 'openedAt', order: 'asc', pageSize: 2, page: 2 });
      expect(page1.items).toHaveLength(2);
      expect(page1.items[1].openedAt <= page2.items[0].openedAt).toBe(true);
      expect(new Set([...page1.items, ...page2.items].map((j) => j.id)).size).toBe(4);

      const bad = await t.http().get('/api/jobs').query({ code: 'X0171', from: '2026-13-01' }).set(...bearer(owner)).expect(400);
      expect(bad.body.errors.map((e: { field: string }) => e.field)).toContain('from');
      const badCode = await t.http().get('/api/jobs').query({ code: 'X0171' }).set(...bearer(owner)).expect(400);
      expect(badCode.body.errors[0].field).toBe('code');
      const backwards = await t.http().get('/api/jobs').query({ from: '2026-02-01', to: '2026-01-01' }).set(...bearer(owner)).expect(400);
      expect(backwards.body.errors).toEqual([{ field: 'to', message: 'must not be before from' }]);
    });

    it('a vehicle with jobs is kept for their history', async () => {
      const res = await t.http().delete(`/api/vehicles/${strand.id}`).set(...bearer(owner)).expect(409);
      expect(res.body.message).toMatch(/has 1 job/);
    });
  });
});
