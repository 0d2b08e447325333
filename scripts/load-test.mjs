// `npm run test:load`: the built server (backend/dist) on a temporary DATA_DIR with the demo
// data, on loopback, under 200 connections for 30 s of mixed reads and writes: the code page,
// an ad-hoc fix path, job steps and import previews (50 connections each, all at once).
// Passes with 0 errors, 0 non-2xx answers and no database-busy failure in the server's log;
// prints p50 / p99 latency per request kind and the server's peak memory (RSS).
// Options: --duration <s> (30), --connections <n> (200, split over the four kinds).
import autocannon from 'autocannon';
import { spawn, spawnSync } from 'node:child_process';
import { createWriteStream, existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const arg = (name, fallback) => {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
};
const DURATION = arg('duration', 30);
const CONNECTIONS = arg('connections', 200);
const main = join(root, 'backend', 'dist', 'main.js');
if (!existsSync(main)) {
  console.error('backend/dist/main.js is missing: run `npm run test:load` (it builds first)');
  process.exit(2);
}

const freePort = () =>
  new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
  });

// ---------------------------------------------------------------- the server
const dataDir = mkdtempSync(join(tmpdir(), 'causeway-load-'));
const logFile = join(dataDir, 'server.log');
const log = createWriteStream(logFile);
const port = await freePort();
const base = `http://127.0.0.1:${port}`;
const server = spawn(process.execPath, [main], {
  env: {
    ...process.env,
    PORT: String(port),
    DATA_DIR: dataDir,
    SEED_DEMO: 'true',
    // Warnings and errors only: every failed request and every database error is logged at error level.
    LOG_LEVEL: 'warn',
    THROTTLE_LIMIT: '100000000',
    AUTH_THROTTLE_LIMIT: '1000',
    CLIENT_DIST: join(dataDir, 'no-client'),
    // No mail is sent under load; a closed port makes any attempt fail fast.
    SMTP_PORT: '9',
  },
  stdio: ['ignore', 'pipe', 'pipe'],
});
server.stdout.pipe(log);
server.stderr.pipe(log);
let stopped = false;
const stop = () => {
  if (stopped) return;
  stopped = true;
  server.kill('SIGTERM');
};
process.on('SIGINT', () => {
  stop();
  process.exit(130);
});

const api = async (method, path, body, headers = {}) => {
  const res = await fetch(`${base}${path}`, { method, headers: { 'content-type': 'application/json', ...headers }, body: body === undefined ? undefined : JSON.stringify(body) });
  const text = await res.text();
  if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${text.slice(0, 300)}`);
  return text ? JSON.parse(text) : null;
};

async function waitHealthy() {
  for (let i = 0; i < 600; i += 1) {
    if (server.exitCode !== null) throw new Error(`the server exited with ${server.exitCode}; see ${logFile}`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      // still starting
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error('the server did not become healthy in 120 s');
}

const percentileRow = (name, r, connections) => ({
  kind: name,
  connections,
  requests: r.requests.total,
  'req/s': Math.round(r.requests.average),
  'p50 ms': r.latency.p50,
  'p99 ms': r.latency.p99,
  'max ms': r.latency.max,
  '2xx': r['2xx'],
  'non-2xx': r.non2xx,
  errors: r.errors,
  timeouts: r.timeouts,
});

let exitCode = 1;
let peakRss = 0;
try {
  await waitHealthy();
  // The demo technician of the invented Kestrel Lane Garage (README: demo accounts).
  const login = await api('POST', '/api/auth/login', { email: 'technician@causeway.test', password: 'demo-pass-2026' });
  const auth = { authorization: `Bearer ${login.accessToken}` };

  // Open jobs for the step writes: one per step connection, each on a demo vehicle, code P0171.
  const vehicles = (await api('GET', '/api/vehicles?pageSize=100', undefined, auth)).items;
  if (vehicles.length === 0) throw new Error('the demo data has no vehicles');
  const stepConnections = Math.max(1, Math.floor(CONNECTIONS / 4));
  const jobs = [];
  for (let i = 0; i < stepConnections; i += 1) {
    const v = vehicles[i % vehicles.length];
    const job = await api('POST', '/api/jobs', { vehicleId: v.id, complaint: 'Load test: warning lamp on', codes: [{ code: 'P0171', status: 'stored' }] }, auth);
    jobs.push(job.id);
  }
  // Parts to check: the possible causes of P0171 in the knowledge base.
  const parts = [...new Set((await api('GET', '/api/causes?code=P0171', undefined, auth)).map((c) => c.partKey))];
  if (parts.length === 0) throw new Error('P0171 has no possible causes in the demo knowledge base');

  // A small scan-tool export, previewed only (dryRun=true).
  const csv = ['VIN,DTC,Date,Odometer,Status', ...vehicles.slice(0, 3).flatMap((v, i) => [`${v.vin},P0171,2025-03-1${i} 09:30,5${i}000,stored`, `${v.vin},P0300,2025-03-1${i} 09:31,5${i}000,pending`])].join('\r\n');
  const boundary = '----causeway-load-test-boundary';
  const multipart = Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="scan.csv"\r\nContent-Type: text/csv\r\n\r\n${csv}\r\n--${boundary}--\r\n`);

  const fixPath = JSON.stringify({
    causes: [
      { key: 'leak', probability: 0.4, replaceCost: 60 },
      { key: 'maf', probability: 0.3, replaceCost: 180, checkCost: 25 },
      { key: 'pump', probability: 0.2, replaceCost: 450, teardown: 'tank' },
      { key: 'o2', probability: 0.1, replaceCost: 150 },
    ],
    teardowns: { tank: 120 },
    verificationCost: 30,
    unlistedProbability: 0,
  });

  // Each kind is probed once first, so a mistake in the set-up is not reported as load errors.
  await api('GET', '/api/codes/P0456/fix-path?make=Halden&model=Tarn', undefined, auth);
  await api('POST', '/api/fix-paths', JSON.parse(fixPath), auth);
  await api('POST', `/api/jobs/${jobs[0]}/steps`, { code: 'P0171', kind: 'check', parts: [parts[0]], result: 'not-at-fault', actualCostMinor: 950 }, auth);
  {
    const res = await fetch(`${base}/api/imports?dryRun=true`, { method: 'POST', headers: { ...auth, 'content-type': `multipart/form-data; boundary=${boundary}` }, body: multipart });
    if (!res.ok) throw new Error(`import preview answered ${res.status}: ${(await res.text()).slice(0, 300)}`);
  }

  let stepSeq = 0;
  const kinds = [
    { name: 'code page GET /api/codes/P0456/fix-path', requests: [{ method: 'GET', path: '/api/codes/P0456/fix-path?make=Halden&model=Tarn', headers: auth }] },
    { name: 'fix path POST /api/fix-paths', requests: [{ method: 'POST', path: '/api/fix-paths', headers: { ...auth, 'content-type': 'application/json' }, body: fixPath }] },
    {
      name: 'job step POST /api/jobs/:id/steps',
      requests: [
        {
          method: 'POST',
          path: `/api/jobs/${jobs[0]}/steps`,
          headers: { ...auth, 'content-type': 'application/json' },
          // Each request goes to the next open job and checks the next part (not at fault): always a valid step.
          setupRequest: (req) => {
            const n = stepSeq++;
            return { ...req, path: `/api/jobs/${jobs[n % jobs.length]}/steps`, body: JSON.stringify({ code: 'P0171', kind: 'check', parts: [parts[Math.floor(n / jobs.length) % parts.length]], result: 'not-at-fault', actualCostMinor: 950 }) };
          },
        },
      ],
    },
    { name: 'import preview POST /api/imports?dryRun=true', requests: [{ method: 'POST', path: '/api/imports?dryRun=true', headers: { ...auth, 'content-type': `multipart/form-data; boundary=${boundary}` }, body: multipart }] },
  ];

  const per = Math.max(1, Math.floor(CONNECTIONS / kinds.length));
  console.log(`Load: ${per * kinds.length} connections (${per} per kind) for ${DURATION} s on ${base}; ${jobs.length} open jobs, ${parts.length} parts checked in turn.`);
  const monitor = setInterval(() => {
    const r = spawnSync('ps', ['-o', 'rss=', '-p', String(server.pid)], { encoding: 'utf8' });
    peakRss = Math.max(peakRss, Number(r.stdout.trim()) * 1024 || 0);
  }, 250);
  const results = await Promise.all(kinds.map((k) => autocannon({ url: base, connections: per, duration: DURATION, timeout: 30, requests: k.requests })));
  clearInterval(monitor);

  // The server's log: failed requests and database-busy errors (SQLite "database is locked", PostgreSQL lock timeouts).
  await new Promise((r) => setTimeout(r, 300));
  const logText = readFileSync(logFile, 'utf8');
  const busy = (logText.match(/SQLITE_BUSY|database is locked|lock timeout|could not obtain lock|deadlock detected/gi) ?? []).length;
  const serverErrors = logText.split('\n').filter((l) => /"level":(50|60)/.test(l)).length;

  const rows = kinds.map((k, i) => percentileRow(k.name, results[i], per));
  const total = results.reduce(
    (acc, r) => ({ requests: acc.requests + r.requests.total, rps: acc.rps + r.requests.average, ok: acc.ok + r['2xx'], non2xx: acc.non2xx + r.non2xx, errors: acc.errors + r.errors, timeouts: acc.timeouts + r.timeouts }),
    { requests: 0, rps: 0, ok: 0, non2xx: 0, errors: 0, timeouts: 0 },
  );
  // Percentiles of separate runs do not combine: the 'all' row gives the worst kind's p50 and p99 as bounds.
  rows.push({
    kind: 'all (latency: worst kind)',
    connections: per * kinds.length,
    requests: total.requests,
    'req/s': Math.round(total.rps),
    'p50 ms': Math.max(...results.map((r) => r.latency.p50)),
    'p99 ms': Math.max(...results.map((r) => r.latency.p99)),
    'max ms': Math.max(...results.map((r) => r.latency.max)),
    '2xx': total.ok,
    'non-2xx': total.non2xx,
    errors: total.errors,
    timeouts: total.timeouts,
  });
  console.table(rows);
  const statuses = {};
  for (const r of results) for (const [code, { count }] of Object.entries(r.statusCodeStats ?? {})) statuses[code] = (statuses[code] ?? 0) + Number(count);
  console.log(`Status codes: ${JSON.stringify(statuses)}`);
  console.log(`Server: peak RSS ${(peakRss / 1048576).toFixed(1)} MiB; errors logged ${serverErrors}; database-busy failures ${busy}.`);
  const failed = total.non2xx + total.errors + total.timeouts + busy + serverErrors;
  if (failed > 0) {
    console.error(`FAILED: ${total.non2xx} non-2xx, ${total.errors} errors, ${total.timeouts} timeouts, ${busy} database-busy, ${serverErrors} server errors. Server log: ${logFile}`);
    const sample = logText.split('\n').filter((l) => /"level":(50|60)|SQLITE_BUSY|database is locked/.test(l)).slice(0, 3);
    for (const l of sample) console.error(l.slice(0, 1000));
  } else {
    console.log('PASSED: 0 errors, 0 non-2xx, no database-busy failures.');
    exitCode = 0;
  }
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
} finally {
  stop();
  await new Promise((r) => setTimeout(r, 500));
  // Keep the log of a failed run for inspection; remove everything after a pass.
  if (exitCode === 0) rmSync(dataDir, { recursive: true, force: true });
}
process.exit(exitCode);
