import type { INestApplication } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA, ROUTE_ARGS_METADATA } from '@nestjs/common/constants';
import { RequestMethod } from '@nestjs/common';
import { RouteParamtypes } from '@nestjs/common/enums/route-paramtypes.enum';
import { DiscoveryService, MetadataScanner, ModulesContainer } from '@nestjs/core';
import { getMetadataStorage } from 'class-validator';
import fc from 'fast-check';
import sharp from 'sharp';
import type { AuthResponse } from '@causeway/shared';
import { closedPort } from './utils/mail-catcher';

// vin-generator (npm, MIT): VINs from real WMI prefixes with a 49 CFR 565.15 check digit.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { generateVin } = require('vin-generator') as { generateVin: () => string };
import { discoverRoutes, type DiscoveredRoute } from './utils/routes';
import { bearer, createTestApp, GOOD_PASSWORD, registerMember, registerOwner, setRole, type TestApp } from './utils/test-app';

/**
 * Fuzz (issue 8 §5): fast-check over every route that takes a body or a query, found in Nest's
 * route table. Random JSON (unicode, numbers beyond double range, deep nesting, null, wrong
 * types, "__proto__"/"constructor" keys), the route's own DTO fields with wrong values, and
 * valid bodies with one part broken; random query strings (also malformed percent-encoding).
 * Every answer must be a success, a 4xx naming the field (`errors[0].field`), or a 404 / 409 /
 * 410 / 422 about the state of a row — never a 5xx. The caller is an admin who owns a shop, so
 * no guard stops a request early.
 *
 * Outside sources (from memory): RFC 8259 §9 (parsers may limit number range and nesting
 * depth; a number like 1e400 is valid JSON text); RFC 9110 §15.5.1 (400 for a malformed
 * request) and §15.6.1 (500 is the server's failure, never the client's input); OWASP API
 * Security Top 10 (2023) API3 "Broken Object Property Level Authorization" / mass assignment
 * (unknown properties refused) and prototype pollution through "__proto__" keys.
 */

interface RouteInputs {
  body: { keys: string[] } | null;
  query: { keys: string[] } | null;
}

function joinPath(...parts: string[]): string {
  return `/${parts.map((p) => p.replace(/^\/+|\/+$/g, '')).filter(Boolean).join('/')}`;
}

/** Property names a DTO class declares to class-validator (its fields, inherited ones too). */
function dtoKeys(cls: unknown): string[] {
  if (typeof cls !== 'function' || cls === Object) return [];
  const metas = getMetadataStorage().getTargetValidationMetadatas(cls as new () => object, '', true, false);
  return [...new Set(metas.map((m) => m.propertyName))];
}

/** Which routes read @Body() / @Query(), and the DTO fields they expect: from the same route table as discoverRoutes. */
function routeInputs(app: INestApplication): Map<string, RouteInputs> {
  const out = new Map<string, RouteInputs>();
  const discovery = new DiscoveryService(app.get(ModulesContainer));
  const scanner = new MetadataScanner();
  for (const { instance, metatype } of discovery.getControllers()) {
    if (!instance || !metatype) continue;
    const prefixes = ([] as string[]).concat(Reflect.getMetadata(PATH_METADATA, metatype) ?? '');
    const proto = Object.getPrototypeOf(instance) as Record<string, unknown>;
    for (const name of scanner.getAllMethodNames(proto)) {
      const handler = proto[name] as object;
      const paths = Reflect.getMetadata(PATH_METADATA, handler) as string | string[] | undefined;
      const method = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod | undefined;
      if (paths === undefined || method === undefined) continue;
      const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, metatype, name) ?? {}) as Record<string, { index: number; data?: unknown }>;
      const types = (Reflect.getMetadata('design:paramtypes', proto, name) ?? []) as unknown[];
      const find = (kind: RouteParamtypes) => Object.entries(args).find(([key, a]) => key.split(':')[0] === String(kind) && a.data === undefined)?.[1];
      const body = find(RouteParamtypes.BODY);
      const query = find(RouteParamtypes.QUERY);
      const inputs: RouteInputs = {
        body: body ? { keys: dtoKeys(types[body.index]) } : null,
        query: query ? { keys: dtoKeys(types[query.index]) } : null,
      };
      for (const prefix of prefixes) for (const p of ([] as string[]).concat(paths)) out.set(`${RequestMethod[method]} ${joinPath('api', prefix, p)}`, inputs);
    }
  }
  return out;
}

// ------------------------------------------------------------------ generators

const POISON_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'isAdmin', 'role', 'shopId', 'id'];
const ODD_STRINGS = ['', ' ', '\u0000', '\uFEFF', '\u202E', 'ß', '🚗💥', 'null', 'undefined', 'NaN', 'Infinity', 'true', '0x1F', '1e400', '-0', '2025-02-30', '2025-13-01T25:61:00Z', 'P0171', 'p0171-13', "'; DROP TABLE users; --", '../../etc/passwd', '<script>alert(1)</script>', '%00', '{"$gt":""}', 'a'.repeat(5000)];
/** Number literals as JSON text, some beyond what a double holds (RFC 8259 §6). */
const ODD_NUMBER_TEXT = ['1e400', '-1e400', '1E-400', '123456789012345678901234567890', '-0', '0.1', '9007199254740993', '-9223372036854775809', '4.9e-324'];

const scalarText: fc.Arbitrary<string> = fc.oneof(
  fc.string({ unit: 'grapheme', maxLength: 30 }).map((s) => JSON.stringify(s)),
  fc.string({ unit: 'binary', maxLength: 12 }).map((s) => JSON.stringify(s)),
  fc.constantFrom(...ODD_STRINGS).map((s) => JSON.stringify(s)),
  fc.integer().map(String),
  fc.double({ noNaN: true, noDefaultInfinity: true }).map((n) => JSON.stringify(n)),
  fc.constantFrom(...ODD_NUMBER_TEXT),
  fc.constantFrom('true', 'false', 'null'),
);
const keyArb = (known: string[]): fc.Arbitrary<string> =>
  known.length > 0 ? fc.oneof({ weight: 4, arbitrary: fc.constantFrom(...known) }, fc.constantFrom(...POISON_KEYS), fc.string({ maxLength: 12 })) : fc.oneof(fc.constantFrom(...POISON_KEYS), fc.string({ maxLength: 12 }));

/** Any JSON text: scalars, arrays and objects nested a few levels, keys from `known` and poison keys. */
const jsonText = (known: string[] = []): fc.Arbitrary<string> =>
  fc.letrec<{ any: string; arr: string; obj: string }>((tie) => ({
    any: fc.oneof({ depthSize: 'small', withCrossShrink: true }, scalarText, tie('arr'), tie('obj')),
    arr: fc.array(tie('any'), { maxLength: 4 }).map((xs) => `[${xs.join(',')}]`),
    obj: fc.array(fc.tuple(keyArb(known), tie('any')), { maxLength: 5 }).map((es) => `{${es.map(([k, v]) => `${JSON.stringify(k)}:${v}`).join(',')}}`),
  })).any;

/** A value nested `depth` arrays or objects deep. */
const deepText = fc.tuple(fc.integer({ min: 50, max: 3000 }), fc.boolean()).map(([depth, arrays]) => (arrays ? `${'['.repeat(depth)}1${']'.repeat(depth)}` : `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}`));

/** An object with the DTO's fields, each with any value. */
const dtoObjectText = (keys: string[]) =>
  fc.array(fc.tuple(keyArb(keys), fc.oneof(scalarText, jsonText(keys))), { minLength: 1, maxLength: Math.max(3, keys.length + 1) }).map((es) => `{${es.map(([k, v]) => `${JSON.stringify(k)}:${v}`).join(',')}}`);

const MARKER = '"__FUZZ_VALUE__"';
type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
function pathsOf(value: Json, prefix: Array<string | number> = []): Array<Array<string | number>> {
  const here = prefix.length ? [prefix] : [];
  if (Array.isArray(value)) return [...here, ...value.flatMap((v, i) => pathsOf(v, [...prefix, i]))];
  if (value && typeof value === 'object') return [...here, ...Object.entries(value).flatMap(([k, v]) => pathsOf(v, [...prefix, k]))];
  return here;
}
/** A valid body with one part replaced by any value, or removed, or a poison key added beside it. */
const brokenSample = (sample: () => Json, keys: string[]) =>
  fc.tuple(fc.nat(), fc.constantFrom('replace', 'remove', 'poison'), fc.oneof(scalarText, jsonText(keys))).map(([n, how, text]) => {
    const copy = sample();
    const paths = pathsOf(copy);
    const path = paths[n % paths.length];
    let parent = copy as Record<string | number, Json>;
    for (const step of path.slice(0, -1)) parent = parent[step] as Record<string | number, Json>;
    const last = path[path.length - 1];
    if (how === 'remove') {
      if (Array.isArray(parent)) parent.splice(Number(last), 1);
      else delete parent[last];
      return JSON.stringify(copy);
    }
    if (how === 'poison' && !Array.isArray(parent)) {
      const rest = JSON.stringify(copy);
      return `{"__proto__":{"role":"admin","shopId":"x","polluted":true},"constructor":{"prototype":{"polluted":true}},${rest.slice(1)}`;
    }
    parent[last] = '__FUZZ_VALUE__';
    return JSON.stringify(copy).replace(MARKER, text);
  });

const queryValue = fc.oneof(fc.string({ unit: 'grapheme', maxLength: 20 }), fc.constantFrom(...ODD_STRINGS), fc.integer().map(String), fc.constantFrom(...ODD_NUMBER_TEXT));
/** A raw query string: known and unknown names, repeated names (arrays), bracket names, broken percent-escapes. */
const queryText = (keys: string[]) =>
  fc
    .array(
      fc.oneof(
        { weight: 6, arbitrary: fc.tuple(keyArb(keys), queryValue).map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`) },
        fc.tuple(keyArb(keys), queryValue).map(([k, v]) => `${encodeURIComponent(k)}[]=${encodeURIComponent(v)}&${encodeURIComponent(k)}[x]=${encodeURIComponent(v)}`),
        fc.tuple(keyArb(keys), fc.constantFrom('%', '%zz', '%E0%A4%A', '%C0%AF', '%00', '%FF%FE')).map(([k, v]) => `${encodeURIComponent(k)}=${v}`),
        keyArb(keys).map((k) => encodeURIComponent(k)),
      ),
      { maxLength: 5 },
    )
    .map((pairs) => pairs.join('&'));

// ------------------------------------------------------------------ the suite

/** 15 per route keeps the suite quick; FUZZ_RUNS=200 for a longer hunt. */
const RUNS = Number(process.env.FUZZ_RUNS ?? 15);

describe('fuzz: every route that takes a body or a query (e2e)', () => {
  let t: TestApp;
  let routes: DiscoveredRoute[];
  let inputs: Map<string, RouteInputs>;
  let admin: AuthResponse;
  const ids: Record<string, string> = {};
  /** Valid bodies, made afresh each time (new e-mail, VIN, key) so a conflict does not hide what follows it. */
  const samples: Record<string, () => Json> = {};
  let serial = 0;

  beforeAll(async () => {
    t = await createTestApp({ SEED_DEMO: 'true', SMTP_HOST: '127.0.0.1', SMTP_PORT: String(await closedPort()), PUBLIC_THROTTLE_LIMIT: '100000' });
    routes = discoverRoutes(t.app);
    inputs = routeInputs(t.app);
    admin = await registerOwner(t);
    await setRole(t, admin.user.id, 'admin');
    const target = await registerMember(t, admin, 'technician');
    const as = bearer(admin);
    const post = (path: string, body: object) => t.http().post(path).set(...as).send(body);

    // Real rows for every path parameter, so requests reach the code behind the lookups.
    const vehicle = { vin: 'YHATR6G24KH104382', make: 'Halden', model: 'Tarn', engine: '1.6 T', odometer: 52000, ownerEmail: 'priya@example.com' };
    ids.vehicle = (await post('/api/vehicles', vehicle).expect(201)).body.id;
    const job = { vehicleId: ids.vehicle, complaint: 'Warning lamp', codes: [{ code: 'P0171', status: 'stored' }] };
    ids.job = (await post('/api/jobs', job).expect(201)).body.id;
    const estimate = (await post(`/api/jobs/${ids.job}/estimates`, { message: 'Hello' }).expect(201)).body;
    ids.estimate = estimate.estimate.id;
    ids.token = String(estimate.link).split('/').pop()!;
    const report = { kind: 'confirmed-fix', payload: { code: 'P0171', make: 'Halden', model: 'Tarn', part: 'pcv-diaphragm' } };
    ids.draft = (await post('/api/field-reports', report).expect(201)).body.id;
    // Submitted by someone else: nobody may decide their own report.
    const author = await registerMember(t, admin, 'contributor');
    ids.submitted = (await t.http().post('/api/field-reports').set(...bearer(author)).send({ ...report, submit: true }).expect(201)).body.id;
    const png = await sharp({ create: { width: 4, height: 4, channels: 3, background: '#888' } }).png().toBuffer();
    ids.attachment = (await t.http().post(`/api/field-reports/${ids.draft}/attachments`).set(...as).attach('files', png, 'a.png').expect(201)).body[0].id;
    ids.mapping = (await post('/api/imports/mappings', { name: 'Fuzz', mapping: { columns: { code: 'DTC' } } }).expect(201)).body.id;
    ids.cause = (await t.http().get('/api/causes').query({ code: 'P0171' }).set(...as).expect(200)).body[0].id;
    ids.part = (await t.http().get('/api/parts').set(...as).expect(200)).body[0].key;
    ids.teardown = (await t.http().get('/api/teardowns').set(...as).expect(200)).body[0].key;
    ids.user = target.user.id;

    const bodies: Record<string, Json | (() => Json)> = {
      'POST /api/auth/login': { email: admin.user.email, password: 'not-the-password-1' },
      'POST /api/auth/register': () => ({ email: `fuzz.${++serial}@example.com`, password: GOOD_PASSWORD, displayName: 'F', shop: { name: 'Fuzz Garage', currency: 'GBP', locale: 'en-GB', labourRateMinor: 9500, taxRateBp: 2000, distanceUnit: 'mi' } }),
      'PATCH /api/shops/mine': { name: 'Fuzz Garage', currency: 'GBP', locale: 'en-GB', labourRateMinor: 9500, taxRateBp: 2000, distanceUnit: 'mi' },
      'POST /api/vehicles': () => ({ ...vehicle, vin: generateVin() }),
      'PATCH /api/vehicles/:id': { plate: 'KX19 HTN', odometer: 52100 },
      'POST /api/jobs': job,
      'POST /api/jobs/:id/steps': { code: 'P0171', kind: 'check', parts: ['pcv-diaphragm'], result: 'not-at-fault', actualCostMinor: 950, at: '2025-03-14T09:30:00Z' },
      'POST /api/jobs/:id/close': { resolution: 'resolved', verificationPassed: true, fixedBy: [{ code: 'P0171', parts: ['pcv-diaphragm'] }] },
      'POST /api/jobs/:jobId/estimates': { expiresInDays: 14, recipientEmail: 'a@example.com', message: 'Hi' },
      'POST /api/public/estimates/:token/answers': { stageIndex: 0, decision: 'approved', name: 'Priya' },
      'POST /api/fix-paths': {
        causes: [
          { key: 'leak', probability: 0.4, replaceCost: 60, checkCost: 10, teardown: 'intake' },
          { key: 'maf', probability: 0.3, replaceCost: 180, checkFirst: false },
        ],
        teardowns: { intake: 30 },
        verificationCost: 20,
        escalationCost: 500,
        unlistedProbability: 0.1,
        addOns: [{ key: 'plugs', teardown: 'intake', cost: 40 }],
      },
      'POST /api/field-reports': report,
      'PATCH /api/field-reports/:id': report,
      'POST /api/knowledge/causes': { code: 'P0171', partKey: ids.part, prior: 0.1, partCostMinor: 2200, currency: 'GBP', replaceHours: 0.5, make: 'Halden' },
      'PATCH /api/knowledge/causes/:id': { prior: 0.2, replaceHours: 0.4 },
      'POST /api/knowledge/parts': () => ({ key: `fuzz-part-${++serial}`, name: 'Fuzz part', system: 'fuel-injection' }),
      'POST /api/imports/mappings': { name: 'Fuzz 2', mapping: { columns: { code: 'DTC', date: 'Read at' }, odometerUnit: 'mi', dateOrder: 'DMY', statusValues: { h: 'stored' }, freezeFrame: [{ header: 'RPM', key: 'rpm' }] } },
      'PATCH /api/admin/users/:id': { role: 'contributor', disabled: false },
      'POST /api/review/reports/:id/reject': { reason: 'Not enough evidence for this one.' },
    };
    for (const [k, v] of Object.entries(bodies)) samples[k] = typeof v === 'function' ? v : () => structuredClone(v);
  });
  afterAll(() => t.close());

  const concrete = (route: DiscoveredRoute) =>
    route.path
      .replace(':code', 'P0171')
      .replace(':token', ids.token)
      .replace(':jobId', ids.job)
      .replace(':estimateId', ids.estimate)
      .replace(':attachmentId', ids.attachment)
      .replace(':key', route.path.includes('/teardowns/') ? ids.teardown : ids.part)
      .replace(':id', () => {
        const byPrefix: Array<[string, string]> = [
          ['/api/vehicles/', ids.vehicle],
          ['/api/jobs/', ids.job],
          ['/api/imports/mappings/', ids.mapping],
          ['/api/field-reports/', ids.draft],
          ['/api/review/reports/', ids.submitted],
          ['/api/knowledge/causes/', ids.cause],
          ['/api/admin/users/', ids.user],
        ];
        return byPrefix.find(([prefix]) => route.path.startsWith(prefix))?.[1] ?? '00000000-0000-4000-8000-000000000000';
      });

  /** null when the answer is acceptable, else what is wrong with it. */
  const judge = (route: DiscoveredRoute, res: { status: number; body: { errors?: Array<{ field?: unknown }> } }): string | null => {
    if (res.status >= 500) return `${res.status} server error`;
    if (res.status < 300) return null;
    if ([404, 409, 410, 422].includes(res.status)) return null;
    // Wrong credentials (401) and the per-address lockout (429) are what sign-in answers.
    if (route.path === '/api/auth/login' && (res.status === 401 || res.status === 429)) return null;
    const field = res.body?.errors?.[0]?.field;
    if (res.status >= 400 && res.status < 500 && typeof field === 'string' && field.length > 0) return null;
    return `${res.status} without a field: ${JSON.stringify(res.body).slice(0, 300)}`;
  };

  it('finds the routes that take a body or a query (the same table the access matrix checks)', () => {
    const keys = routes.map((r) => `${r.method} ${r.path}`).sort();
    expect([...inputs.keys()].sort()).toEqual(keys);
    const fuzzed = routes.filter((r) => inputs.get(`${r.method} ${r.path}`)!.body || inputs.get(`${r.method} ${r.path}`)!.query);
    // Sign-in, registration, vehicles, jobs, steps, estimates, fix paths, field reports, knowledge edits, imports, admin…
    expect(fuzzed.length).toBeGreaterThan(30);
    // Every valid sample belongs to a route that takes a body.
    expect(Object.keys(samples).filter((k) => !inputs.get(k)?.body)).toEqual([]);
  });

  it(`answers ${RUNS} random bodies and ${RUNS} random query strings per route with a 2xx, a 4xx naming the field, or 404/409/410/422 — never a 5xx`, async () => {
    const failures: string[] = [];
    const seen: Record<string, number> = {};
    // FUZZ_ROUTE=<part of "METHOD /path"> and FUZZ_SEED=<seed> replay a reported failure.
    for (const route of routes.filter((r) => !process.env.FUZZ_ROUTE || `${r.method} ${r.path}`.includes(process.env.FUZZ_ROUTE))) {
      const key = `${route.method} ${route.path}`;
      const io = inputs.get(key)!;
      const send = (body: string | null, query: string) => {
        let req = t.http()[route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete' | 'put'](`${concrete(route)}${query ? `?${query}` : ''}`).set(...bearer(admin));
        if (body !== null) req = req.set('Content-Type', 'application/json').send(body);
        return req;
      };
      const check = async (body: string | null, query: string) => {
        const res = await send(body, query);
        seen[String(res.status)] = (seen[String(res.status)] ?? 0) + 1;
        const wrong = judge(route, res);
        if (wrong) throw new Error(wrong);
        return true;
      };
      const runs: Array<[string, fc.Arbitrary<[string | null, string]>]> = [];
      if (io.body) {
        const bodies = [jsonText(io.body.keys), dtoObjectText(io.body.keys), deepText];
        if (samples[key] !== undefined) bodies.push(brokenSample(samples[key], io.body.keys), brokenSample(samples[key], io.body.keys));
        runs.push(['body', fc.oneof(...bodies).map((b) => [b, ''] as [string, string])]);
      }
      if (io.query) runs.push(['query', queryText(io.query.keys).map((q) => [io.body ? '{}' : null, q] as [string | null, string])]);
      for (const [what, arb] of runs) {
        const result = await fc.check(fc.asyncProperty(arb, ([b, q]) => check(b, q)), { numRuns: RUNS, endOnFailure: true, ...(process.env.FUZZ_SEED ? { seed: Number(process.env.FUZZ_SEED) } : {}) });
        if (result.failed) {
          const [b, q] = result.counterexample![0];
          failures.push(`${key} (${what}, seed ${result.seed}): ${(result.errorInstance as Error)?.message} ← body ${String(b).slice(0, 2000)} query ${q.slice(0, 500)}`);
        }
      }
    }
    expect(failures).toEqual([]);
    if (process.env.FUZZ_ROUTE) return;
    // The fuzzing reached the validation (400s naming fields) and did not just bounce off.
    expect(seen['400']).toBeGreaterThan(RUNS * 20);
    // No request polluted the prototype of every object in the server (same process).
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(({} as Record<string, unknown>).role).toBeUndefined();
    expect(Object.keys(Object.prototype)).toEqual([]);
  }, Math.max(60_000, RUNS * 4000));

  it('null, arrays (also of arrays), an empty object and a wrong type in each field of each DTO, one at a time, and each query name empty', async () => {
    const failures: string[] = [];
    for (const route of routes) {
      const key = `${route.method} ${route.path}`;
      const io = inputs.get(key)!;
      const base = () => (samples[key]?.() ?? {}) as Record<string, Json>;
      const url = concrete(route);
      const method = route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete' | 'put';
      for (const field of io.body?.keys ?? []) {
        for (const value of [null, [], [[]], [1], {}, true, 'x', -1, 1e-7, 2 ** 53 + 1, 0.1 + 0.2]) {
          const res = await t.http()[method](url).set(...bearer(admin)).send({ ...base(), [field]: value });
          const wrong = judge(route, res);
          if (wrong) failures.push(`${key} {${field}: ${JSON.stringify(value)}}: ${wrong}`);
        }
      }
      for (const name of io.query?.keys ?? []) {
        for (const q of [`${name}=`, `${name}=x&${name}=y`, `${name}=%00`]) {
          let req = t.http()[method](`${url}?${q}`).set(...bearer(admin));
          if (io.body) req = req.send(base());
          const res = await req;
          const wrong = judge(route, res);
          if (wrong) failures.push(`${key} ?${q}: ${wrong}`);
        }
      }
    }
    expect(failures).toEqual([]);
  }, 60_000);

  it('a body nested far deeper than any request needs is a 400 naming the body (RFC 8259 §9 lets a parser limit nesting)', async () => {
    for (const text of [`${'['.repeat(100_000)}${']'.repeat(100_000)}`, `{"make":${'{"a":'.repeat(40)}1${'}'.repeat(40)}}`]) {
      const res = await t.http().post('/api/vehicles').set(...bearer(admin)).set('Content-Type', 'application/json').send(text).expect(400);
      expect(res.body.errors).toEqual([{ field: 'body', message: expect.stringMatching(/nested more than \d+ levels/) as string }]);
    }
  });

  it('after the fuzzing the admin can still work, and the rows used are still readable', async () => {
    await t.http().get('/api/me').set(...bearer(admin)).expect(200);
    await t.http().get(`/api/vehicles/${ids.vehicle}`).set(...bearer(admin)).expect(200);
    await t.http().get(`/api/jobs/${ids.job}`).set(...bearer(admin)).expect(200);
  });
});
