import { createHash } from 'node:crypto';
import sharp from 'sharp';
import type { Test } from 'supertest';
import type { AuthResponse } from '@causeway/shared';
import { closedPort } from './utils/mail-catcher';

// vin-generator (npm, MIT): VINs from real WMI prefixes with a 49 CFR 565.15 check digit.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { generateVin } = require('vin-generator') as { generateVin: () => string };
import { discoverRoutes, type DiscoveredRoute } from './utils/routes';
import { bearer, createTestApp, KESTREL_SHOP, registerMember, registerOwner, setRole, type TestApp } from './utils/test-app';

/**
 * Shop isolation (issue 8 §2), driven by a table of resource kinds. Each kind is made in shop A;
 * then every route that takes its id — found in Nest's own route table by path prefix — is
 * called by users of shop B (a contributor, and the shop's owner made admin, the strongest
 * caller there is). Each call must be a 404 that shows nothing of the row, never a 403, and the
 * row must read the same to shop A afterwards. A route with a path parameter that no kind
 * covers and that is not listed as shared data fails the suite, so a new shop-owned route is
 * covered by adding a row (or is covered at once when it sits under a kind's prefix).
 *
 * Outside sources (from memory): OWASP API Security Top 10 (2023) API1 "Broken Object Level
 * Authorization" — every access by an id is checked against the caller; RFC 9110 §15.5.5: a
 * server that wishes to hide the existence of a forbidden resource MAY answer 404 instead of 403.
 */

/** Written into every row made in shop A: it must never show in an answer to shop B. */
const MARK = 'shop-a-private-7f3c';

type Who = 'ownerA' | 'contributorA' | 'contributorA2' | 'contributorB' | 'adminB';
type Params = Record<string, string>;

interface Kind {
  name: string;
  /** The routes of this kind start with this (Nest's path, with its :params). The longest matching prefix wins. */
  prefix: string;
  /** The path parameters this kind fills in. */
  params: string[];
  /** 'shop': rows of the shop; 'author': rows of their author alone, even within the shop. */
  owner: 'shop' | 'author';
  /** Makes one row in shop A (as ownerA or contributorA) and gives the route parameters. */
  create: () => Promise<Params>;
  /** What shop A reads of the row (status 200 and a body); compared before and after shop B's attempts. */
  snapshot: (p: Params) => Promise<{ status: number; body: unknown }>;
  /** A valid body for routes that need one ("METHOD path"), so the call reaches the lookup rather than the validation. */
  send?: Record<string, (req: Test) => Test>;
}

describe('shop isolation: every shop-owned resource, every route that takes its id (e2e)', () => {
  let t: TestApp;
  let routes: DiscoveredRoute[];
  const who: Partial<Record<Who, AuthResponse>> = {};
  let png: Buffer;

  const as = (w: Who) => bearer(who[w]!);
  const call = (route: DiscoveredRoute, path: string) => t.http()[route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete' | 'put'](path);
  const fill = (path: string, p: Params) => path.replace(/:([A-Za-z]+)/g, (_m, name: string) => p[name] ?? `:${name}`);
  const paramsOf = (path: string) => [...path.matchAll(/:([A-Za-z]+)/g)].map((m) => m[1]);

  const vehicleA = async () =>
    (await t.http().post('/api/vehicles').set(...as('ownerA')).send({ vin: generateVin(), make: 'Halden', model: 'Tarn', engine: '1.6 T', ownerName: MARK, ownerEmail: 'priya@example.com' }).expect(201)).body.id as string;
  const jobA = async () =>
    (await t.http().post('/api/jobs').set(...as('ownerA')).send({ vehicleId: await vehicleA(), complaint: `Rough idle ${MARK}`, codes: [{ code: 'P0171', status: 'stored' }] }).expect(201)).body.id as string;
  const draftA = async (w: Who = 'contributorA') =>
    (await t.http().post('/api/field-reports').set(...as(w)).send({ kind: 'confirmed-fix', payload: { code: 'P0171', make: 'Halden', model: 'Tarn', part: 'pcv-diaphragm', notes: MARK } }).expect(201)).body.id as string;
  const read = async (w: Who, path: string) => {
    const res = await t.http().get(path).set(...as(w));
    return { status: res.status, body: res.body as unknown };
  };

  const KINDS: Kind[] = [
    {
      name: 'vehicle',
      prefix: '/api/vehicles',
      params: ['id'],
      owner: 'shop',
      // A vehicle with no jobs, so a leaked DELETE would really delete it.
      create: async () => ({ id: await vehicleA() }),
      snapshot: (p) => read('ownerA', `/api/vehicles/${p.id}`),
      send: { 'PATCH /api/vehicles/:id': (r) => r.send({ plate: 'HIJACK 1', ownerName: 'Shop B' }) },
    },
    {
      name: 'job',
      prefix: '/api/jobs',
      params: ['id'],
      owner: 'shop',
      create: async () => ({ id: await jobA() }),
      snapshot: (p) => read('ownerA', `/api/jobs/${p.id}`),
      send: {
        'POST /api/jobs/:id/steps': (r) => r.send({ code: 'P0171', kind: 'check', parts: ['pcv-diaphragm'], result: 'not-at-fault', actualCostMinor: 100 }),
        'POST /api/jobs/:id/close': (r) => r.send({ resolution: 'unresolved' }),
      },
    },
    {
      name: 'staged estimate',
      prefix: '/api/jobs/:jobId/estimates',
      params: ['jobId', 'estimateId'],
      owner: 'shop',
      create: async () => {
        const jobId = await jobA();
        const res = await t.http().post(`/api/jobs/${jobId}/estimates`).set(...as('ownerA')).send({ message: MARK }).expect(201);
        return { jobId, estimateId: res.body.estimate.id as string };
      },
      // The list shows every estimate of the job, so an estimate made or re-sent by shop B would show.
      snapshot: (p) => read('ownerA', `/api/jobs/${p.jobId}/estimates`),
      send: {
        'POST /api/jobs/:jobId/estimates': (r) => r.send({ message: 'from shop B', recipientEmail: 'b@example.com' }),
        'POST /api/jobs/:jobId/estimates/:estimateId/send': (r) => r.send({ recipientEmail: 'b@example.com' }),
      },
    },
    {
      name: 'import (and its history entry)',
      prefix: '/api/imports',
      params: ['id'],
      owner: 'shop',
      create: async () => {
        const csv = `VIN,DTC,Date,Odometer\n${generateVin()},P0420,2025-03-14 09:30,52000\n`;
        const res = await t.http().post('/api/imports').query({ dryRun: 'false' }).set(...as('ownerA')).attach('file', Buffer.from(csv), `${MARK}.csv`).expect(200);
        expect(res.body).toMatchObject({ committed: true, createdJobs: 1 });
        return { id: res.body.importId as string };
      },
      snapshot: (p) => read('ownerA', `/api/imports/${p.id}`),
    },
    {
      name: 'saved import mapping',
      prefix: '/api/imports/mappings',
      params: ['id'],
      owner: 'shop',
      create: async () => {
        const res = await t.http().post('/api/imports/mappings').set(...as('ownerA')).send({ name: MARK, mapping: { columns: { code: 'DTC' } } }).expect(201);
        return { id: res.body.id as string };
      },
      snapshot: async (p) => {
        const list = await read('ownerA', '/api/imports/mappings');
        return { status: list.status, body: (list.body as Array<{ id: string }>).find((m) => m.id === p.id) ?? null };
      },
    },
    {
      name: 'field report (per author)',
      prefix: '/api/field-reports',
      params: ['id'],
      owner: 'author',
      create: async () => ({ id: await draftA() }),
      snapshot: (p) => read('contributorA', `/api/field-reports/${p.id}`),
      send: {
        'PATCH /api/field-reports/:id': (r) => r.send({ kind: 'confirmed-fix', payload: { code: 'P0171', make: 'Halden', model: 'Tarn', part: 'pcv-diaphragm', notes: 'edited by someone else' } }),
      },
    },
    {
      name: 'field-report attachment (per author)',
      prefix: '/api/field-reports/:id/attachments',
      params: ['id', 'attachmentId'],
      owner: 'author',
      create: async () => {
        const id = await draftA();
        const res = await t.http().post(`/api/field-reports/${id}/attachments`).set(...as('contributorA')).attach('files', png, { filename: `${MARK}.png`, contentType: 'image/png' }).expect(201);
        return { id, attachmentId: res.body[0].id as string };
      },
      snapshot: async (p) => {
        const res = await t.http().get(`/api/field-reports/${p.id}/attachments/${p.attachmentId}`).set(...as('contributorA')).buffer(true);
        const report = await read('contributorA', `/api/field-reports/${p.id}`);
        return { status: res.status, body: { sha256: createHash('sha256').update(res.body as Buffer).digest('hex'), report } };
      },
      send: { 'POST /api/field-reports/:id/attachments': (r) => r.attach('files', png, { filename: 'other.png', contentType: 'image/png' }) },
    },
  ];

  /**
   * Routes with a path parameter that are not shop-owned, with the reason. Anything else with a
   * parameter must be covered by a kind above.
   */
  const SHARED: Record<string, string> = {
    'GET /api/codes/:code': 'the code catalogue is shared by every shop',
    'GET /api/codes/:code/causes': 'the knowledge base is shared',
    'GET /api/codes/:code/fix-path': 'the knowledge base is shared',
    'PATCH /api/knowledge/codes/:code': "moderators' edits of the shared knowledge base",
    'PATCH /api/knowledge/parts/:key': "moderators' edits of the shared knowledge base",
    'PATCH /api/knowledge/teardowns/:key': "moderators' edits of the shared knowledge base",
    'PATCH /api/knowledge/causes/:id': "moderators' edits of the shared knowledge base",
    'DELETE /api/knowledge/causes/:id': "moderators' edits of the shared knowledge base",
    'GET /api/review/reports/:id': "the moderators' review desk reads submitted reports of every shop",
    'POST /api/review/reports/:id/approve': "the moderators' review desk",
    'POST /api/review/reports/:id/reject': "the moderators' review desk",
    'PATCH /api/admin/users/:id': 'admins manage every account',
  };

  const kindOf = (route: DiscoveredRoute): Kind | undefined =>
    KINDS.filter((k) => (route.path === k.prefix || route.path.startsWith(`${k.prefix}/`)) && paramsOf(route.path).every((p) => k.params.includes(p)))
      .sort((a, b) => b.prefix.length - a.prefix.length)[0];
  const routesOf = (kind: Kind) => routes.filter((r) => paramsOf(r.path).length > 0 && kindOf(r) === kind);

  beforeAll(async () => {
    // Demo knowledge (invented) gives P0171 a fix path, so staged estimates can be made; mail goes nowhere.
    t = await createTestApp({ SEED_DEMO: 'true', SMTP_HOST: '127.0.0.1', SMTP_PORT: String(await closedPort()) });
    routes = discoverRoutes(t.app);
    png = await sharp({ create: { width: 8, height: 8, channels: 3, background: { r: 200, g: 40, b: 40 } } }).png().toBuffer();
    who.ownerA = await registerOwner(t);
    who.contributorA = await registerMember(t, who.ownerA, 'contributor');
    who.contributorA2 = await registerMember(t, who.ownerA, 'contributor');
    who.adminB = await registerOwner(t, { ...KESTREL_SHOP, name: 'Shop B' });
    await setRole(t, who.adminB.user.id, 'admin');
    who.contributorB = await registerMember(t, who.adminB, 'contributor');
  });
  afterAll(() => t.close());

  it('every non-public route with a path parameter is covered by a kind or is shared data; every kind has routes', () => {
    const uncovered = routes
      .filter((r) => !r.isPublic && paramsOf(r.path).length > 0 && !kindOf(r) && !(`${r.method} ${r.path}` in SHARED))
      .map((r) => `${r.method} ${r.path}`);
    expect(uncovered).toEqual([]);
    const stale = Object.keys(SHARED).filter((k) => !routes.some((r) => `${r.method} ${r.path}` === k));
    expect(stale).toEqual([]);
    expect(KINDS.filter((k) => routesOf(k).length === 0).map((k) => k.name)).toEqual([]);
    const unusedBodies = KINDS.flatMap((k) => Object.keys(k.send ?? {}).filter((key) => !routesOf(k).some((r) => `${r.method} ${r.path}` === key)));
    expect(unusedBodies).toEqual([]);
  });

  describe.each(KINDS.map((k) => [k.name, k] as const))('%s', (_name, kind) => {
    it('made in shop A: every route taking its id answers 404 to shop B (and to another author), and the row is unchanged', async () => {
      const params = await kind.create();
      const before = await kind.snapshot(params);
      expect(before.status).toBe(200);
      expect(before.body).toBeTruthy();
      const callers: Who[] = kind.owner === 'author' ? ['contributorB', 'adminB', 'contributorA2'] : ['contributorB', 'adminB'];
      const wrong: string[] = [];
      // Reads first, then changes, deletions last: a leaked change must not hide a leaked read.
      const order = { GET: 0, POST: 1, PATCH: 1, PUT: 1, DELETE: 2 } as Record<string, number>;
      const own = routesOf(kind).sort((a, b) => order[a.method] - order[b.method]);
      for (const route of own) {
        for (const caller of callers) {
          let req = call(route, fill(route.path, params)).set(...as(caller));
          const body = kind.send?.[`${route.method} ${route.path}`];
          if (body) req = body(req);
          else if (route.method === 'POST' || route.method === 'PATCH' || route.method === 'PUT') req = req.send({});
          const res = await req.buffer(true);
          const text = Buffer.isBuffer(res.body) ? res.body.toString('latin1') : JSON.stringify(res.body ?? '') + (res.text ?? '');
          if (res.status !== 404) wrong.push(`${caller} ${route.method} ${route.path}: ${res.status} ${text.slice(0, 200)}`);
          else if (text.includes(MARK) || Object.values(params).some((v) => text.includes(v))) wrong.push(`${caller} ${route.method} ${route.path}: the 404 shows shop A's data`);
        }
      }
      expect(wrong).toEqual([]);
      expect(await kind.snapshot(params)).toEqual(before);
    });
  });

  it("no list, search or filter shows shop A's rows to shop B", async () => {
    const ids = [
      ...(await Promise.all(KINDS.map((k) => k.create()))).flatMap((p) => Object.values(p)),
      who.contributorA!.user.id,
    ];
    // Submitted too, so the author's own list and (for moderators) the review desk have something to show.
    const submitted = await draftA();
    await t.http().post(`/api/field-reports/${submitted}/submit`).set(...as('contributorA')).expect(200);
    const lists = routes.filter((r) => r.method === 'GET' && !r.isPublic && paramsOf(r.path).length === 0);
    // Filters that take an id or free text: with shop A's values they must find nothing in shop B.
    const filters = [{}, { q: 'Halden' }, { q: MARK }, { vehicleId: ids[0] }, { technicianId: who.ownerA!.user.id }];
    const leaks: string[] = [];
    const sharedView: Record<string, Who[]> = {
      // Moderators (admins too) review submitted reports of every shop: that is the review desk's job.
      '/api/review/reports': ['adminB'],
      // Admins manage every account, so they see shop A's users.
      '/api/admin/users': ['adminB'],
    };
    for (const route of lists) {
      for (const caller of ['contributorB', 'adminB'] as Who[]) {
        if (sharedView[route.path]?.includes(caller)) continue;
        for (const query of filters) {
          const res = await t.http().get(route.path).query(query).set(...as(caller));
          if (res.status >= 500) leaks.push(`${caller} GET ${route.path} ${JSON.stringify(query)}: ${res.status}`);
          const text = res.text ?? '';
          if (text.includes(MARK) || ids.some((id) => text.includes(id)) || text.includes(submitted)) leaks.push(`${caller} GET ${route.path} ${JSON.stringify(query)}: shows shop A's data`);
        }
      }
    }
    expect(leaks).toEqual([]);
    // The same lists do show the rows to shop A, so the check above can see a row when there is one.
    const mine = await t.http().get('/api/vehicles').query({ q: MARK }).set(...as('ownerA')).expect(200);
    expect(mine.body.total).toBeGreaterThan(0);
  });

  it("shop A's ids in a body or beside shop B's own ids are not found either", async () => {
    const vehicleOfA = await vehicleA();
    // A job on shop A's vehicle, or with a technician of shop A.
    const onA = await t.http().post('/api/jobs').set(...as('contributorB')).send({ vehicleId: vehicleOfA, complaint: 'x', codes: [{ code: 'P0171', status: 'stored' }] });
    expect(onA.status).toBe(404);
    const vehicleOfB = (await t.http().post('/api/vehicles').set(...as('contributorB')).send({ vin: '1HGCM82633A004352', make: 'Halden', model: 'Tarn' }).expect(201)).body.id as string;
    const techOfA = await t.http().post('/api/jobs').set(...as('contributorB')).send({ vehicleId: vehicleOfB, complaint: 'x', codes: [{ code: 'P0171', status: 'stored' }], technicianId: who.ownerA!.user.id }).expect(400);
    expect(techOfA.body.errors).toEqual([{ field: 'technicianId', message: 'is not an active member of this shop' }]);
    // Shop B's own job with shop A's estimate id.
    const estimate = await KINDS.find((k) => k.name === 'staged estimate')!.create();
    const jobOfB = (await t.http().post('/api/jobs').set(...as('contributorB')).send({ vehicleId: vehicleOfB, complaint: 'x', codes: [{ code: 'P0171', status: 'stored' }] }).expect(201)).body.id as string;
    await t.http().get(`/api/jobs/${jobOfB}/estimates/${estimate.estimateId}`).set(...as('contributorB')).expect(404);
    await t.http().post(`/api/jobs/${jobOfB}/estimates/${estimate.estimateId}/send`).set(...as('contributorB')).send({}).expect(404);
    // Shop B's own draft with shop A's attachment id.
    const attachment = await KINDS.find((k) => k.name.startsWith('field-report attachment'))!.create();
    const draftOfB = await draftA('contributorB');
    await t.http().get(`/api/field-reports/${draftOfB}/attachments/${attachment.attachmentId}`).set(...as('contributorB')).expect(404);
    await t.http().delete(`/api/field-reports/${draftOfB}/attachments/${attachment.attachmentId}`).set(...as('contributorB')).expect(404);
    const still = await t.http().get(`/api/field-reports/${attachment.id}/attachments/${attachment.attachmentId}`).set(...as('contributorA')).expect(200);
    expect(still.headers['content-type']).toBe('image/png');
  });
});
