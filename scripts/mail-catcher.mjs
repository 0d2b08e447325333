// A local mail catcher (MailDev) on loopback, for tests and development: SMTP in, caught mail
// readable over MailDev's REST API (GET /api/email). Prints one ready line,
//   MAIL_CATCHER_READY {"smtp":<port>,"web":<port>}
// then runs until SIGINT/SIGTERM (or, with --watch-parent, until its stdin closes, so a test
// run that dies never leaves it behind).
//
//   node scripts/mail-catcher.mjs [--smtp <port>] [--web <port>] [--watch-parent]
// Port 0 (the default) lets the system pick a free port; the ready line says which.
import { MailDev } from 'maildev';

function arg(name, fallback) {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 && process.argv[i + 1] !== undefined ? process.argv[i + 1] : fallback;
}

const smtp = Number(arg('smtp', process.env.MAIL_CATCHER_SMTP_PORT ?? 0));
const web = Number(arg('web', process.env.MAIL_CATCHER_WEB_PORT ?? 0));
for (const [name, port] of [['smtp', smtp], ['web', web]]) {
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    console.error(`mail-catcher: --${name} must be a port number from 0 to 65535`);
    process.exit(2);
  }
}

// MailDev announces its web address on the console even when silent; keep stdout for our line.
const info = console.info;
console.info = () => {};
const maildev = new MailDev({ smtp, web, ip: '127.0.0.1', webIp: '127.0.0.1', silent: true });
let servers;
try {
  servers = await maildev.start();
} catch (err) {
  console.error(`mail-catcher: could not start: ${err instanceof Error ? err.message : err}`);
  process.exit(1);
}
console.info = info;

const smtpPort = servers.smtp.port;
const webPort = servers.api.boundAddress?.port ?? servers.api.server.server.address().port;
process.stdout.write(`MAIL_CATCHER_READY ${JSON.stringify({ smtp: smtpPort, web: webPort })}\n`);

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  try {
    await maildev.stop();
  } finally {
    process.exit(0);
  }
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
if (process.argv.includes('--watch-parent')) {
  process.stdin.on('end', stop);
  process.stdin.on('close', stop);
  process.stdin.resume();
}
