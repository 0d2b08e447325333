import type { AddressInfo } from 'node:net';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import passport from 'passport';
import sharp from 'sharp';
import type { AttachmentDto, AuthResponse, CauseRankingDto, CreateEstimateResponse, FieldReportDto, FixPathDto, ImportDto, ImportReport, JobDto, PublicEstimateDto, VehicleDto } from '@causeway/shared';
import { JwtStrategy } from '../src/auth/jwt.strategy';
import { VersionedCache } from '../src/common/cache/versioned-cache.service';
import { RunLeases } from '../src/database/run-leases';
import { ImportsService } from '../src/imports/imports.service';
import { HEADER, VIN, csv, row } from './fixtures/csv/scan-csv';
import { freshPostgresDatabase, onPostgres } from './utils/pg-database';
import { bearer, createTestApp, registerMember, registerOwner, type TestApp } from './utils/test-app';

// s3rver (registry: s3rver) is a fake S3 server for tests; its types are not published.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const S3rver = require('s3rver') as new (options: Record<string, unknown>) => { run(): Promise<AddressInfo>; close(): Promise<void> };

const TARN = { make: 'Halden', model: 'Tarn', engine: '1.6 T' };
const TOKEN_IN_LINK = /\/estimate\/([A-Za-z0-9_-]{43})$/;
/** The prior strength α the app runs with (PRIOR_STRENGTH default). */
const ALPHA = 10;

/**
 * Two app instances on one PostgreSQL, as behind a load balancer: each with its own DATA_DIR and
 * its own memory (its own cache, its own throttler object), sharing only the database, the object
 * store (a fake S3 on loopback) and the token secret. Every request below goes to whichever
 * instance the test names; nothing may depend on the two being one process.
 *
 * Runs only on PostgreSQL (scripts/pg-test.sh): the embedded SQLite is one instance by design.
 * Both instances live in this one Node process; passport keeps one "jwt" strategy per process, so
 * token checks run through the strategy of the instance booted last — on the same database.
 */
(onPostgres() ? describe : describe.skip)('two instances on one PostgreSQL (e2e)', () => {
  const SECRET = 'two-instances-shared-secret-0123456789abcdef';
  const BUCKET = 'causeway-shared';
  let db: { url: string; drop: () => Promise<void> };
  let s3dir: string;
  let s3: { run(): Promise<AddressInfo>; close(): Promise<void> };
  let a: TestApp;
  let b: TestApp;
  let owner: AuthResponse;
  let tech: AuthResponse;
  let contributor: AuthResponse;
  let vehicle: VehicleDto;

  const openJob = async (on: TestApp) =>
    (await on.http().post('/api/jobs').set(...bearer(tech)).send({ vehicleId: vehicle.id, complaint: 'Warning lamp', codes: [{ code: 'P0171', status: 'stored' }] }).expect(201)).body as JobDto;

  beforeAll(async () => {
    s3dir = mkdtempSync(join(tmpdir(), 'causeway-s3-'));
    s3 = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory: s3dir, configureBuckets: [{ name: BUCKET }] });
    const { port } = await s3.run();
    const shared = {
      JWT_SECRET: SECRET,
      PUBLIC_URL: 'https://causeway.example',
      PUBLIC_THROTTLE_LIMIT: '1000',
      STORAGE_DRIVER: 's3',
      S3_BUCKET: BUCKET,
      S3_ENDPOINT: `http://127.0.0.1:${port}`,
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
      S3_FORCE_PATH_STYLE: 'true',
    };
    // Both start at the same moment on one empty database (each with its own DATA_DIR): one
    // migrates and seeds while the other waits for the startup lock, then finds both done.
    db = await freshPostgresDatabase(process.env.DATABASE_URL!);
    [a, b] = await Promise.all([createTestApp({ ...shared, SEED_DEMO: 'true', DATABASE_URL: db.url }), createTestApp({ ...shared, SEED_DEMO: 'true', DATABASE_URL: db.url })]);
    expect(b.dataDir).not.toBe(a.dataDir);
    owner = await registerOwner(a);
    tech = await registerMember(b, owner);
    contributor = await registerMember(a, owner, 'contributor');
    vehicle = (await b.http().post('/api/vehicles').set(...bearer(tech)).send({ vin: 'YHATR6G24KH104382', ...TARN, plate: 'KX19 HTN' }).expect(201)).body;
  });
  afterAll(async () => {
    await b?.close();
    await a?.close();
    await db?.drop();
    await s3?.close().catch(() => undefined);
    rmSync(s3dir, { recursive: true, force: true });
  });

  it('started together, they migrated once and seeded once', async () => {
    const [{ n: migrations }] = await b.query<{ n: string }>('SELECT COUNT(*) AS n FROM migrations');
    const [{ n: names }] = await b.query<{ n: string }>('SELECT COUNT(DISTINCT name) AS n FROM migrations');
    expect(Number(migrations)).toBe(Number(names));
    // One demo administrator, one catalogue entry per code and make.
    const [{ n: admins }] = await b.query<{ n: string }>(`SELECT COUNT(*) AS n FROM users WHERE "emailNormalized" = 'admin@causeway.test'`);
    expect(Number(admins)).toBe(1);
    const [{ n: dup }] = await b.query<{ n: string }>('SELECT COUNT(*) AS n FROM (SELECT code, make FROM dtc_codes GROUP BY code, make HAVING COUNT(*) > 1) d');
    expect(Number(dup)).toBe(0);
    // A token made by one instance is good on the other (the same JWT_SECRET).
    await a.http().get('/api/shops/mine').set(...bearer(tech)).expect(200);
    await b.http().get('/api/shops/mine').set(...bearer(owner)).expect(200);
  });

  it('throttling counts the hits on both instances together', async () => {
    // The public estimate routes allow PUBLIC_THROTTLE_LIMIT a minute per client; 4 here.
    process.env.PUBLIC_THROTTLE_LIMIT = '4';
    try {
      const unknown = (c: string) => `/api/public/estimates/${c.repeat(43)}`;
      const remaining: string[] = [];
      for (const [i, on] of [a, b, a, b].entries()) {
        const res = await on.http().get(unknown('ABCD'[i])).expect(404);
        remaining.push(res.headers['x-ratelimit-remaining']);
      }
      // One count for both: 3, 2, 1, 0 left — two counts in two memories would say 3, 3, 2, 2.
      expect(remaining).toEqual(['3', '2', '1', '0']);
      const refusedOnA = await a.http().get(unknown('E')).expect(429);
      const refusedOnB = await b.http().get(unknown('F')).expect(429);
      // RFC 6585 §4 / RFC 9110 §10.2.3: Retry-After in whole seconds, within the one-minute window.
      for (const res of [refusedOnA, refusedOnB]) {
        expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
        expect(Number(res.headers['retry-after'])).toBeLessThanOrEqual(60);
      }
    } finally {
      process.env.PUBLIC_THROTTLE_LIMIT = '1000';
    }
  });

  it('an estimate link made on A opens and takes answers on B, and A sees them', async () => {
    const job = await openJob(a);
    const created = (await a.http().post(`/api/jobs/${job.id}/estimates`).set(...bearer(tech)).send({ message: 'Call us with any question.' }).expect(201)).body as CreateEstimateResponse;
    expect(created.link.startsWith('https://causeway.example/')).toBe(true);
    const token = TOKEN_IN_LINK.exec(created.link)![1];
    const pub = (await b.http().get(`/api/public/estimates/${token}`).expect(200)).body as PublicEstimateDto;
    expect(pub.stages).toEqual(created.estimate.stages);
    await b.http().post(`/api/public/estimates/${token}/answers`).send({ stageIndex: 0, decision: 'approved', name: 'Priya Anand' }).expect(201);
    const onA = (await a.http().get(`/api/jobs/${job.id}/estimates`).set(...bearer(owner)).expect(200)).body as Array<{ answers: Array<{ stageIndex: number; decision: string; name: string | null }> }>;
    expect(onA[0].answers).toEqual([expect.objectContaining({ stageIndex: 0, decision: 'approved', name: 'Priya Anand' })]);
  });

  it('an import committed on A shows on B with its progress, history and jobs', async () => {
    const file = csv(HEADER, [row('2025-03-14 09:30', VIN.honda, 12000, 'P0171'), row('2025-03-14 09:30', VIN.honda, 12000, 'P0420', 'pending')]);
    const report = (await a.http().post('/api/imports').query({ dryRun: 'false' }).set(...bearer(owner)).attach('file', file, 'bay-2.csv').expect(200)).body as ImportReport;
    expect(report).toMatchObject({ committed: true, accepted: 2, createdVehicles: 1, createdJobs: 1, createdCodes: 2 });
    const history = (await b.http().get('/api/imports').set(...bearer(owner)).expect(200)).body as { items: ImportDto[] };
    expect(history.items.map((i) => i.id)).toContain(report.importId);
    const one = (await b.http().get(`/api/imports/${report.importId}`).set(...bearer(owner)).expect(200)).body as ImportDto;
    expect(one).toMatchObject({ status: 'committed', progress: { phase: 'done', bytesProcessed: file.length, bytesTotal: file.length, rowsProcessed: 2 } });
    const jobs = (await b.http().get('/api/jobs').query({ pageSize: 100 }).set(...bearer(owner)).expect(200)).body as { items: Array<{ vehicle: { vin: string } }> };
    expect(jobs.items.some((j) => j.vehicle.vin === VIN.honda)).toBe(true);
  });

  it('an import running on A stays running when another instance starts; once its owner is gone, it reads as interrupted', async () => {
    const shopId = owner.user.shop!.id;
    const id = '0190f0a0-0000-7000-8000-000000000001';
    await a.query(`INSERT INTO imports (id, "shopId", "fileName", "fileBytes", status, "validOnly", phase) VALUES (?, ?, 'long.csv', 1000, 'running', false, 'reading')`, [id, shopId]);
    const release = await a.app.get(RunLeases).hold(`import:${id}`);
    // A third instance starts (a rolling deploy) while A still runs the import.
    const c = await createTestApp({ JWT_SECRET: SECRET, DATABASE_URL: db.url });
    await c.app.close();
    passport.use(b.app.get(JwtStrategy)); // the closed instance's strategy was the process's last
    expect((await b.http().get(`/api/imports/${id}`).set(...bearer(owner)).expect(200)).body.status).toBe('running');
    // A stops without finishing it (its lease goes, as when its connection ends); the next instance to start finds it abandoned.
    await release();
    await b.app.get(ImportsService).onModuleInit();
    const after = (await a.http().get(`/api/imports/${id}`).set(...bearer(owner)).expect(200)).body as ImportDto;
    expect(after).toMatchObject({ status: 'interrupted', progress: { phase: 'reading' } });
  });

  it('B’s cached fix path changes as soon as an outcome is recorded through A', async () => {
    const ranking = async () => (await b.http().get('/api/codes/P0171/causes').query(TARN).set(...bearer(tech)).expect(200)).body as CauseRankingDto;
    const fixPath = async () => (await b.http().get('/api/codes/P0171/fix-path').query(TARN).set(...bearer(tech)).expect(200)).body as FixPathDto;
    const before = await ranking();
    const pathBefore = await fixPath();
    expect(await fixPath()).toEqual(pathBefore); // served from B's cache
    const cached = (b.app.get(VersionedCache) as unknown as { entries: Map<string, unknown> }).entries;
    expect([...cached.keys()].some((k) => k.startsWith('knowledge|'))).toBe(true);

    // On A: the MAF sensor clears the code; closing as resolved records the outcome.
    const job = await openJob(a);
    await a.http().post(`/api/jobs/${job.id}/steps`).set(...bearer(tech)).send({ code: 'P0171', kind: 'replace', parts: ['maf-sensor'], result: 'cleared', actualCostMinor: 16400 }).expect(201);
    await a.http().post(`/api/jobs/${job.id}/close`).set(...bearer(tech)).send({ resolution: 'resolved', verificationPassed: true }).expect(200);

    // B answers from the new knowledge at once: Dirichlet posterior mean p_i = (α·w_i + n_i) / (α + N)
    // (product.md §2; domain-reference §6 "Learning from outcomes"), one more outcome for the MAF sensor.
    const after = await ranking();
    const N = before.totalEvidence;
    expect(after.totalEvidence).toBeCloseTo(N + 1, 10);
    for (const c of before.causes) {
      const n = c.evidence + (c.key === 'maf-sensor' ? 1 : 0);
      expect({ key: c.key, p: after.causes.find((x) => x.key === c.key)!.probability }).toEqual({ key: c.key, p: expect.closeTo((ALPHA * c.priorWeight + n) / (ALPHA + N + 1), 10) });
    }
    const pathAfter = await fixPath();
    const maf = (fp: FixPathDto) => fp.causes.find((c) => c.key === 'maf-sensor')!.probability;
    expect(maf(pathAfter)).toBeGreaterThan(maf(pathBefore));
  });

  it('a photo uploaded through A is served by B from the shared object store', async () => {
    const report = (await a.http().post('/api/field-reports').set(...bearer(contributor)).send({ kind: 'confirmed-fix', payload: { code: 'P0171', ...TARN, part: 'maf-sensor' } }).expect(201)).body as FieldReportDto;
    const png = await sharp({ create: { width: 24, height: 16, channels: 3, background: '#225588' } }).png().toBuffer();
    const [att] = (await a.http().post(`/api/field-reports/${report.id}/attachments`).set(...bearer(contributor)).attach('files', png, { filename: 'maf.png', contentType: 'image/png' }).expect(201)).body as AttachmentDto[];
    const served = await b
      .http()
      .get(att.url)
      .set(...bearer(contributor))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(await sharp(served.body as Buffer).metadata()).toMatchObject({ format: 'png', width: 24, height: 16 });
  });
});
