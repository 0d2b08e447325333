import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { InsightsDto, JobDto, JobSummaryDto } from '@causeway/shared';
import { DEMO_PASSWORD } from '../src/seed/demo-accounts.seeder';
import { bearer, createTestApp, registerMember, registerOwner, type TestApp } from './utils/test-app';

interface JobSeed {
  shop: string;
  vin: string;
  codes: Array<{ code: string }>;
  steps: Array<{ kind: 'check' | 'replace'; parts: string[]; result: string; actualCostMinor: number }>;
  closed: null | { resolution: 'resolved' | 'unresolved'; fixedBy: string[] };
}
// The invented demo jobs, read straight from the seed file: the figures below are worked from it by hand.
const demoJobs = (JSON.parse(readFileSync(join(__dirname, '..', '..', 'seeds', 'demo', 'jobs.json'), 'utf8')) as { items: JobSeed[] }).items;
const kestrel = demoJobs.filter((j) => j.shop === 'kestrel');

describe('shop insights (e2e)', () => {
  let t: TestApp;
  let owner: string;
  let tech: string;
  let admin: string;
  const login = async (email: string) => (await t.http().post('/api/auth/login').send({ email, password: DEMO_PASSWORD }).expect(200)).body.accessToken as string;

  beforeAll(async () => {
    t = await createTestApp({ SEED_DEMO: 'true' });
    [owner, tech, admin] = await Promise.all(['owner@causeway.test', 'technician@causeway.test', 'admin@causeway.test'].map(login));
  });
  afterAll(() => t.close());

  describe("the demo shop's figures, worked from seeds/demo/jobs.json", () => {
    let insights: InsightsDto;
    let jobs: JobSummaryDto[];
    beforeAll(async () => {
      insights = (await t.http().get('/api/insights').set(...bearer(owner)).expect(200)).body;
      jobs = (await t.http().get('/api/jobs').query({ pageSize: 100 }).set(...bearer(owner)).expect(200)).body.items;
    });

    it('counts jobs by code', () => {
      const counts = new Map<string, number>();
      for (const j of kestrel) for (const c of j.codes) counts.set(c.code, (counts.get(c.code) ?? 0) + 1);
      expect(Object.fromEntries(insights.jobsByCode.map((r) => [r.code, r.jobs]))).toEqual(Object.fromEntries(counts));
      const p0300 = insights.jobsByCode.find((r) => r.code === 'P0300')!;
      expect(p0300).toMatchObject({ jobs: 2, open: 1, resolved: 1, unresolved: 0 });
      expect(insights.currency).toBe('GBP');
    });

    it('first-time-fix rate: resolved jobs whose first replacement cleared the code', () => {
      const resolved = kestrel.filter((j) => j.closed?.resolution === 'resolved' && j.steps.some((s) => s.kind === 'replace'));
      const first = resolved.filter((j) => j.steps.find((s) => s.kind === 'replace')!.result === 'cleared');
      expect(insights.firstTimeFix).toEqual({ resolvedJobs: resolved.length, firstTimeFixed: first.length, rate: first.length / resolved.length });
      // By hand from the file: 7 resolved Kestrel jobs; only the P0420 job's first replacement (rear O2 sensor) came back.
      expect([resolved.length, first.length]).toEqual([7, 6]);
    });

    it('average cost to resolve against the fix path’s expected cost at opening', () => {
      const resolved = kestrel.filter((j) => j.closed?.resolution === 'resolved');
      const actual = resolved.map((j) => j.steps.reduce((s, x) => s + x.actualCostMinor, 0));
      expect(insights.costToResolve.jobs).toBe(resolved.length);
      expect(insights.costToResolve.averageActualMinor).toBe(Math.round(actual.reduce((a, b) => a + b, 0) / actual.length));
      const expected = jobs.filter((j) => j.resolution === 'resolved').map((j) => j.expectedCostAtOpenMinor!);
      expect(insights.costToResolve.averageExpectedMinor).toBe(Math.round(expected.reduce((a, b) => a + b, 0) / expected.length));
      const p0420 = insights.costToResolve.byCode.find((r) => r.code === 'P0420')!;
      expect(p0420.averageActualMinor).toBe(18550 + 81650);
    });

    it('parts most often replaced without fixing anything', () => {
      // From the file: the rear O2 sensor (P0420 job, 185.50) and the fuel cap (P0442 job, 79.00) came back.
      expect(insights.replacedWithoutFix).toEqual([
        { part: 'downstream-o2-sensor', label: expect.any(String), times: 1, costMinor: 18550 },
        { part: 'fuel-cap', label: expect.any(String), times: 1, costMinor: 7900 },
      ]);
    });

    it('limits to jobs opened in a date range', async () => {
      const april = (await t.http().get('/api/insights').query({ from: '2026-04-01', to: '2026-04-30' }).set(...bearer(owner)).expect(200)).body as InsightsDto;
      expect(april.jobsByCode.map((r) => r.code)).toEqual(['P0420']);
      const bad = await t.http().get('/api/insights').query({ from: '2026-05-01', to: '2026-04-01' }).set(...bearer(owner)).expect(400);
      expect(bad.body.errors).toEqual([{ field: 'to', message: 'must not be before from' }]);
    });
  });

  describe('the demo outcomes', () => {
    it('belong to their demo jobs and are counted once', async () => {
      const unlinked = await t.query<{ n: number | string }>(`SELECT COUNT(*) AS n FROM outcomes WHERE source = 'job' AND "sourceId" IS NULL`);
      expect(Number(unlinked[0].n)).toBe(0);
      // One outcome per resolved demo job and code that a replaced part is a possible cause of; the coil and plug job splits one outcome in two rows.
      const rows: Array<{ sourceId: string; code: string; weight: number }> = await t.query(`SELECT "sourceId", code, weight FROM outcomes WHERE source = 'job'`);
      const perOutcome = new Map<string, number>();
      for (const r of rows) perOutcome.set(`${r.sourceId}|${r.code}`, (perOutcome.get(`${r.sourceId}|${r.code}`) ?? 0) + r.weight);
      for (const total of perOutcome.values()) expect(total).toBeCloseTo(1, 12);
      const list = (await t.http().get('/api/jobs').query({ status: 'closed', code: 'P0301' }).set(...bearer(owner)).expect(200)).body.items as JobSummaryDto[];
      const job = (await t.http().get(`/api/jobs/${list[0].id}`).set(...bearer(owner)).expect(200)).body as JobDto;
      const p0301 = job.codes.find((c) => c.code === 'P0301')!;
      expect(p0301.outcome).toMatchObject({ shared: true });
      expect(p0301.outcome!.credits.map((c) => c.causeKey).sort()).toEqual(['ignition-coil', 'spark-plug']);
      expect(job.codes.find((c) => c.code === 'P0300')!.outcome).toBeNull();
    });
  });

  describe('who may see them', () => {
    it('a technician who does not own the shop may not', async () => {
      await t.http().get('/api/insights').set(...bearer(tech)).expect(403);
    });

    it('an admin names the shop; an owner sees only their own', async () => {
      const noShop = await t.http().get('/api/insights').set(...bearer(admin)).expect(400);
      expect(noShop.body.errors[0].field).toBe('shopId');
      const ownerShop = (await t.http().get('/api/me').set(...bearer(owner)).expect(200)).body.shop.id as string;
      const viaAdmin = (await t.http().get('/api/insights').query({ shopId: ownerShop }).set(...bearer(admin)).expect(200)).body as InsightsDto;
      expect(viaAdmin.firstTimeFix.resolvedJobs).toBe(7);
      const newOwner = await registerOwner(t);
      await registerMember(t, newOwner);
      await t.http().get('/api/insights').query({ shopId: ownerShop }).set(...bearer(newOwner)).expect(404);
      const empty = (await t.http().get('/api/insights').set(...bearer(newOwner)).expect(200)).body as InsightsDto;
      expect(empty).toMatchObject({ jobsByCode: [], firstTimeFix: { resolvedJobs: 0, firstTimeFixed: 0, rate: null }, costToResolve: { jobs: 0, averageActualMinor: null }, replacedWithoutFix: [] });
    });
  });
});
