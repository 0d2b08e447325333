// Marks a compiled folder as ES modules so Node and bundlers read it as such.
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
const dir = process.argv[2];
writeFileSync(join(dir, 'package.json'), JSON.stringify({ type: 'module' }) + '\n');
