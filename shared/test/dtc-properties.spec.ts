import fc from 'fast-check';
import { decodeDtc, encodeDtc, normaliseDtc, parseDtc, type DtcParseResult } from '../src/dtc';

// Reference decoder written from the field layout alone: scapy's OBD_DTC is 2 + 2 + 4 + 4 + 4 bits
// (secdev/scapy@ac38b273 scapy/contrib/automotive/obd/services.py; domain reference §2.1):
// letter 00 P, 01 C, 10 B, 11 U; second character 0–3; then three hex digits.
function referenceDecode(value: number): string {
  return 'PCBU'[value >> 14] + ((value >> 12) & 3).toString() + (value & 0xfff).toString(16).toUpperCase().padStart(3, '0');
}

const hex = (b: number): string => b.toString(16).toUpperCase().padStart(2, '0');

function checkShape(input: string, result: DtcParseResult): void {
  if (result.ok) {
    expect(result.value.code).toMatch(/^[PCBU][0-3][0-9A-F]{3}$/);
    expect(result.value.code).not.toBe('P0000');
  } else {
    expect(result.error.message.length).toBeGreaterThan(0);
    const p = result.error.position;
    if (p !== null) {
      expect(Number.isInteger(p)).toBe(true);
      expect(p).toBeGreaterThanOrEqual(1);
      expect(p).toBeLessThanOrEqual(Array.from(input.trim()).length + 1);
    }
  }
}

describe('every one of the 65 536 two-byte values (product brief §1)', () => {
  it('00 00 is padding; every other value decodes, parses and encodes back to the same bytes', () => {
    // python-OBD drops 00 00 as padding (domain reference §2.1)
    expect(decodeDtc(0, 0)).toBeNull();
    expect(parseDtc('00 00')).toEqual({ ok: false, error: expect.objectContaining({ message: expect.stringMatching(/padding/) }) });

    // Plain comparisons inside the loop: 65 535 rounds of expect() would take seconds.
    const problems: string[] = [];
    const seen = new Set<string>();
    for (let value = 1; value <= 0xffff; value++) {
      const high = value >> 8;
      const low = value & 0xff;
      const bytes = `${hex(high)} ${hex(low)}`;
      const code = decodeDtc(high, low);
      if (code === null || code !== referenceDecode(value)) {
        problems.push(`${bytes}: decoded as ${String(code)}, layout gives ${referenceDecode(value)}`);
        continue;
      }
      const parsed = parseDtc(code);
      if (!parsed.ok || parsed.value.code !== code || parsed.value.bytes !== bytes || parsed.value.corrections.length > 0) {
        problems.push(`${code}: does not parse back cleanly`);
      }
      const [h, l] = encodeDtc(code);
      if (h !== high || l !== low) problems.push(`${code}: encodes to ${hex(h)} ${hex(l)}`);
      const fromBytes = parseDtc(bytes);
      if (!fromBytes.ok || fromBytes.value.code !== code) problems.push(`${bytes}: hex form does not parse to ${code}`);
      seen.add(code);
    }
    expect(problems.slice(0, 10)).toEqual([]);
    expect(seen.size).toBe(0xffff);
  });
});

const hexDigit = fc.constantFrom(...'0123456789ABCDEF'.split(''));
const validCode = fc
  .tuple(fc.constantFrom('P', 'C', 'B', 'U'), fc.constantFrom('0', '1', '2', '3'), hexDigit, hexDigit, hexDigit)
  .map((chars) => chars.join(''))
  .filter((code) => code !== 'P0000');

// Near-misses a person might type: any case, O for 0, invalid letters, separators, failure-type bytes.
const codeLike = fc
  .tuple(
    fc.constantFrom(...'PCBUXpcbuO0 '.split('')),
    fc.array(fc.constantFrom(...'0123456789ABCDEFGOoabcdefzZ- '.split('')), { minLength: 0, maxLength: 8 }),
    fc.option(fc.tuple(fc.constantFrom('-', ' ', ' - ', ''), fc.stringMatching(/^[0-9A-Fa-fG]{0,3}$/))),
  )
  .map(([first, rest, ftb]) => first + rest.join('') + (ftb ? ftb[0] + ftb[1] : ''));

const hexLike = fc
  .tuple(fc.constantFrom('', '0x', '0X'), fc.array(fc.stringMatching(/^[0-9A-Fa-f]{1,3}$/), { minLength: 0, maxLength: 4 }), fc.constantFrom(' ', '', '  '))
  .map(([prefix, groups, sep]) => prefix + groups.join(sep));

describe('parseDtc properties (fast-check)', () => {
  it('decode ∘ encode is the identity on valid codes, and encode ∘ decode on non-zero byte pairs', () => {
    fc.assert(
      fc.property(validCode, (code) => {
        const [high, low] = encodeDtc(code);
        expect(decodeDtc(high, low)).toBe(code);
      }),
    );
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 0xffff }), (value) => {
        const code = decodeDtc(value >> 8, value & 0xff);
        expect(code).not.toBeNull();
        expect(encodeDtc(code as string)).toEqual([value >> 8, value & 0xff]);
      }),
    );
  });

  it('normalising is idempotent', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string(), codeLike, hexLike, validCode), (input) => {
        const once = normaliseDtc(input);
        if (once !== null) expect(normaliseDtc(once)).toBe(once);
      }),
    );
  });

  it('is case-insensitive and repairs O for 0 in positions 2–5, reporting each repair', () => {
    fc.assert(
      fc.property(validCode, fc.array(fc.boolean(), { minLength: 5, maxLength: 5 }), fc.boolean(), (code, mask, lower) => {
        let typed = code
          .split('')
          .map((ch, i) => (i > 0 && ch === '0' && mask[i] ? 'O' : ch))
          .join('');
        if (lower) typed = typed.toLowerCase();
        const result = parseDtc(typed);
        if (!result.ok) throw new Error(`${typed}: ${result.error.message}`);
        expect(result.value.code).toBe(code);
        const repaired = code.split('').flatMap((ch, i) => (i > 0 && ch === '0' && mask[i] ? [i + 1] : []));
        expect(result.value.corrections.map((c) => c.position)).toEqual(repaired);
      }),
    );
  });

  it('accepts or rejects any string with a reason, never throwing', () => {
    const anyText = fc.oneof(
      fc.string(),
      fc.string({ unit: 'binary' }), // full Unicode, lone surrogates included
      fc.string({ unit: 'grapheme' }),
      codeLike,
      hexLike,
      validCode,
    );
    fc.assert(
      fc.property(anyText, (input) => {
        checkShape(input, parseDtc(input));
      }),
      { numRuns: 2000 },
    );
  });

  it('accepts exactly the valid code-like strings', () => {
    fc.assert(
      fc.property(codeLike, (input) => {
        const result = parseDtc(input);
        // Independent statement of the text rule (J2012, domain reference §1; product brief §1):
        // letter P/C/B/U, 0–3, three hex digits (letter O read as 0 in positions 2–5), optionally
        // a failure-type byte of two hex digits after '-' or spaces; P0000 is padding.
        const u = input
          .trim()
          .toUpperCase()
          .split('')
          .map((ch, i) => (i >= 1 && i <= 4 && ch === 'O' ? '0' : ch))
          .join('');
        const looksValid =
          /^[PCBU][0-3][0-9A-F]{3}(?:\s*-\s*[0-9A-F]{2}|\s+[0-9A-F]{2})?$/.test(u) && !u.startsWith('P0000');
        // Inputs starting with a digit, or spaced byte pairs such as 'C1 00', are read as hex instead.
        const looksHex = /^[0-9]/.test(u) || /^[0-9A-F]{2}(\s+[0-9A-F]{2})+$/.test(u);
        if (!looksHex) expect(result.ok).toBe(looksValid);
      }),
      { numRuns: 2000 },
    );
  });
});
