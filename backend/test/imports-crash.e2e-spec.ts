/**
 * Crash safety of the scan-tool import: the real server runs as a child process on an SQLite file,
 * is killed with SIGKILL in the middle of the one transaction that writes a large import, and is
 * started again on the same DATA_DIR. SQLite's own check must pass (PRAGMA integrity_check and
 * foreign_key_check, sqlite.org/pragma.html) and the batch must be all there or not there at all.
 *
 * The server is built for the test by transpiling backend/src and shared/src file by file with the
 * TypeScript compiler's transpileModule and the backend tsconfig (as ts-jest does for the other
 * suites), into a temporary folder; packages resolve from the repository's node_modules.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { dirname, join, relative } from 'node:path';
import ts from 'typescript';
import { vinCheckDigit, type ImportDto, type ImportReport } from '@causeway/shared';

/** The part of better-sqlite3 (no type package installed) this test uses. */
interface SqliteDb {
  prepare(sql: string): { get(...params: unknown[]): unknown };
  pragma(source: string, options?: { simple: boolean }): unknown;
  close(): void;
}
const Database = require('better-sqlite3') as new (file: string, options?: { readonly?: boolean }) => SqliteDb;

const repo = join(__dirname, '..', '..');
const ROWS = 120_000;
const CODES_PER_SCAN = 5;

function* tsFiles(dir: string): Generator<string> {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) yield* tsFiles(path);
    else if (name.endsWith('.ts') && !name.endsWith('.spec.ts') && !name.endsWith('.d.ts')) yield path;
  }
}

/** Transpiles backend/src and shared/src into `out`; returns the path of main.js. */
function buildServer(out: string): string {
  const config = ts.readConfigFile(join(repo, 'backend', 'tsconfig.json'), ts.sys.readFile);
  const { options } = ts.parseJsonConfigFileContent(config.config, ts.sys, join(repo, 'backend'));
  const compilerOptions: ts.CompilerOptions = { ...options, noEmit: false, sourceMap: false, declaration: false, paths: undefined, baseUrl: undefined };
  const sharedIndex = join(out, 'shared', 'src', 'index.js');
  for (const root of [join(repo, 'backend', 'src'), join(repo, 'shared', 'src')]) {
    for (const file of tsFiles(root)) {
      const target = join(out, relative(repo, file)).replace(/\.ts$/, '.js');
      let js = ts.transpileModule(readFileSync(file, 'utf8'), { compilerOptions, fileName: file }).outputText;
      js = js.split('require("@causeway/shared")').join(`require(${JSON.stringify(sharedIndex)})`);
      mkdirSync(dirname(target), { recursive: true });
      writeFileSync(target, js);
    }
  }
  return join(out, 'backend', 'src', 'main.js');
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      srv.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
    srv.on('error', reject);
  });
}

interface Server {
  child: ChildProcess;
  base: string;
  exited: Promise<void>;
}

async function startServer(main: string, dataDir: string): Promise<Server> {
  const port = await freePort();
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    DATA_DIR: dataDir,
    PORT: String(port),
    SEED_DEMO: 'false',
    LOG_LEVEL: 'silent',
    BCRYPT_ROUNDS: '4',
    THROTTLE_LIMIT: '1000000',
    AUTH_THROTTLE_LIMIT: '1000',
    SEEDS_DIR: join(repo, 'seeds'),
    CLIENT_DIST: join(dataDir, 'no-client'),
    NODE_PATH: [join(repo, 'backend', 'node_modules'), join(repo, 'node_modules')].join(':'),
  };
  // Always the embedded SQLite: this is its crash safety.
  delete env.DATABASE_URL;
  delete env.DATABASE_FILE;
  const child = spawn(process.execPath, [main], { env, stdio: ['ignore', 'ignore', 'pipe'] });
  let stderr = '';
  child.stderr?.on('data', (d: Buffer) => (stderr += d.toString()));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const base = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null || child.signalCode !== null) throw new Error(`the server exited: ${stderr.slice(-2000)}`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) return { child, base, exited };
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`the server did not answer within 60 s: ${stderr.slice(-2000)}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** A North-American VIN whose check digit the shared 49 CFR 565.15(c) code computes (tested against the worked examples in shared/). */
function vinFor(n: number): string {
  const alphabet = '0123456789ABCDEFGHJKLMNPRSTUVWXYZ';
  let x = (n * 2654435761) >>> 0;
  const chars = ['1', 'H', 'G'];
  for (let i = 3; i < 17; i++) {
    x = (Math.imul(x, 1103515245) + 12345) >>> 0;
    chars.push(alphabet[x % alphabet.length]);
  }
  chars[8] = '0'; // position 9 weighs nothing in the sum, so the digit is computed from the others
  chars[8] = vinCheckDigit(chars.join(''));
  return chars.join('');
}

function bigFile(rows: number): { file: Buffer; vins: number; jobs: number } {
  const codes = ['P0171', 'P0300', 'P0420', 'P0455', 'P0101', 'P0128', 'P0135', 'P0401'];
  const lines = ['Date,VIN,Odometer (km),Module,DTC,Status,FF: RPM'];
  const scans = Math.ceil(rows / CODES_PER_SCAN);
  for (let s = 0; s < scans; s++) {
    const vin = vinFor(Math.floor(s / 2));
    const day = s % 2 ? '2025-06-02' : '2025-03-14';
    for (let c = 0; c < CODES_PER_SCAN; c++) lines.push(`${day} 09:${10 + c}:00,${vin},${40000 + s},ECM,${codes[(s + c) % codes.length]},stored,${800 + c}`);
  }
  return { file: Buffer.from(lines.join('\n') + '\n'), vins: Math.ceil(scans / 2), jobs: scans };
}

// SQLite-specific (the file's integrity_check after SIGKILL): skipped on the PostgreSQL pass (scripts/pg-test.sh).
(process.env.DATABASE_URL?.startsWith('postgres') ? describe.skip : describe)('scan-tool import: crash in the middle of the commit (e2e, child process)', () => {
  let out: string;
  let dataDir: string;
  let main: string;
  let server: Server | null = null;
  let token: string;
  let shopId: string;
  const big = bigFile(ROWS);

  beforeAll(() => {
    out = mkdtempSync(join(tmpdir(), 'causeway-crash-build-'));
    dataDir = mkdtempSync(join(tmpdir(), 'causeway-crash-data-'));
    const started = Date.now();
    main = buildServer(out);
    // Reported, not asserted: how long building the server for this test takes.
    console.log(`imports-crash: transpiled backend and shared in ${Date.now() - started} ms`);
  });

  afterAll(async () => {
    if (server && server.child.exitCode === null && server.child.signalCode === null) {
      server.child.kill('SIGTERM');
      await server.exited;
    }
    rmSync(out, { recursive: true, force: true });
    rmSync(dataDir, { recursive: true, force: true });
  });

  const api = (path: string, init: RequestInit = {}) => fetch(`${server!.base}${path}`, { ...init, headers: { authorization: `Bearer ${token}`, ...(init.headers ?? {}) } });
  const upload = (file: Buffer, id: string) => {
    const form = new FormData();
    form.append('file', new Blob([file], { type: 'text/csv' }), 'big.csv');
    return api(`/api/imports?dryRun=false&id=${id}`, { method: 'POST', body: form });
  };
  const shopCounts = () => {
    const db = new Database(join(dataDir, 'causeway.sqlite'), { readonly: true });
    try {
      const n = (sql: string) => Number((db.prepare(sql).get(shopId) as { n: number }).n);
      return {
        integrity: db.pragma('integrity_check', { simple: true }),
        foreignKeys: db.pragma('foreign_key_check') as unknown[],
        vehicles: n('SELECT COUNT(*) AS n FROM vehicles WHERE shopId = ?'),
        jobs: n('SELECT COUNT(*) AS n FROM jobs WHERE shopId = ?'),
        codes: n('SELECT COUNT(*) AS n FROM job_codes c JOIN jobs j ON j.id = c.jobId WHERE j.shopId = ?'),
        days: n('SELECT COUNT(*) AS n FROM import_days WHERE shopId = ?'),
      };
    } finally {
      db.close();
    }
  };

  it('leaves the database whole and the batch all there or not at all, and the same file commits after the restart', async () => {
    server = await startServer(main, dataDir);
    const reg = await fetch(`${server.base}/api/auth/register`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: `crash.${process.pid}@example.test`, password: 'correct-horse-42', displayName: 'Crash test', shop: { name: 'Crash Garage (invented)', currency: 'GBP', locale: 'en-GB', labourRateMinor: 9500, taxRateBp: 2000, distanceUnit: 'km' } }),
    });
    expect(reg.status).toBe(201);
    const auth = (await reg.json()) as { accessToken: string; user: { shop: { id: string } } };
    token = auth.accessToken;
    shopId = auth.user.shop.id;

    // Data written before the crash must come through untouched.
    const small = Buffer.from('Date,VIN,DTC\n2025-01-10 08:00,1HGCM82633A004352,P0171\n');
    const first = (await (await upload(small, randomUUID())).json()) as ImportReport;
    expect(first.committed).toBe(true);
    const before = shopCounts();
    expect(before).toMatchObject({ integrity: 'ok', vehicles: 1, jobs: 1, codes: 1, days: 1 });

    // Upload the large file, poll its progress, and kill the server once it is writing: either the
    // poll says so, or the poll stops being answered after the rows were read (the one synchronous
    // transaction holds the event loop).
    let killedIn: 'writing' | 'reading' | null = null;
    let importId = '';
    const attempts: string[] = [];
    for (let attempt = 0; attempt < 3 && killedIn !== 'writing'; attempt++) {
      importId = randomUUID();
      const pending = upload(big.file, importId).catch(() => null);
      let lastRows = 0;
      for (;;) {
        const started = Date.now();
        const answer = await Promise.race([
          api(`/api/imports/${importId}`).then(async (r) => (r.ok ? ((await r.json()) as ImportDto) : null)),
          new Promise<'stalled'>((r) => setTimeout(() => r('stalled'), 400)),
        ]).catch(() => null);
        const stalledAfterReading = answer === 'stalled' && lastRows >= ROWS * 0.5;
        if ((answer && answer !== 'stalled' && answer.progress.phase === 'writing') || stalledAfterReading) {
          server.child.kill('SIGKILL');
          attempts.push(stalledAfterReading ? 'killed when the progress poll stalled after the rows were read' : 'killed when the poll said "writing"');
          break;
        }
        if (answer && answer !== 'stalled') {
          expect(answer.status).toBe('running');
          lastRows = answer.progress.rowsProcessed;
        }
        if (Date.now() - started < 20) await new Promise((r) => setTimeout(r, 20));
      }
      await server.exited;
      await pending;
      server = await startServer(main, dataDir);
      const after = (await (await api(`/api/imports/${importId}`)).json()) as ImportDto;
      killedIn = after.status === 'interrupted' ? (after.progress.phase === 'writing' ? 'writing' : 'reading') : null;
      // SIGKILL came after the commit: everything is there, and the import says so.
      if (after.status === 'committed') {
        killedIn = 'writing';
        expect(shopCounts()).toMatchObject({ vehicles: before.vehicles + big.vins, codes: before.codes + ROWS });
      }
    }
    // Reported, not asserted: how the kill was timed.
    console.log(`imports-crash: ${attempts.join('; ')}; the import was then ${killedIn === 'writing' ? 'in its write transaction' : 'reading'}`);
    expect(killedIn).toBe('writing');

    const crashed = shopCounts();
    expect(crashed.integrity).toBe('ok');
    expect(crashed.foreignKeys).toEqual([]);
    const added = { vehicles: crashed.vehicles - before.vehicles, jobs: crashed.jobs - before.jobs, codes: crashed.codes - before.codes, days: crashed.days - before.days };
    const all = { vehicles: big.vins, jobs: big.jobs, codes: ROWS, days: big.jobs };
    const none = { vehicles: 0, jobs: 0, codes: 0, days: 0 };
    expect([none, all]).toContainEqual(added);
    console.log(`imports-crash: after the restart the batch is ${added.codes === 0 ? 'not there at all' : 'all there'}`);
    const history = (await (await api(`/api/imports/${importId}`)).json()) as ImportDto;
    expect(history.status).toBe(added.codes === 0 ? 'interrupted' : 'committed');

    // After the restart the same file goes in whole (or, if it had committed, changes nothing).
    const again = (await (await upload(big.file, randomUUID())).json()) as ImportReport;
    expect(again.committed).toBe(true);
    expect(shopCounts()).toMatchObject({ integrity: 'ok', ...Object.fromEntries(Object.entries(all).map(([k, v]) => [k, before[k as keyof typeof all] + v])) });
  }, 240_000);
});
