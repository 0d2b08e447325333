import { randomFillSync } from 'node:crypto';

const HEX: string[] = Array.from({ length: 256 }, (_, i) => i.toString(16).padStart(2, '0'));
const pool = Buffer.alloc(8192);
let poolPos = pool.length;
let lastMs = 0;
let counter = 0;

/**
 * A time-ordered UUID, version 7 (RFC 9562 §5.7): 48-bit Unix milliseconds, a 12-bit counter in
 * rand_a for order within a millisecond (§6.2 method 1; the clock is advanced virtually when it
 * overflows), then 62 random bits. Ids made in order land at the end of the primary-key and
 * foreign-key indexes, which makes a large import's inserts several times cheaper than with
 * random version-4 ids. Every UUID column and check in the app accepts any version.
 */
export function uuid7(now: number = Date.now()): string {
  if (now > lastMs) {
    lastMs = now;
    counter = 0;
  } else if (++counter > 0xfff) {
    lastMs += 1;
    counter = 0;
  }
  if (poolPos + 8 > pool.length) {
    randomFillSync(pool);
    poolPos = 0;
  }
  const p = poolPos;
  poolPos += 8;
  const t = lastMs.toString(16).padStart(12, '0');
  return (
    `${t.slice(0, 8)}-${t.slice(8, 12)}-${HEX[0x70 | (counter >> 8)]}${HEX[counter & 0xff]}-` +
    `${HEX[0x80 | (pool[p] & 0x3f)]}${HEX[pool[p + 1]]}-${HEX[pool[p + 2]]}${HEX[pool[p + 3]]}${HEX[pool[p + 4]]}${HEX[pool[p + 5]]}${HEX[pool[p + 6]]}${HEX[pool[p + 7]]}`
  );
}
