// `npm run bench`: every benchmark beside a bare baseline measured in the same run, as
// a table, also written to data/bench/results.json. Speed goals live here, never in tests.
// The machine is small and noisy: each figure is a ratio against its baseline.
import autocannon from 'autocannon';
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const requireBackend = createRequire(join(root, 'backend', 'package.json'));
const requireFrontend = createRequire(join(root, 'frontend', 'package.json'));
const shared = requireBackend(join(root, 'shared', 'dist', 'cjs', 'index.js'));
const Database = requireBackend('better-sqlite3');

const quick = process.argv.includes('--quick');
const duration = quick ? 4 : 10;
const results = [];
const record = (row) => {
  results.push(row);
  const fmt = (v) => (typeof v === 'number' ? (Math.abs(v) >= 100 ? v.toFixed(0) : v.toFixed(2)) : (v ?? ''));
  console.log(`${row.benchmark.padEnd(44)} ${fmt(row.value).toString().padStart(10)} ${String(row.unit).padEnd(8)} baseline ${fmt(row.baseline).toString().padStart(10)}  ratio ${fmt(row.ratio).toString().padStart(6)}  goal ${row.goal}  ${row.met === undefined ? '' : row.met ? 'MET' : 'NOT MET'}`);
};
const percentile = (xs, p) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))];
};

// ---------------------------------------------------------------- fix path timings
function timeIt(fn, runs) {
  for (let i = 0; i < Math.min(30, runs); i += 1) fn(i);
  const times = [];
  for (let i = 0; i < runs; i += 1) {
    const t0 = performance.now();
    fn(i);
    times.push(performance.now() - t0);
  }
  return { p50: percentile(times, 50), p95: percentile(times, 95) };
}
{
  const opts = { teardowns: 3, checks: true, escalation: true };
  const inputs12 = Array.from({ length: 20 }, (_, i) => shared.randomPlanInput(1000 + i, 12, opts));
  const inputs14 = Array.from({ length: 6 }, (_, i) => shared.randomPlanInput(2000 + i, 14, opts));
  const inputs200 = Array.from({ length: 40 }, (_, i) => shared.randomPlanInput(3000 + i, 200, opts));
  // Bare baseline: sorting the same causes by p/c, the textbook rule without teardowns or checks.
  const sortBaseline = (input) => [...input.causes].sort((a, b) => b.probability / b.replaceCost - a.probability / a.replaceCost);
  const t12 = timeIt((i) => shared.planFixPath(inputs12[i % inputs12.length]), quick ? 40 : 100);
  const b12 = timeIt((i) => sortBaseline(inputs12[i % inputs12.length]), 200);
  record({ benchmark: 'fix path, exact, 12 causes (p95)', value: t12.p95, unit: 'ms', baseline: b12.p95, ratio: t12.p95 / b12.p95, goal: '< 100 ms', met: t12.p95 < 100 });
  const t14 = timeIt((i) => shared.planFixPath(inputs14[i % inputs14.length]), quick ? 8 : 20);
  record({ benchmark: 'fix path, exact, 14 causes (p95)', value: t14.p95, unit: 'ms', baseline: b12.p95, ratio: t14.p95 / b12.p95, goal: '< 1000 ms', met: t14.p95 < 1000 });
  const t200 = timeIt((i) => shared.planFixPath(inputs200[i % inputs200.length]), quick ? 60 : 200);
  const b200 = timeIt((i) => sortBaseline(inputs200[i % inputs200.length]), 200);
  record({ benchmark: 'fix path, heuristic, 200 causes (p95)', value: t200.p95, unit: 'ms', baseline: b200.p95, ratio: t200.p95 / b200.p95, goal: '< 20 ms', met: t200.p95 < 20 });
  // Gap of the heuristic to the exact optimum where that is known (n ≤ 12).
  const gaps = [];
  for (let seed = 0; seed < (quick ? 40 : 120); seed += 1) {
    const input = shared.randomPlanInput(5000 + seed, 6 + (seed % 7), opts);
    const exact = shared.planFixPath(input).expectedCost;
    const approx = shared.planFixPath(input, { exactLimit: 0 }).expectedCost;
    gaps.push((approx - exact) / exact);
  }
  const meanGap = gaps.reduce((a, b) => a + b, 0) / gaps.length;
  record({ benchmark: 'heuristic gap to exact, mean (n 6-12)', value: meanGap * 100, unit: '%', baseline: 0, ratio: null, goal: '< 2 %', met: meanGap < 0.02 });
  record({ benchmark: 'heuristic gap to exact, worst (n 6-12)', value: Math.max(...gaps) * 100, unit: '%', baseline: 0, ratio: null, goal: 'report', met: undefined });
}

// ---------------------------------------------------------------- decode throughput
{
  const inputs = [];
  for (let i = 1; i < 65536; i += 7) inputs.push(shared.decodeDtc(i >> 8, i & 0xff));
  const typed = inputs.map((c, i) => (i % 3 === 0 ? c.toLowerCase().replace('0', 'o') : i % 3 === 1 ? `${c.slice(0, 1)}${c.slice(1)}` : c));
  const n = quick ? 100_000 : 400_000;
  let t0 = performance.now();
  for (let i = 0; i < n; i += 1) shared.parseDtc(typed[i % typed.length]);
  const codec = n / ((performance.now() - t0) / 1000);
  // Bare baseline: a single regular-expression test of the canonical form.
  const re = /^[PCBU][0-3][0-9A-F]{3}$/;
  let hits = 0;
  t0 = performance.now();
  for (let i = 0; i < n; i += 1) if (re.test(typed[i % typed.length].toUpperCase())) hits += 1;
  const bare = n / ((performance.now() - t0) / 1000);
  record({ benchmark: `decode throughput (${hits ? 'parse+classify' : ''})`, value: codec, unit: 'codes/s', baseline: bare, ratio: codec / bare, goal: 'report', met: undefined });
}

// ---------------------------------------------------------------- start the server on demo data
const dataDir = mkdtempSync(join(tmpdir(), 'causeway-bench-'));
const port = 3981;
const server = spawn(process.execPath, [join(root, 'backend', 'dist', 'main.js')], {
  env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, LOG_LEVEL: 'silent', SEED_DEMO: 'true', THROTTLE_LIMIT: '100000000', AUTH_THROTTLE_LIMIT: '1000', CLIENT_DIST: join(dataDir, 'none') },
  stdio: ['ignore', 'ignore', 'inherit'],
});
const base = `http://127.0.0.1:${port}`;
async function waitHealthy() {
  for (let i = 0; i < 300; i += 1) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      // starting
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error('server did not start');
}
let peakRss = 0;
try {
  await waitHealthy();
  const login = await (await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: 'technician@causeway.test', password: 'demo-pass-2026' }) })).json();
  const auth = { authorization: `Bearer ${login.accessToken}` };

  // ------------------------------------------------------------ fuzzy search p95 over the catalogue
  {
    const index = await (await fetch(`${base}/api/codes/index`, { headers: auth })).json();
    // The client's own search (frontend/src/features/codes/utils/code-search.ts), transpiled here
    // so the figure is the product's, not a look-alike.
    const ts = requireBackend('typescript');
    const source = readFileSync(join(root, 'frontend', 'src', 'features', 'codes', 'utils', 'code-search.ts'), 'utf8');
    const js = ts.transpileModule(source, { compilerOptions: { module: ts.ModuleKind.CommonJS, target: ts.ScriptTarget.ES2022, esModuleInterop: true } }).outputText;
    const mod = { exports: {} };
    new Function('require', 'module', 'exports', js)((id) => (id === '@causeway/shared' ? shared : requireFrontend(id)), mod, mod.exports);
    const search = mod.exports.createCodeSearch(index);
    const queries = ['very small leak', 'misfire', 'P045', 'catalyst bank', 'lean', 'purge valve', 'hybrid battery', 'airbag', 'lost communication', 'coolant thermostat', 'O2 sensor heater', 'evap vent'];
    const times = [];
    for (let i = 0; i < (quick ? 120 : 400); i += 1) {
      const t0 = performance.now();
      search(queries[i % queries.length], 8);
      times.push(performance.now() - t0);
    }
    // Bare baseline: a case-insensitive substring scan of the titles.
    const bare = [];
    for (let i = 0; i < 400; i += 1) {
      const q = queries[i % queries.length].toLowerCase();
      const t0 = performance.now();
      index.filter((e) => e.title.toLowerCase().includes(q) || e.code.toLowerCase().startsWith(q)).slice(0, 8);
      bare.push(performance.now() - t0);
    }
    record({ benchmark: `fuzzy search p95 (${index.length} codes)`, value: percentile(times, 95), unit: 'ms', baseline: percentile(bare, 95), ratio: percentile(times, 95) / percentile(bare, 95), goal: '< 15 ms', met: percentile(times, 95) < 15 });
  }

  // ------------------------------------------------------------ code page API vs bare node:http + better-sqlite3
  {
    const path = '/api/codes/P0456/fix-path?make=Halden&model=Tarn&engine=1.6%20T&year=2019';
    const probe = await fetch(`${base}${path}`, { headers: auth });
    if (!probe.ok) throw new Error(`code page API answered ${probe.status}: ${await probe.text()}`);
    const db = new Database(join(dataDir, 'causeway.sqlite'), { readonly: true });
    const codeStmt = db.prepare('SELECT * FROM dtc_codes WHERE code = ?');
    const causesStmt = db.prepare('SELECT * FROM possible_causes WHERE code = ?');
    const bareServer = createServer((req, res) => {
      const code = 'P0456';
      const body = JSON.stringify({ code: codeStmt.get(code), causes: causesStmt.all(code) });
      res.writeHead(200, { 'content-type': 'application/json' });
      res.end(body);
    });
    await new Promise((r) => bareServer.listen(3982, '127.0.0.1', r));
    const run = (url, headers) => autocannon({ url, connections: 64, duration, headers });
    const monitor = setInterval(() => {
      const r = spawnSync('ps', ['-o', 'rss=', '-p', String(server.pid)], { encoding: 'utf8' });
      peakRss = Math.max(peakRss, Number(r.stdout.trim()) * 1024 || 0);
    }, 250);
    const bare = await run('http://127.0.0.1:3982/', {});
    const app = await run(`${base}${path}`, auth);
    clearInterval(monitor);
    bareServer.close();
    db.close();
    const errors = app.errors + app.non2xx;
    record({ benchmark: 'code page API (code+causes+fix path) req/s', value: app.requests.average, unit: 'req/s', baseline: bare.requests.average, ratio: app.requests.average / bare.requests.average, goal: '>= 0.40 of baseline', met: app.requests.average / bare.requests.average >= 0.4 && errors === 0 });
    record({ benchmark: 'code page API p99 latency, 64 connections', value: app.latency.p99, unit: 'ms', baseline: bare.latency.p99, ratio: app.latency.p99 / Math.max(1, bare.latency.p99), goal: '< 25 ms', met: app.latency.p99 < 25 });
    record({ benchmark: 'code page API errors / non-2xx', value: errors, unit: 'count', baseline: bare.errors + bare.non2xx, ratio: null, goal: '0', met: errors === 0 });
    record({ benchmark: 'server peak memory (RSS) under load', value: peakRss / 1048576, unit: 'MiB', baseline: null, ratio: null, goal: 'report', met: undefined });
  }
} finally {
  server.kill('SIGTERM');
  rmSync(dataDir, { recursive: true, force: true });
}

// ---------------------------------------------------------------- import (its own script, when present)
const importBench = join(root, 'scripts', 'bench-import.mjs');
if (existsSync(importBench)) {
  const r = spawnSync(process.execPath, [importBench, ...(quick ? ['--quick'] : [])], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'inherit'] });
  process.stdout.write(r.stdout);
  const file = join(root, 'data', 'bench', 'import.json');
  if (r.status === 0 && existsSync(file)) {
    const imp = JSON.parse(readFileSync(file, 'utf8'));
    record({ benchmark: `import ${imp.rows} rows through the API, rows/s`, value: imp.apiRowsPerSecond, unit: 'rows/s', baseline: imp.baselineRowsPerSecond, ratio: imp.ratio, goal: '>= 0.30 of baseline', met: imp.ratio >= 0.3 });
  } else {
    record({ benchmark: 'import benchmark', value: null, unit: '', baseline: null, ratio: null, goal: '>= 0.30 of baseline', met: false });
  }
}

// ---------------------------------------------------------------- first-load JavaScript of the production build
{
  const dist = join(root, 'frontend', 'dist');
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const files = [...html.matchAll(/(?:src|href)="\/?(assets\/[^"]+\.js)"/g)].map((m) => m[1]);
  const gz = files.reduce((sum, f) => sum + gzipSync(readFileSync(join(dist, f))).length, 0);
  record({ benchmark: `first-load JavaScript, gzipped (${files.length} files)`, value: gz / 1024, unit: 'KiB', baseline: null, ratio: null, goal: '<= 350 KB', met: gz / 1000 <= 350 });
}

mkdirSync(join(root, 'data', 'bench'), { recursive: true });
writeFileSync(join(root, 'data', 'bench', 'results.json'), JSON.stringify({ at: new Date().toISOString(), quick, results }, null, 2) + '\n');
console.log(`\nwritten to data/bench/results.json`);
