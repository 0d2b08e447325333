// Scan-tool CSV import benchmark: a 100 000-row file end to end through the API (upload, detect,
// check every row, one transaction writing vehicles, jobs, codes and import rows) against a bare
// baseline measured in the same run on the same machine: the same file through a csv-parse stream
// into one table with better-sqlite3 prepared inserts in one transaction. Goal: the API reaches at
// least 30 % of the baseline's rows per second. Needs the built server (npm run build).
//
//   node scripts/bench-import.mjs [--rows 100000] [--runs 3] [--quick]   (--quick: one run of each)
//
// Writes data/bench/import.json. The file is invented: 10 000 vehicles (VINs with valid check
// digits, 49 CFR 565.15), each scanned on two days with five generic codes per scan.
import { spawn } from 'node:child_process';
import { createReadStream, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const requireBackend = createRequire(join(root, 'backend', 'package.json'));
const Database = requireBackend('better-sqlite3');
const { parse } = requireBackend('csv-parse');

const arg = (name, fallback) => {
  const i = process.argv.indexOf(`--${name}`);
  return i === -1 ? fallback : Number(process.argv[i + 1]);
};
const ROWS = arg('rows', 100_000);
const RUNS = arg('runs', process.argv.includes('--quick') ? 1 : 3);
const GOAL = 0.3;

// ---------------------------------------------------------------- the file

const VIN_ALPHABET = '0123456789ABCDEFGHJKLMNPRSTUVWXYZ';
const VIN_WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2];
const LETTER_VALUES = { A: 1, B: 2, C: 3, D: 4, E: 5, F: 6, G: 7, H: 8, J: 1, K: 2, L: 3, M: 4, N: 5, P: 7, R: 9, S: 2, T: 3, U: 4, V: 5, W: 6, X: 7, Y: 8, Z: 9 };
const value = (ch) => (ch >= '0' && ch <= '9' ? Number(ch) : LETTER_VALUES[ch]);

/** A North-American VIN with the check digit of 49 CFR 565.15(c), deterministic in `n`. */
function vinFor(n) {
  let x = (n * 2654435761) >>> 0;
  const chars = ['1', 'H', 'G'];
  for (let i = 3; i < 17; i++) {
    x = (x * 1103515245 + 12345) >>> 0;
    chars.push(VIN_ALPHABET[x % VIN_ALPHABET.length]);
  }
  chars[9] = 'K'; // model year 2019 with a letter in position 7
  chars[6] = 'A';
  chars[8] = '0';
  const sum = chars.reduce((s, ch, i) => s + value(ch) * VIN_WEIGHTS[i], 0);
  const r = sum % 11;
  chars[8] = r === 10 ? 'X' : String(r);
  return chars.join('');
}

const CODES = ['P0171', 'P0172', 'P0300', 'P0301', 'P0302', 'P0303', 'P0304', 'P0420', 'P0430', 'P0441', 'P0442', 'P0455', 'P0456', 'P0101', 'P0128', 'P0135', 'P0141', 'P0401', 'P0507', 'U0100'];
const STATUSES = ['stored', 'pending', 'permanent', 'confirmed'];

function makeCsv(rows) {
  const codesPerScan = 5;
  const scans = Math.ceil(rows / codesPerScan);
  const lines = ['Date,VIN,Odometer (km),Module,DTC,Status,Description,FF: RPM,FF: Coolant temp'];
  let written = 0;
  for (let s = 0; s < scans && written < rows; s++) {
    const vehicle = Math.floor(s / 2);
    const day = s % 2 === 0 ? '2025-03-14' : '2025-06-02';
    const vin = vinFor(vehicle);
    const odo = 40_000 + vehicle * 3 + (s % 2) * 5_000;
    for (let c = 0; c < codesPerScan && written < rows; c++) {
      const code = CODES[(vehicle + c * 7) % CODES.length];
      const status = STATUSES[(vehicle + c) % STATUSES.length];
      lines.push(`${day} 09:${String(10 + c).padStart(2, '0')}:00,${vin},${odo},ECM,${code},${status},"Invented description, row ${written + 1}",${800 + c * 10},${88 + c}`);
      written += 1;
    }
  }
  return lines.join('\r\n') + '\r\n';
}

// ---------------------------------------------------------------- baseline

async function baseline(file, dir, n) {
  const db = new Database(join(dir, `baseline-${n}.sqlite`));
  db.pragma('journal_mode = WAL');
  db.pragma('synchronous = NORMAL');
  db.exec('CREATE TABLE rows (id INTEGER PRIMARY KEY, date TEXT, vin TEXT, odometer TEXT, module TEXT, code TEXT, status TEXT, description TEXT, rpm TEXT, coolant TEXT)');
  const insert = db.prepare('INSERT INTO rows (date, vin, odometer, module, code, status, description, rpm, coolant) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)');
  const start = process.hrtime.bigint();
  const cpu0 = process.cpuUsage();
  db.exec('BEGIN');
  let rows = 0;
  const parser = createReadStream(file).pipe(parse({ from_line: 2 }));
  for await (const r of parser) {
    insert.run(r[0], r[1], r[2], r[3], r[4], r[5], r[6], r[7], r[8]);
    rows += 1;
  }
  db.exec('COMMIT');
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const cpu = process.cpuUsage(cpu0);
  db.close();
  return { rows, seconds, cpuSeconds: (cpu.user + cpu.system) / 1e6 };
}

// ---------------------------------------------------------------- the server

function freePort() {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address();
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

async function startServer(dataDir) {
  const port = await freePort();
  const child = spawn(process.execPath, [join(root, 'backend', 'dist', 'main.js')], {
    env: { ...process.env, DATA_DIR: dataDir, PORT: String(port), SEED_DEMO: 'false', LOG_LEVEL: 'warn', MAIL_CATCHER: 'false', THROTTLE_LIMIT: '100000', AUTH_THROTTLE_LIMIT: '1000' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const base = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the server exited with code ${child.exitCode}`);
    try {
      const res = await fetch(`${base}/api/health`);
      if (res.ok) break;
    } catch {
      /* not listening yet */
    }
    if (Date.now() > deadline) throw new Error('the server did not answer /api/health within 60 s');
    await new Promise((r) => setTimeout(r, 200));
  }
  return { child, base };
}

async function registerShop(base, n) {
  const res = await fetch(`${base}/api/auth/register`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({
      email: `bench.${process.pid}.${n}@example.test`,
      password: 'bench-password-42',
      displayName: 'Bench',
      shop: { name: `Bench shop ${n} (invented)`, currency: 'EUR', locale: 'en-IE', labourRateMinor: 9000, taxRateBp: 2300, distanceUnit: 'km' },
    }),
  });
  if (!res.ok) throw new Error(`register: ${res.status} ${await res.text()}`);
  return (await res.json()).accessToken;
}

/** CPU seconds the server process has used (Linux /proc; null elsewhere). */
function serverCpu(pid) {
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
    return (Number(fields[11]) + Number(fields[12])) / 100; // utime + stime, in clock ticks of 1/100 s
  } catch {
    return null;
  }
}

async function upload(base, token, bytes, name, pid) {
  const form = new FormData();
  form.append('file', new Blob([bytes], { type: 'text/csv' }), name);
  const start = process.hrtime.bigint();
  const cpu0 = serverCpu(pid);
  const res = await fetch(`${base}/api/imports?dryRun=false`, { method: 'POST', headers: { authorization: `Bearer ${token}` }, body: form });
  const body = await res.json();
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const cpu1 = serverCpu(pid);
  if (!res.ok || !body.committed) throw new Error(`import: ${res.status} ${JSON.stringify(body).slice(0, 400)}`);
  return { seconds, cpuSeconds: cpu0 === null || cpu1 === null ? null : cpu1 - cpu0, body };
}

// ---------------------------------------------------------------- run

const dir = mkdtempSync(join(tmpdir(), 'causeway-bench-import-'));
const main = join(root, 'backend', 'dist', 'main.js');
if (!existsSync(main)) {
  console.error('bench-import: backend/dist/main.js is missing; run `npm run build` first');
  process.exit(1);
}
let server;
try {
  const csv = makeCsv(ROWS);
  const file = join(dir, 'scan.csv');
  writeFileSync(file, csv);
  const bytes = Buffer.from(csv);
  console.log(`bench-import: ${ROWS.toLocaleString('en-GB')} rows, ${(bytes.length / 1e6).toFixed(1)} MB, best of ${RUNS}`);

  server = await startServer(join(dir, 'data'));
  // Warm-up: a small file through the same path, so the first timed run is not paying for JIT.
  const warm = await registerShop(server.base, 0);
  await upload(server.base, warm, Buffer.from(makeCsv(2000)), 'warm-up.csv', server.child.pid);
  await baseline(file, dir, 'warm-up');
  // Baseline and API runs alternate, so that both see the same machine.
  const base = [];
  const api = [];
  for (let i = 0; i < RUNS; i++) {
    base.push(await baseline(file, dir, i));
    const token = await registerShop(server.base, i + 1); // a new shop each run: no row is a duplicate
    api.push(await upload(server.base, token, bytes, 'scan.csv', server.child.pid));
  }
  const baseBest = Math.min(...base.map((b) => b.seconds));
  const apiBest = Math.min(...api.map((a) => a.seconds));
  const last = api[api.length - 1].body;

  const baselineRate = ROWS / baseBest;
  const apiRate = ROWS / apiBest;
  const ratio = apiRate / baselineRate;
  // The same comparison in CPU time, which other processes on a busy machine do not distort.
  const baseCpu = Math.min(...base.map((b) => b.cpuSeconds));
  const apiCpus = api.map((a) => a.cpuSeconds).filter((c) => c !== null);
  const apiCpu = apiCpus.length ? Math.min(...apiCpus) : null;
  const cpuRatio = apiCpu ? baseCpu / apiCpu : null;
  const pct = (x) => `${(x * 100).toFixed(1)} %`;
  console.log(`  baseline (csv-parse stream + prepared inserts, one transaction): ${Math.round(baselineRate).toLocaleString('en-GB')} rows/s (${baseBest.toFixed(2)} s; CPU ${baseCpu.toFixed(2)} s)`);
  console.log(`  API end to end (POST /api/imports?dryRun=false):                 ${Math.round(apiRate).toLocaleString('en-GB')} rows/s (${apiBest.toFixed(2)} s; server CPU ${apiCpu === null ? 'n/a' : `${apiCpu.toFixed(2)} s`})`);
  console.log(`  ratio: ${pct(ratio)} of the baseline's rows/s (goal ≥ ${GOAL * 100} %) ${ratio >= GOAL ? 'met' : 'NOT met'}${cpuRatio === null ? '' : `; by CPU time ${pct(cpuRatio)}`}`);
  console.log(`  wrote ${last.createdVehicles} vehicles, ${last.createdJobs} jobs, ${last.createdCodes} codes per run`);

  const out = {
    at: new Date().toISOString(),
    rows: ROWS,
    fileBytes: bytes.length,
    runs: RUNS,
    apiRowsPerSecond: apiRate,
    baselineRowsPerSecond: baselineRate,
    ratio,
    baseline: { rowsPerSecond: baselineRate, seconds: base.map((b) => b.seconds), cpuSeconds: base.map((b) => b.cpuSeconds) },
    api: { rowsPerSecond: apiRate, seconds: api.map((a) => a.seconds), cpuSeconds: api.map((a) => a.cpuSeconds), created: { vehicles: last.createdVehicles, jobs: last.createdJobs, codes: last.createdCodes } },
    cpuRatio,
    results: [
      { benchmark: `scan-tool CSV import, ${ROWS} rows end to end`, value: apiRate, unit: 'rows/s', baseline: baselineRate, ratio, goal: `≥ ${GOAL * 100} % of baseline`, met: ratio >= GOAL },
    ],
  };
  mkdirSync(join(root, 'data', 'bench'), { recursive: true });
  writeFileSync(join(root, 'data', 'bench', 'import.json'), JSON.stringify(out, null, 2) + '\n');
  console.log('  figures written to data/bench/import.json');
} finally {
  if (server) {
    server.child.kill('SIGTERM');
    await new Promise((r) => (server.child.exitCode !== null ? r() : server.child.once('exit', r)));
  }
  rmSync(dir, { recursive: true, force: true });
}
