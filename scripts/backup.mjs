// Takes a consistent copy of the database while the app runs, with SQLite's online
// backup API (better-sqlite3's db.backup), into DATA_DIR/backups/causeway-<time>.sqlite.
// Restore: stop the app, copy the backup over DATA_DIR/causeway.sqlite, delete any
// causeway.sqlite-wal and causeway.sqlite-shm beside it, start the app.
import { existsSync, mkdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const require = createRequire(join(root, 'backend', 'package.json'));
const Database = require('better-sqlite3');

const dataDir = resolve(process.env.DATA_DIR ?? join(root, 'data'));
const source = join(dataDir, 'causeway.sqlite');
if (!existsSync(source)) {
  console.error(`No database at ${source}: start the app once, or set DATA_DIR`);
  process.exit(1);
}
const outDir = process.argv[2] ? resolve(process.argv[2]) : join(dataDir, 'backups');
mkdirSync(outDir, { recursive: true });
const stamp = new Date().toISOString().replace(/[:.]/g, '-');
const target = join(outDir, `causeway-${stamp}.sqlite`);

const db = new Database(source, { fileMustExist: true });
db.pragma('busy_timeout = 5000');
const started = Date.now();
await db.backup(target, {
  progress: ({ totalPages, remainingPages }) => {
    process.stdout.write(`\rbacking up: ${totalPages - remainingPages}/${totalPages} pages`);
    return 200;
  },
});
db.close();
// A single self-contained file: the copy carries the source's WAL mode, so switch it back.
const check = new Database(target);
check.pragma('journal_mode = DELETE');
const integrity = check.pragma('integrity_check', { simple: true });
check.close();
console.log(`\nbackup written to ${target} in ${Date.now() - started} ms; integrity_check: ${integrity}`);
if (integrity !== 'ok') process.exit(1);
