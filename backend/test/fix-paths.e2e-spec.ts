import type { AuthResponse, Plan } from '@causeway/shared';
import { bearer, createTestApp, registerOwner, type TestApp } from './utils/test-app';

/**
 * POST /api/fix-paths: the planner on an ad-hoc set of causes, checked against the worked
 * examples of the literature as domain-reference §8 expresses them in the product's model.
 */
describe('ad-hoc fix paths (e2e)', () => {
  let t: TestApp;
  let owner: AuthResponse;
  beforeAll(async () => {
    t = await createTestApp();
    owner = await registerOwner(t);
  });
  afterAll(() => t.close());

  const post = (body: unknown) => t.http().post('/api/fix-paths').set(...bearer(owner)).send(body as object);
  const order = (plan: Plan) => plan.stages.flatMap((s) => s.causes);

  // Ex. 1 (P0171), domain-reference §6: Kadane & Simon (1977), optimum orders by p/c.
  const ex1 = {
    causes: [
      { key: 'leak', probability: 0.4, replaceCost: 60 },
      { key: 'maf', probability: 0.3, replaceCost: 180 },
      { key: 'pump', probability: 0.2, replaceCost: 450 },
      { key: 'o2', probability: 0.1, replaceCost: 150 },
    ],
    teardowns: {},
    verificationCost: 0,
    unlistedProbability: 0,
  };

  it('Ex. 1 (Kadane & Simon 1977): 303 in the order leak, MAF, O2, pump; baselines 318 and 330', async () => {
    const res = await post(ex1).expect(200);
    const plan = res.body as Plan;
    // Kadane & Simon (1977) via domain-reference §6 Ex. 1: 60 + 108 + 45 + 90 = 303.
    expect(plan.expectedCost).toBeCloseTo(303, 9);
    expect(order(plan)).toEqual(['leak', 'maf', 'o2', 'pump']);
    expect(plan.stages.every((s) => s.kind === 'replace')).toBe(true);
    expect(plan.exact).toBe(true);
    // domain-reference §6 Ex. 1: most-likely-first = 318; cheapest-first = 330.
    expect(plan.baselines.mostLikelyFirst.expectedCost).toBeCloseTo(318, 9);
    expect(plan.baselines.cheapestFirst.expectedCost).toBeCloseTo(330, 9);
    // Reach probabilities 1, .6, .3, .2 (domain-reference §6 Ex. 1, the factors of each term).
    expect(plan.stages.map((s) => s.reachProbability)).toEqual([1, 0.6, 0.3, 0.2].map((x) => expect.closeTo(x, 9)));
  });

  it('Ex. 2 (Kadane & Simon 1977): 155 in the order cap, purge, vent, neck', async () => {
    const res = await post({
      causes: [
        { key: 'cap', probability: 0.5, replaceCost: 20 },
        { key: 'purge', probability: 0.2, replaceCost: 120 },
        { key: 'vent', probability: 0.2, replaceCost: 150 },
        { key: 'neck', probability: 0.1, replaceCost: 300 },
      ],
      teardowns: {},
      verificationCost: 0,
      unlistedProbability: 0,
    }).expect(200);
    // domain-reference §6 Ex. 2: 20 + 60 + 45 + 30 = 155.
    expect(res.body.expectedCost).toBeCloseTo(155, 9);
    expect(order(res.body)).toEqual(['cap', 'purge', 'vent', 'neck']);
  });

  const ex3 = (checkFirst: boolean) => ({
    causes: [
      { key: 'vacuum', probability: 0.4, checkCost: 40, replaceCost: 20, checkFirst },
      { key: 'maf', probability: 0.3, checkCost: 25, replaceCost: 180, checkFirst },
      { key: 'fuel', probability: 0.2, checkCost: 35, replaceCost: 450, checkFirst },
      { key: 'o2', probability: 0.1, checkCost: 30, replaceCost: 150, checkFirst },
    ],
    teardowns: {},
    verificationCost: 0,
    unlistedProbability: 0,
  });

  it('Ex. 3 (Heckerman, Breese & Rommelse 1995): every cause check-first gives 233.5 in the order MAF, vacuum, fuel, O2', async () => {
    const res = await post(ex3(true)).expect(200);
    // HBR95 via domain-reference §6 Ex. 3: 25 + 28 + 10.5 + 3 + 167 = 233.5, sorted by p/C^o.
    expect(res.body.expectedCost).toBeCloseTo(233.5, 9);
    expect(order(res.body)).toEqual(['maf', 'vacuum', 'fuel', 'o2']);
    expect(res.body.stages.every((s: { kind: string }) => s.kind === 'check')).toBe(true);
  });

  it('Ex. 3 with blind replacement allowed drops to 203 (domain-reference §8)', async () => {
    const res = await post(ex3(false)).expect(200);
    // domain-reference §8: "Allowing blind replacement the optimum drops to 203 (replace the vacuum part first)".
    expect(res.body.expectedCost).toBeCloseTo(203, 9);
    expect(res.body.stages[0]).toMatchObject({ kind: 'replace', causes: ['vacuum'] });
  });

  it('Ex. 4 (Langseth & Jensen 2001): the cost cluster opened once, 293.5: hose, open K and check plug, gasket, coil, injector', async () => {
    const res = await post({
      causes: [
        { key: 'hose', probability: 0.25, replaceCost: 50 },
        { key: 'injector', probability: 0.25, replaceCost: 200 },
        { key: 'plug', probability: 0.25, checkCost: 40, replaceCost: 0, checkFirst: true, teardown: 'K' },
        { key: 'gasket', probability: 0.1, checkCost: 30, replaceCost: 0, checkFirst: true, teardown: 'K' },
        { key: 'coil', probability: 0.15, checkCost: 90, replaceCost: 0, checkFirst: true, teardown: 'K' },
      ],
      teardowns: { K: 150 },
      verificationCost: 0,
      unlistedProbability: 0,
    }).expect(200);
    // Langseth & Jensen (2001) via domain-reference §6 Ex. 4: 50 + 190·.75 + 30·.5 + 90·.4 + 200·.25 = 293.5.
    expect(res.body.expectedCost).toBeCloseTo(293.5, 9);
    expect(res.body.stages.map((s: { kind: string; causes: string[]; teardowns: string[] }) => [s.kind, s.causes, s.teardowns])).toEqual([
      ['replace', ['hose'], []],
      ['check', ['plug', 'gasket', 'coil'], ['K']],
      ['replace', ['injector'], []],
    ]);
    // The stage reached after the hose failed: 1 − .25 = .75 (domain-reference §6 Ex. 4).
    expect(res.body.stages[1].reachProbability).toBeCloseTo(0.75, 9);
  });

  it('offers escalation only when an escalation cost is given, and ends the path with it', async () => {
    const res = await post({ ...ex1, causes: ex1.causes.map((c) => ({ ...c, probability: c.probability * 0.5 })), unlistedProbability: 0.5, escalationCost: 100 }).expect(200);
    const kinds = res.body.stages.map((s: { kind: string }) => s.kind);
    expect(kinds[kinds.length - 1]).toBe('escalate');
    expect(kinds.filter((k: string) => k === 'escalate')).toHaveLength(1);
    const none = await post({ ...ex1, causes: ex1.causes.map((c) => ({ ...c, probability: c.probability * 0.5 })), unlistedProbability: 0.5 }).expect(200);
    expect(none.body.stages.some((s: { kind: string }) => s.kind === 'escalate')).toBe(false);
  });

  describe('bad input: 400 naming the field and the rule', () => {
    const fieldsOf = (body: { errors: Array<{ field: string; message: string }> }) => body.errors.map((e) => e.field);

    it('a probability outside [0, 1]', async () => {
      const res = await post({ ...ex1, causes: [{ ...ex1.causes[0], probability: 1.5 }, ...ex1.causes.slice(1)] }).expect(400);
      expect(fieldsOf(res.body)).toContain('causes.0.probability');
      expect(res.body.errors.find((e: { field: string }) => e.field === 'causes.0.probability').message).toMatch(/\[0, 1\]/);
      const neg = await post({ ...ex1, unlistedProbability: -0.1 }).expect(400);
      expect(fieldsOf(neg.body)).toContain('unlistedProbability');
    });

    it('probabilities summing above 1', async () => {
      const res = await post({ ...ex1, unlistedProbability: 0.2 }).expect(400);
      expect(res.body.errors).toContainEqual({ field: 'causes', message: expect.stringMatching(/at most 1/) });
    });

    it('negative and non-finite costs', async () => {
      const neg = await post({ ...ex1, causes: [ex1.causes[0], { ...ex1.causes[1], replaceCost: -5 }, ...ex1.causes.slice(2)] }).expect(400);
      expect(fieldsOf(neg.body)).toEqual(['causes.1.replaceCost']);
      // JSON has no Infinity, but a number too large for a double parses to it.
      const raw = JSON.stringify({ ...ex1, verificationCost: 0 }).replace('"verificationCost":0', '"verificationCost":1e999');
      const inf = await t.http().post('/api/fix-paths').set(...bearer(owner)).set('Content-Type', 'application/json').send(raw).expect(400);
      expect(fieldsOf(inf.body)).toEqual(['verificationCost']);
      const esc = await post({ ...ex1, escalationCost: -1 }).expect(400);
      expect(fieldsOf(esc.body)).toEqual(['escalationCost']);
      const td = await post({ ...ex1, teardowns: { K: -10 } }).expect(400);
      expect(fieldsOf(td.body)).toEqual(['teardowns.K']);
      const str = await post({ ...ex1, causes: [{ ...ex1.causes[0], replaceCost: '60' }, ...ex1.causes.slice(1)] }).expect(400);
      expect(fieldsOf(str.body)).toEqual(['causes.0.replaceCost']);
    });

    it('an unknown teardown key', async () => {
      const res = await post({ ...ex1, causes: [{ ...ex1.causes[0], teardown: 'plenum' }, ...ex1.causes.slice(1)] }).expect(400);
      expect(res.body.errors).toEqual([{ field: 'causes.0.teardown', message: expect.stringMatching(/unknown teardown 'plenum'/) }]);
    });

    it('duplicate keys', async () => {
      const res = await post({ ...ex1, causes: [ex1.causes[0], { ...ex1.causes[1], key: 'leak' }, ...ex1.causes.slice(2)] }).expect(400);
      expect(res.body.errors).toEqual([{ field: 'causes.1.key', message: "duplicate key 'leak'" }]);
    });

    it('more than 200 causes', async () => {
      const causes = Array.from({ length: 201 }, (_, i) => ({ key: `c${i}`, probability: 0.001, replaceCost: 10 }));
      const res = await post({ ...ex1, causes }).expect(400);
      expect(res.body.errors).toEqual([{ field: 'causes', message: expect.stringMatching(/at most 200/) }]);
    });

    it('check-first without a check cost, missing fields and unknown fields', async () => {
      const cf = await post({ ...ex1, causes: [{ ...ex1.causes[0], checkFirst: true }, ...ex1.causes.slice(1)] }).expect(400);
      expect(fieldsOf(cf.body)).toEqual(['causes.0.checkFirst']);
      const missing = await post({ causes: ex1.causes }).expect(400);
      expect(fieldsOf(missing.body)).toEqual(expect.arrayContaining(['teardowns', 'verificationCost', 'unlistedProbability']));
      const extra = await post({ ...ex1, budget: 5, causes: [{ ...ex1.causes[0], colour: 'red' }, ...ex1.causes.slice(1)] }).expect(400);
      expect(extra.body.errors).toEqual(expect.arrayContaining([{ field: 'budget', message: 'is not an accepted field' }, { field: 'causes.0.colour', message: 'is not an accepted field' }]));
      const notObject = await post([1, 2]).expect(400);
      expect(fieldsOf(notObject.body)).toEqual(['body']);
    });
  });

  it('needs a signed-in user', async () => {
    await t.http().post('/api/fix-paths').send(ex1).expect(401);
  });
});
