import isUUID from 'validator/lib/isUUID';
import { uuid7 } from './uuid7';

describe('uuid7', () => {
  it('makes version-7 UUIDs of the RFC 9562 layout (checked with the validator package) carrying the Unix time in ms', () => {
    const now = Date.UTC(2025, 2, 14, 9, 30);
    const id = uuid7(now + 10_000_000); // later than any earlier call in this process
    expect(isUUID(id, 7)).toBe(true);
    // The first 48 bits are the timestamp (RFC 9562 §5.7).
    expect(parseInt(id.replace(/-/g, '').slice(0, 12), 16)).toBe(now + 10_000_000);
  });

  it('keeps ids made in one millisecond in order, also past 4096 of them (the clock advances virtually)', () => {
    const ms = Date.now() + 20_000_000;
    const ids = Array.from({ length: 5000 }, () => uuid7(ms));
    expect(ids.every((id) => isUUID(id, 7))).toBe(true);
    expect([...ids].sort()).toEqual(ids);
    expect(new Set(ids).size).toBe(ids.length);
  });
});
