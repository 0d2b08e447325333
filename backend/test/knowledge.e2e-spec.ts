import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { DEFER_TO_PROCEDURE, type CauseRankingDto, type FixPathDto, type RecordedOutcomeDto, type VehicleScopeQuery } from '@causeway/shared';
import { Outcome } from '../src/knowledge/entities/outcome.entity';
import { LikelihoodService, type RecordOutcomeInput } from '../src/knowledge/likelihood.service';
import { DEMO_PASSWORD } from '../src/seed/demo-accounts.seeder';
import { bearer, createTestApp, type TestApp } from './utils/test-app';

// jstat ships no type declarations; only the Beta quantile is used, as the reference library.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { jStat } = require('jstat') as { jStat: { beta: { inv(p: number, a: number, b: number): number } } };

const SEEDS = join(__dirname, '..', '..', 'seeds');
const seed = <T>(...parts: string[]): T => JSON.parse(readFileSync(join(SEEDS, ...parts), 'utf8')) as T;
interface CauseSeed { code: string; part: string; prior: number; partCostMinor: number; currency: string; replaceHours: number; teardown: string | null; check: { hours: number } | null; make: string | null }
const causeSeeds = seed<{ items: CauseSeed[] }>('knowledge', 'causes.json').items;
const teardownSeeds = seed<{ items: Array<{ key: string; hours: number }> }>('knowledge', 'teardowns.json').items;
const rates = seed<{ rates: Record<string, number> }>('knowledge', 'exchange-rates.json').rates;

/** α: the default prior strength (PRIOR_STRENGTH unset), product.md §2. */
const ALPHA = 10;
/** Default influence caps (INFLUENCE_CAP_USER / INFLUENCE_CAP_SHOP unset). */
const CAP_USER = 3;
const CAP_SHOP = 10;

const TARN: VehicleScopeQuery = { make: 'Halden', model: 'Tarn', engine: '1.6 T', year: 2019 };
const VEY: VehicleScopeQuery = { make: 'Halden', model: 'Vey', engine: '2.0 hybrid', year: 2023 };
const STRAND: VehicleScopeQuery = { make: 'Morrow', model: 'Strand', engine: '3.0 V6', year: 2021 };

/** Labour for decimal hours (0.1 h steps) at an integer rate, exactly: tenths × rate / 10 (product.md: cost = hours × rate). */
const labour = (hours: number, rate: number) => (Math.round(hours * 10) * rate) / 10;

/** 90 % equal-tailed interval of Beta(a, b) from jstat (reference library). */
const jstatInterval = (a: number, b: number) => [jStat.beta.inv(0.05, a, b), jStat.beta.inv(0.95, a, b)];

describe('possible causes, likelihoods and the fix path on the demo knowledge base (e2e)', () => {
  let t: TestApp;
  let tech: string;
  let owner: string;
  let euroTech: string;
  let admin: string;
  let likelihood: LikelihoodService;
  let dataSource: DataSource;

  const login = async (email: string) => (await t.http().post('/api/auth/login').send({ email, password: DEMO_PASSWORD }).expect(200)).body.accessToken as string;
  const causes = async (token: string, code: string, vehicle: VehicleScopeQuery = {}, extra: Record<string, string | number> = {}) =>
    (await t.http().get(`/api/codes/${code}/causes`).query({ ...vehicle, ...extra }).set(...bearer(token)).expect(200)).body as CauseRankingDto;
  const fixPath = async (token: string, code: string, vehicle: VehicleScopeQuery = {}, extra: Record<string, string | number> = {}) =>
    (await t.http().get(`/api/codes/${code}/fix-path`).query({ ...vehicle, ...extra }).set(...bearer(token)).expect(200)).body as FixPathDto;
  const record = (input: Partial<RecordOutcomeInput> & Pick<RecordOutcomeInput, 'code' | 'fixedBy'>): Promise<RecordedOutcomeDto> =>
    dataSource.transaction((em) => likelihood.recordOutcome(em, { source: 'job', sourceId: null, userId: randomUUID(), shopId: null, vehicle: {}, ...input }));

  beforeAll(async () => {
    t = await createTestApp({ SEED_DEMO: 'true' });
    likelihood = t.app.get(LikelihoodService);
    dataSource = t.app.get(DataSource);
    [tech, owner, euroTech, admin] = await Promise.all(['technician@causeway.test', 'owner@causeway.test', 'tech.brightwater@causeway.test', 'admin@causeway.test'].map(login));
  });
  afterAll(() => t.close());

  it('every route needs a signed-in user', async () => {
    for (const url of ['/api/codes/P0171/causes', '/api/codes/P0171/fix-path', '/api/parts', '/api/teardowns', '/api/causes?code=P0171', '/api/exchange-rates']) {
      await t.http().get(url).expect(401);
    }
  });

  it('lists the knowledge base read-only', async () => {
    const parts = await t.http().get('/api/parts').set(...bearer(tech)).expect(200);
    expect(parts.body).toHaveLength(seed<{ items: unknown[] }>('knowledge', 'parts.json').items.length);
    const teardowns = await t.http().get('/api/teardowns').set(...bearer(tech)).expect(200);
    expect(teardowns.body).toHaveLength(teardownSeeds.length);
    const rows = await t.http().get('/api/causes').query({ code: 'p0171' }).set(...bearer(tech)).expect(200);
    expect(rows.body).toHaveLength(causeSeeds.filter((c) => c.code === 'P0171').length);
    expect(rows.body[0]).toMatchObject({ code: 'P0171', partKey: expect.any(String), partName: expect.any(String) });
    const bad = await t.http().get('/api/causes').query({ code: 'P0X71' }).set(...bearer(tech)).expect(400);
    expect(bad.body.errors[0].field).toBe('code');
  });

  describe('ranking', () => {
    it('uses the vehicle-specific list, with the resolved demo job as evidence: p = (α·w + n)/(α + N)', async () => {
      const r = await causes(tech, 'P0171', TARN);
      expect(r.listScope).toMatchObject({ make: 'Halden', model: 'Tarn', engine: '1.6 T', yearFrom: 2015 });
      const tarnRows = causeSeeds.filter((c) => c.code === 'P0171' && c.make === 'Halden');
      expect(r.causes.map((c) => c.key).sort()).toEqual(tarnRows.map((c) => c.part).sort());
      // One resolved demo job on a Halden Tarn 2019 (seeds/demo/jobs.json) was fixed by the PCV diaphragm: n = 1, N = 1.
      const pcv = r.causes.find((c) => c.key === 'pcv-diaphragm')!;
      const w = tarnRows.find((c) => c.part === 'pcv-diaphragm')!.prior;
      // product.md §2: p_i = (α·w_i + n_i)/(α + N).
      expect(pcv.probability).toBeCloseTo((ALPHA * w + 1) / (ALPHA + 1), 12);
      expect(pcv.evidence).toBeCloseTo(1, 12);
      expect(r.causes[0].key).toBe('pcv-diaphragm');
      // Ranked by probability, highest first.
      expect(r.causes.map((c) => c.probability)).toEqual([...r.causes.map((c) => c.probability)].sort((a, b) => b - a));
      // Costs at the shop's rate (Kestrel: 95.00 GBP/h, seeds/demo/shops.json): R = part + hours × rate.
      for (const c of r.causes) {
        const row = tarnRows.find((x) => x.part === c.key)!;
        expect(c.partCost).toEqual({ minor: row.partCostMinor, currency: 'GBP', original: null, indicative: false });
        expect(c.labourCostMinor).toBe(labour(row.replaceHours, 9500));
        expect(c.replaceCostMinor).toBe(row.partCostMinor + labour(row.replaceHours, 9500));
      }
      expect(r.money).toEqual({ currency: 'GBP', locale: 'en-GB', labourRateMinor: 9500, taxRateBp: 2000 });
    });

    it('the generic list applies to a vehicle without a specific one', async () => {
      const r = await causes(tech, 'P0171', { make: 'Morrow', model: 'Strand' });
      expect(r.listScope).toMatchObject({ make: null, model: null });
      expect(r.causes.map((c) => c.key).sort()).toEqual(causeSeeds.filter((c) => c.code === 'P0171' && c.make === null).map((c) => c.part).sort());
      expect(r.levels.map((l) => l.scope)).toEqual(['all vehicles', 'Morrow', 'Morrow Strand']);
    });

    it('shares the demo fix by coil and plug together in proportion to their likelihoods', async () => {
      // seeds/demo/jobs.json: the Morrow Strand 2021 P0301 job replaced coil and plug in one stage.
      // With no earlier outcomes their likelihoods are the priors, so the credit is w_coil/(w_coil + w_plug) (product.md §2).
      const r = await causes(tech, 'P0301', STRAND);
      const w = (part: string) => causeSeeds.find((c) => c.code === 'P0301' && c.make === 'Morrow' && c.part === part)!.prior;
      const coil = r.causes.find((c) => c.key === 'ignition-coil')!;
      const plug = r.causes.find((c) => c.key === 'spark-plug')!;
      expect(coil.evidence).toBeCloseTo(w('ignition-coil') / (w('ignition-coil') + w('spark-plug')), 12);
      expect(plug.evidence).toBeCloseTo(w('spark-plug') / (w('ignition-coil') + w('spark-plug')), 12);
      expect(r.totalEvidence).toBeCloseTo(1, 12);
    });

    it('converts prices in another currency at the stored rate and says they are indicative', async () => {
      // Halden Vey rows are priced in EUR (seeds/knowledge/causes.json); Kestrel works in GBP.
      const r = await causes(tech, 'P0A80', VEY);
      const module = r.causes.find((c) => c.key === 'hybrid-battery-module')!;
      const row = causeSeeds.find((c) => c.code === 'P0A80' && c.make === 'Halden' && c.part === 'hybrid-battery-module')!;
      expect(row.currency).toBe('EUR');
      expect(module.partCost).toEqual({ minor: Math.round((row.partCostMinor / rates.EUR) * rates.GBP), currency: 'GBP', original: { minor: row.partCostMinor, currency: 'EUR' }, indicative: true });
      expect(r.indicative).toBe(true);
      // And the other way: Brightwater (EUR, 85.00/h) looking at GBP prices.
      const e = await causes(euroTech, 'P0171', TARN);
      const pcv = e.causes.find((c) => c.key === 'pcv-diaphragm')!;
      expect(pcv.partCost.minor).toBe(Math.round((2600 / rates.GBP) * rates.EUR));
      expect(pcv.labourCostMinor).toBe(labour(0.5, 8500));
    });

    it('carries the cautions of the code, the teardown and the part system, deferring to the maker’s procedure', async () => {
      const r = await causes(tech, 'P0A80', VEY);
      expect(r.causes.find((c) => c.key === 'hybrid-battery-module')!.cautions).toEqual(expect.arrayContaining(['hybrid-high-voltage', 'lifted-vehicle']));
      expect(r.deferTo).toBe(DEFER_TO_PROCEDURE);
      const p = await fixPath(tech, 'P0A80', VEY);
      expect(p.cautions.map((c) => c.key)).toEqual(expect.arrayContaining(['hybrid-high-voltage', 'lifted-vehicle']));
      for (const c of p.cautions) expect(c.points[c.points.length - 1]).toContain("Follow the vehicle maker's procedure, local regulations and licensed practice");
    });

    it('answers 400 naming the position for a malformed code, 404 with the structure for one not in the catalogue', async () => {
      const bad = await t.http().get('/api/codes/PX171/causes').set(...bearer(tech)).expect(400);
      expect(bad.body.errors[0]).toMatchObject({ field: 'code', message: expect.stringMatching(/position 2/) });
      const unknown = await t.http().get('/api/codes/P3FFF/fix-path').set(...bearer(tech)).expect(404);
      expect(unknown.body.details.structure).toMatchObject({ code: 'P3FFF', system: 'P' });
      const year = await t.http().get('/api/codes/P0171/causes').query({ year: 'soon' }).set(...bearer(tech)).expect(400);
      expect(year.body.errors[0].field).toBe('year');
    });

    it('a known code without possible causes: an empty list, and a path that escalates where escalation is offered', async () => {
      // P1275 has causes only for the Halden Tarn; on a Halden of unstated model none apply.
      const r = await causes(tech, 'P1275', { make: 'Halden' });
      expect(r.causes).toEqual([]);
      expect(r.unlisted.probability).toBe(1);
      const p = await fixPath(tech, 'P1275', { make: 'Halden' });
      expect(p.plan.stages.map((s) => s.kind)).toEqual(['escalate']);
      expect(p.plan.expectedCost).toBe(p.escalation!.costMinor);
      expect(p.note).toMatch(/further diagnosis/);
      // P0100 is in the catalogue from the reference titles only: no causes, no escalation, nothing to suggest.
      const bare = await fixPath(tech, 'P0100');
      expect(bare.causes).toEqual([]);
      expect(bare.escalation).toBeNull();
      expect(bare.plan.stages).toEqual([]);
      expect(bare.plan.unresolvedProbability).toBe(1);
      expect(bare.note).toMatch(/no fix path to suggest/);
    });

    it('an account without a shop must give a labour rate and currency', async () => {
      const res = await t.http().get('/api/codes/P0171/fix-path').set(...bearer(admin)).expect(400);
      expect(res.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['currency', 'labourRateMinor']);
      const ok = await fixPath(admin, 'P0171', TARN, { labourRateMinor: 10000, currency: 'GBP' });
      expect(ok.money).toMatchObject({ currency: 'GBP', labourRateMinor: 10000 });
    });
  });

  describe('fix path', () => {
    it('plans at the shop rate; changing the rate moves each cost by exactly hours × Δrate', async () => {
      const before = await fixPath(tech, 'P0456', TARN);
      expect(before.plan.exact).toBe(true);
      const shop = (await t.http().get('/api/shops/mine').set(...bearer(owner)).expect(200)).body;
      const { id: _id, ...settings } = shop;
      await t.http().patch('/api/shops/mine').set(...bearer(owner)).send({ ...settings, labourRateMinor: 12000 }).expect(200);
      try {
        const after = await fixPath(tech, 'P0456', TARN);
        const delta = 12000 - 9500;
        for (const c of after.causes) {
          const b = before.causes.find((x) => x.key === c.key)!;
          const row = causeSeeds.find((x) => x.code === 'P0456' && x.make === 'Halden' && x.part === c.key)!;
          expect(c.replaceCostMinor - b.replaceCostMinor).toBe(labour(row.replaceHours, delta));
          expect(after.input.causes.find((x) => x.key === c.key)!.replaceCost).toBe(c.replaceCostMinor);
          if (row.check) expect(c.check!.costMinor - b.check!.costMinor).toBe(labour(row.check.hours, delta));
        }
        for (const td of after.teardowns) {
          const hours = teardownSeeds.find((x) => x.key === td.key)!.hours;
          expect(after.input.teardowns[td.key] - before.input.teardowns[td.key]).toBe(labour(hours, delta));
        }
        expect(after.input.verificationCost - before.input.verificationCost).toBe(labour(after.verification.hours, delta));
        expect(after.input.escalationCost! - before.input.escalationCost!).toBe(labour(after.escalation!.hours, delta));
      } finally {
        await t.http().patch('/api/shops/mine').set(...bearer(owner)).send(settings).expect(200);
      }
    });

    it('leaves excluded parts out and renormalises the rest (sum of probabilities + unlisted = 1)', async () => {
      const full = await fixPath(tech, 'P0456', TARN);
      const pCap = full.causes.find((c) => c.key === 'fuel-cap')!.probability;
      const p = await fixPath(tech, 'P0456', TARN, { exclude: 'fuel-cap' });
      expect(p.excluded).toEqual(['fuel-cap']);
      expect(p.input.causes.map((c) => c.key)).not.toContain('fuel-cap');
      expect(p.plan.stages.flatMap((s) => s.causes)).not.toContain('fuel-cap');
      const sum = p.input.causes.reduce((s, c) => s + c.probability, 0) + p.input.unlistedProbability;
      expect(sum).toBeCloseTo(1, 12);
      // Bayesian conditioning (product.md §2): p_i' = p_i / (1 − p_excluded).
      for (const c of p.causes) expect(c.probability).toBeCloseTo(full.causes.find((x) => x.key === c.key)!.probability / (1 - pCap), 12);
      expect(p.input.unlistedProbability).toBeCloseTo(full.input.unlistedProbability / (1 - pCap), 12);
      const notACause = await t.http().get('/api/codes/P0456/fix-path').query({ ...TARN, exclude: 'head-gasket' }).set(...bearer(tech)).expect(400);
      expect(notACause.body.errors[0].field).toBe('exclude');
      const malformed = await t.http().get('/api/codes/P0456/fix-path').query({ ...TARN, exclude: 'Fuel Cap;x' }).set(...bearer(tech)).expect(400);
      expect(malformed.body.errors[0].field).toBe('exclude');
    });

    it('opens the Morrow rear-bank plenum once and lists the work that shares it with the labour saved', async () => {
      const p = await fixPath(tech, 'P0303', { ...STRAND, year: 2016 });
      const opening = p.plan.stages.filter((s) => s.teardowns.includes('morrow-strand-intake-plenum'));
      expect(opening.length).toBeGreaterThan(0);
      // seeds/knowledge: plenum 2.6 h; spark plugs 48.00 + 0.6 h; at 95.00/h.
      const plugs = p.addOns.find((a) => a.key === 'spark-plugs-v6')!;
      expect(plugs).toMatchObject({ teardown: 'morrow-strand-intake-plenum', savedMinor: labour(2.6, 9500), savedHours: 2.6, costMinor: 4800 + labour(0.6, 9500) });
      expect(p.plan.addOns.find((a) => a.key === 'spark-plugs-v6')!.savedCost).toBe(p.input.teardowns['morrow-strand-intake-plenum']);
      // The plan never costs more on average than either baseline (it is exact).
      expect(p.plan.expectedCost).toBeLessThanOrEqual(p.plan.baselines.cheapestFirst.expectedCost + 1e-9);
      expect(p.plan.expectedCost).toBeLessThanOrEqual(p.plan.baselines.mostLikelyFirst.expectedCost + 1e-9);
    });
  });

  describe('learning from outcomes', () => {
    it('moves p_i exactly to (α·w_i + n_i)/(α + N) with intervals equal to jstat’s Beta quantiles', async () => {
      // P0442 on a vehicle of unstated make: the generic list, one scope level, no demo outcomes.
      const before = await causes(tech, 'P0442');
      expect(before.totalEvidence).toBe(0);
      const w = Object.fromEntries(before.causes.map((c) => [c.key, c.priorWeight]));
      const rUnlisted = before.unlisted.priorWeight;
      const n: Record<string, number> = { 'fuel-cap': 3, 'evap-hose': 2 };
      for (const [part, count] of Object.entries(n)) for (let i = 0; i < count; i++) await record({ code: 'P0442', fixedBy: [part] });
      await record({ code: 'P0442', fixedBy: [] });
      const N = 6;
      const after = await causes(tech, 'P0442');
      expect(after.totalEvidence).toBeCloseTo(N, 12);
      for (const c of after.causes) {
        const a = ALPHA * w[c.key] + (n[c.key] ?? 0);
        const b = ALPHA + N - a;
        // product.md §2 / domain-reference §6 "Learning from outcomes": E[θ_k] = (α_k + n_k)/(α_0 + N).
        expect(c.probability).toBeCloseTo(a / (ALPHA + N), 12);
        // Beta marginal Beta(α·w + n, α + N − α·w − n), 90 % equal-tailed, against jStat.beta.inv (jstat, reference library).
        const [lo, hi] = jstatInterval(a, b);
        expect(c.lower).toBeCloseTo(lo, 6);
        expect(c.upper).toBeCloseTo(hi, 6);
      }
      expect(after.unlisted.probability).toBeCloseTo((ALPHA * rUnlisted + 1) / (ALPHA + N), 12);
      const [lo, hi] = jstatInterval(ALPHA * rUnlisted + 1, ALPHA + N - ALPHA * rUnlisted - 1);
      expect(after.unlisted.lower).toBeCloseTo(lo, 6);
      expect(after.unlisted.upper).toBeCloseTo(hi, 6);
    });

    it('backs off: the posterior over other vehicles is the prior for this make', async () => {
      // Continues from the P0442 outcomes above (vehicles of no stated make) and adds two on a "Zeta".
      const general = await causes(tech, 'P0442');
      await record({ code: 'P0442', fixedBy: ['purge-valve'], vehicle: { make: 'Zeta' } });
      await record({ code: 'P0442', fixedBy: ['purge-valve'], vehicle: { make: 'Zeta' } });
      const zeta = await causes(tech, 'P0442', { make: 'Zeta' });
      expect(zeta.levels).toEqual([{ scope: 'all vehicles', evidence: expect.closeTo(6, 9) }, { scope: 'Zeta', evidence: expect.closeTo(2, 9) }]);
      for (const c of zeta.causes) {
        const parent = general.causes.find((x) => x.key === c.key)!.probability;
        // product.md §2: the posterior at "all vehicles" is the prior for "this make".
        expect(c.probability).toBeCloseTo((ALPHA * parent + (c.key === 'purge-valve' ? 2 : 0)) / (ALPHA + 2), 12);
        expect(c.priorWeight).toBeCloseTo(parent, 12);
      }
    });

    it('caps one account: 50 outcomes move a likelihood no further than the per-user cap allows', async () => {
      const before = await causes(tech, 'P0440');
      const w = before.causes.find((c) => c.key === 'evap-canister')!.priorWeight;
      const userId = randomUUID();
      for (let i = 0; i < 50; i++) await record({ code: 'P0440', fixedBy: ['evap-canister'], userId });
      const after = await causes(tech, 'P0440');
      const p = after.causes.find((c) => c.key === 'evap-canister')!.probability;
      // Bound (product.md §2 with n, N ≤ cap): p ≤ (α·w + cap)/(α + cap).
      const bound = (ALPHA * w + CAP_USER) / (ALPHA + CAP_USER);
      expect(p).toBeLessThanOrEqual(bound + 1e-12);
      expect(p).toBeCloseTo(bound, 12);
      expect(after.capped).toBe(true);
      expect(after.totalEvidence).toBeCloseTo(CAP_USER, 12);
    });

    it('caps one shop: five of its users at their own cap add no more than the per-shop cap', async () => {
      const before = await causes(tech, 'P0449');
      const w = before.causes.find((c) => c.key === 'vent-valve-wiring')!.priorWeight;
      const shopId = randomUUID();
      for (let u = 0; u < 5; u++) {
        const userId = randomUUID();
        for (let i = 0; i < 4; i++) await record({ code: 'P0449', fixedBy: ['vent-valve-wiring'], userId, shopId });
      }
      const after = await causes(tech, 'P0449');
      // 5 users × min(4, 3) = 15 > 10: the shop's weight is scaled to the cap.
      expect(after.totalEvidence).toBeCloseTo(CAP_SHOP, 12);
      expect(after.causes.find((c) => c.key === 'vent-valve-wiring')!.probability).toBeCloseTo((ALPHA * w + CAP_SHOP) / (ALPHA + CAP_SHOP), 12);
    });

    it('credits one stage that replaced two parts in proportion to their current likelihoods', async () => {
      const before = await causes(tech, 'P0303');
      const p = (k: string) => before.causes.find((c) => c.key === k)!.probability;
      const sourceId = randomUUID();
      const res = await record({ code: 'P0303', fixedBy: ['ignition-coil', 'spark-plug'], sourceId });
      // product.md §2: credited to the parts in proportion to their current likelihoods.
      const coil = p('ignition-coil') / (p('ignition-coil') + p('spark-plug'));
      expect(res.shared).toBe(true);
      expect(res.credits).toEqual([
        { causeKey: 'ignition-coil', parts: ['ignition-coil'], weight: expect.closeTo(coil, 12) },
        { causeKey: 'spark-plug', parts: ['spark-plug'], weight: expect.closeTo(1 - coil, 12) },
      ]);
      expect(res.summary).toContain(`${Math.round(coil * 100)} %`);
      const rows = await dataSource.getRepository(Outcome).find({ where: { sourceId } });
      expect(rows.reduce((s, r) => s + r.weight, 0)).toBeCloseTo(1, 12);
      // Recording the same job again replaces its credit rather than adding to it.
      await record({ code: 'P0303', fixedBy: ['ignition-coil', 'spark-plug'], sourceId });
      expect(await dataSource.getRepository(Outcome).count({ where: { sourceId } })).toBe(2);
      const after = await causes(tech, 'P0303');
      expect(after.causes.find((c) => c.key === 'ignition-coil')!.evidence).toBeCloseTo(coil, 12);
      // A part that is not a possible cause of the code shares as "a cause not listed", weighted by its likelihood.
      const mixed = await record({ code: 'P0303', fixedBy: ['ignition-coil', 'fuel-cap'] });
      const pc = after.causes.find((c) => c.key === 'ignition-coil')!.probability;
      expect(mixed.credits).toEqual([
        { causeKey: 'ignition-coil', parts: ['ignition-coil'], weight: expect.closeTo(pc / (pc + after.unlisted.probability), 12) },
        { causeKey: null, parts: ['fuel-cap'], weight: expect.closeTo(after.unlisted.probability / (pc + after.unlisted.probability), 12) },
      ]);
    });

    it('refuses a malformed code without writing anything', async () => {
      const count = await dataSource.getRepository(Outcome).count();
      await expect(record({ code: 'P0X03', fixedBy: ['ignition-coil'] })).rejects.toMatchObject({ status: 400 });
      expect(await dataSource.getRepository(Outcome).count()).toBe(count);
    });
  });
});
