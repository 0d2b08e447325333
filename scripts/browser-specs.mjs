// Browser specs: starts the app as the README starts it (scripts/start.mjs on a fresh
// DATA_DIR with the demo data), then drives Debian's Chromium with playwright-core.
// Each file in e2e/*.spec.mjs exports `name` and a default async function({ page, baseUrl, shot }).
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const executablePath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
if (!existsSync(executablePath)) {
  console.error(`Chromium not found at ${executablePath}: apt-get install -y chromium (or set CHROMIUM_PATH)`);
  process.exit(1);
}
const port = Number(process.env.BROWSER_SPEC_PORT ?? 3917);
const smtpPort = port + 1;
const mailWebPort = port + 2;
const baseUrl = `http://127.0.0.1:${port}`;
const dataDir = mkdtempSync(join(tmpdir(), 'causeway-browser-'));
const shotsDir = join(root, 'data', 'screenshots');
mkdirSync(shotsDir, { recursive: true });

const server = spawn(process.execPath, [join(root, 'scripts', 'start.mjs')], {
  env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, SMTP_PORT: String(smtpPort), MAIL_CATCHER_WEB_PORT: String(mailWebPort), LOG_LEVEL: 'warn', AUTH_THROTTLE_LIMIT: '200' },
  stdio: ['ignore', 'inherit', 'inherit'],
});

async function waitForHealth() {
  const deadline = Date.now() + 90_000;
  while (Date.now() < deadline) {
    if (server.exitCode !== null) throw new Error(`server exited with ${server.exitCode}`);
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error('server did not become healthy in 90 s');
}

let passed = 0;
let failed = 0;
let browser;
try {
  await waitForHealth();
  browser = await chromium.launch({
    executablePath,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const only = process.argv[2];
  const files = readdirSync(join(root, 'e2e')).filter((f) => f.endsWith('.spec.mjs') && (!only || f.includes(only))).sort();
  for (const file of files) {
    const spec = await import(pathToFileURL(join(root, 'e2e', file)).href);
    const context = await browser.newContext({ viewport: { width: 1366, height: 900 } });
    const page = await context.newPage();
    page.setDefaultTimeout(15_000);
    const shot = (name) => page.screenshot({ path: join(shotsDir, `${name}.png`), fullPage: true });
    const started = Date.now();
    try {
      await spec.default({ page, baseUrl, shot, mailUrl: `http://127.0.0.1:${mailWebPort}` });
      passed += 1;
      console.log(`  ok   ${spec.name ?? file} (${Date.now() - started} ms)`);
    } catch (err) {
      failed += 1;
      console.log(`  FAIL ${spec.name ?? file}\n${err instanceof Error ? err.stack : err}`);
      await shot(`FAILED-${file.replace(/\.spec\.mjs$/, '')}`).catch(() => undefined);
    } finally {
      await context.close();
    }
  }
} catch (err) {
  failed += 1;
  console.error(err);
} finally {
  await browser?.close();
  server.kill('SIGTERM');
  rmSync(dataDir, { recursive: true, force: true });
}
console.log(`browser specs: ${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
