import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import { join } from 'node:path';

/** One caught message as MailDev's REST API gives it (the fields the tests read). */
export interface CaughtMail {
  id: string;
  subject: string;
  to: Array<{ address: string; name?: string }>;
  from: Array<{ address: string; name?: string }>;
  text?: string;
  html?: string;
  time: string;
}

export interface MailCatcher {
  smtpPort: number;
  webPort: number;
  /** Every message caught so far, in arrival order. */
  messages(): Promise<CaughtMail[]>;
  /** The first message to `address`, waiting for it to arrive. */
  waitFor(address: string, timeoutMs?: number): Promise<CaughtMail>;
  clear(): Promise<void>;
  stop(): Promise<void>;
}

const SCRIPT = join(__dirname, '..', '..', '..', 'scripts', 'mail-catcher.mjs');
const READY = /^MAIL_CATCHER_READY (\{.*\})$/m;

/**
 * Starts MailDev (scripts/mail-catcher.mjs) as a child process on free loopback ports, so the
 * app under test sends real SMTP and the test reads what arrived over MailDev's REST API.
 */
export async function startMailCatcher(): Promise<MailCatcher> {
  const child: ChildProcessWithoutNullStreams = spawn(process.execPath, [SCRIPT, '--watch-parent'], { stdio: ['pipe', 'pipe', 'pipe'] });
  const ports = await new Promise<{ smtp: number; web: number }>((resolve, reject) => {
    let out = '';
    let err = '';
    const timer = setTimeout(() => {
      child.kill('SIGTERM');
      reject(new Error(`mail catcher did not start in time: ${err || out}`));
    }, 20_000);
    child.stdout.on('data', (chunk: Buffer) => {
      out += chunk.toString('utf8');
      const m = READY.exec(out);
      if (m) {
        clearTimeout(timer);
        resolve(JSON.parse(m[1]) as { smtp: number; web: number });
      }
    });
    child.stderr.on('data', (chunk: Buffer) => (err += chunk.toString('utf8')));
    child.on('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`mail catcher exited with ${code}: ${err || out}`));
    });
  });
  const base = `http://127.0.0.1:${ports.web}/api`;

  const messages = async (): Promise<CaughtMail[]> => {
    const res = await fetch(`${base}/email`);
    if (!res.ok) throw new Error(`mail catcher answered ${res.status}`);
    return (await res.json()) as CaughtMail[];
  };

  return {
    smtpPort: ports.smtp,
    webPort: ports.web,
    messages,
    async waitFor(address: string, timeoutMs = 10_000): Promise<CaughtMail> {
      const until = Date.now() + timeoutMs;
      for (;;) {
        const found = (await messages()).find((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
        if (found) return found;
        if (Date.now() > until) throw new Error(`no mail to ${address} arrived`);
        await new Promise((r) => setTimeout(r, 50));
      }
    },
    async clear(): Promise<void> {
      await fetch(`${base}/email/all`, { method: 'DELETE' });
    },
    async stop(): Promise<void> {
      if (child.exitCode !== null) return;
      await new Promise<void>((resolve) => {
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      });
    },
  };
}

/** A loopback port with nothing listening on it (bound, then released), for a mail server that is down. */
export async function closedPort(): Promise<number> {
  const { createServer } = await import('node:net');
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}
