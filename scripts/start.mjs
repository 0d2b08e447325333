// Starts Causeway as the README describes: the local mail catcher (unless real SMTP is
// configured) and the server, which migrates, seeds the demo on first start and serves
// the built client on http://localhost:3000.
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const require = createRequire(import.meta.url);

process.env.DATA_DIR ??= join(root, 'data');

async function startMailCatcher() {
  if (process.env.SMTP_HOST || process.env.MAIL_CATCHER === 'false') return;
  const smtp = Number(process.env.SMTP_PORT ?? 1025);
  const web = Number(process.env.MAIL_CATCHER_WEB_PORT ?? 1080);
  try {
    const { MailDev } = await import('maildev');
    const maildev = new MailDev({ smtp, web, ip: '127.0.0.1', webIp: '127.0.0.1', silent: true });
    await maildev.start();
    process.env.SMTP_HOST = '127.0.0.1';
    process.env.SMTP_PORT = String(smtp);
    console.log(`Mail catcher: SMTP on 127.0.0.1:${smtp}, caught mail at http://localhost:${web}/index.html`);
  } catch (err) {
    console.warn(`Mail catcher not started (${err instanceof Error ? err.message : err}); e-mail will fail until SMTP_HOST is set`);
  }
}

await startMailCatcher();
require(join(root, 'backend', 'dist', 'main.js'));
