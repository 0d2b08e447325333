import {
  classifyDtc,
  decodeDtc,
  decodeDtcWithFailureType,
  encodeDtc,
  normaliseDtc,
  parseDtc,
  type DtcParseResult,
  type DtcStructure,
} from '../src/dtc';

function accepted(result: DtcParseResult): DtcStructure {
  if (!result.ok) throw new Error(`expected acceptance, got: ${result.error.message}`);
  return result.value;
}

describe('two-byte form (SAE J1979 services $03/$07/$0A)', () => {
  // [code, high, low, source]
  const vectors: [string, number, number, string][] = [
    // brendan-w/python-OBD@a378bdd8 tests/test_decoders.py (design notes, domain reference §2.1)
    ['P0104', 0x01, 0x04, 'python-OBD tests/test_decoders.py'],
    ['C0123', 0x41, 0x23, 'python-OBD tests/test_decoders.py'],
    ['B0003', 0x80, 0x03, 'python-OBD tests/test_decoders.py'],
    // secdev/scapy@ac38b273 test/contrib/automotive/obd/obd.uts (domain reference §2.1)
    ['P1301', 0x13, 0x01, 'scapy obd.uts'],
    ['C0510', 0x45, 0x10, 'scapy obd.uts'],
    ['B1782', 0x97, 0x82, 'scapy obd.uts'],
    // [calc] rows of domain reference §2.1: 0A 80 = 00·00·1010·1000·0000
    ['P0A80', 0x0a, 0x80, 'domain reference §2.1 [calc]'],
    ['U0100', 0xc1, 0x00, 'domain reference §2.1 [calc]'],
    ['P0420', 0x04, 0x20, 'domain reference §2.1 [calc]'],
    ['P2B4A', 0x2b, 0x4a, 'domain reference §2.1 [calc]'],
  ];

  it.each(vectors)('%s ⇄ %d %d (%s)', (code, high, low) => {
    expect(decodeDtc(high, low)).toBe(code);
    expect(encodeDtc(code)).toEqual([high, low]);
    const hex = [high, low].map((b) => b.toString(16).padStart(2, '0')).join(' ');
    const parsed = accepted(parseDtc(hex));
    expect(parsed.code).toBe(code);
    expect(parsed.inputForm).toBe('hex2');
    expect(parsed.bytes).toBe(hex.toUpperCase());
  });

  it('prints hex positions in upper case (python-OBD pitfall: "P0a80" never matches its own table, domain reference §2.1)', () => {
    expect(decodeDtc(0x0a, 0x80)).toBe('P0A80');
  });

  it('reads positions 3–5 as hexadecimal, not decimal (mickeyl/LTSupportAutomotive#6 mangled P2B4A)', () => {
    expect(encodeDtc('P2B4A')).toEqual([0x2b, 0x4a]);
    expect(accepted(parseDtc('p2b4a')).bytes).toBe('2B 4A');
  });

  it('treats 00 00 as padding, not a code (python-OBD drops it, domain reference §2.1)', () => {
    expect(decodeDtc(0, 0)).toBeNull();
  });

  it('rejects values that are not bytes, naming which one', () => {
    expect(() => decodeDtc(256, 0)).toThrow(/high byte.*0–255/);
    expect(() => decodeDtc(0, -1)).toThrow(/low byte/);
    expect(() => decodeDtc(1.5, 0)).toThrow(RangeError);
    expect(() => decodeDtc(Number.NaN, 0)).toThrow(RangeError);
  });
});

describe('parseDtc accepted forms (product brief §1)', () => {
  it('repairs letter O for digit zero and reports it ("po456" → "P0456")', () => {
    const value = accepted(parseDtc('po456'));
    expect(value.code).toBe('P0456');
    expect(value.corrections).toEqual([
      expect.objectContaining({ position: 2, from: 'O', to: '0', message: expect.stringMatching(/position 2/i) }),
    ]);
  });

  it('reports each repaired position (O in positions 2–5)', () => {
    const value = accepted(parseDtc('UO1OO'));
    expect(value.code).toBe('U0100');
    expect(value.corrections.map((c) => c.position)).toEqual([2, 4, 5]);
  });

  it('does not treat an O in position 1 as a digit', () => {
    const result = parseDtc('O0456');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error.position).toBe(1);
  });

  it('trims and upper-cases without reporting a correction', () => {
    const value = accepted(parseDtc('  p0456\t'));
    expect(value.code).toBe('P0456');
    expect(value.display).toBe('P0456');
    expect(value.corrections).toEqual([]);
    expect(value.inputForm).toBe('text');
    expect(value.failureType).toBeNull();
  });

  // Bytes per the J1979 layout of domain reference §2.1: 04 56 = 00·00·0100 0101 0110 = P0456.
  it.each(['04 56', '0456', '0x0456', '0X04 56', '04  56'])('reads the two-byte hex form %j as P0456', (input) => {
    const value = accepted(parseDtc(input));
    expect(value.code).toBe('P0456');
    expect(value.bytes).toBe('04 56');
    expect(value.inputForm).toBe('hex2');
  });

  it.each([
    ['04 56 13', 'hex3'],
    ['045613', 'hex3'],
    ['P0456-13', 'text-ftb'],
    ['P0456 13', 'text-ftb'],
    ['p0456 - 13', 'text-ftb'],
  ])('reads the three-byte form %j with its failure-type byte', (input, form) => {
    const value = accepted(parseDtc(input));
    expect(value.code).toBe('P0456');
    expect(value.display).toBe('P0456-13');
    expect(value.bytes).toBe('04 56 13');
    expect(value.inputForm).toBe(form);
    // 0x13 = general electrical, open circuit (ISO 14229-1 Annex D / SAE J2012-DA, from memory per domain reference §2.2)
    expect(value.failureType).toEqual(
      expect.objectContaining({ byte: 0x13, hex: '13', category: expect.stringMatching(/electrical/i) }),
    );
    expect(value.failureType?.description).toMatch(/open/i);
  });

  it('reads spaced bytes that begin with a letter as hex (C1 00 = U0100, domain reference §2.1 [calc])', () => {
    expect(accepted(parseDtc('C1 00')).code).toBe('U0100');
  });

  it('normaliseDtc returns the code or null', () => {
    expect(normaliseDtc('po456')).toBe('P0456');
    expect(normaliseDtc('04 56 13')).toBe('P0456');
    expect(normaliseDtc('P4123')).toBeNull();
  });
});

describe('parseDtc rejections name the position and what was expected', () => {
  // [input, position, message pattern]; positions are 1-based in the trimmed input.
  const cases: [string, number | null, RegExp][] = [
    ['', null, /empty/i],
    ['   ', null, /empty/i],
    ['P'.repeat(25), 25, /too long.*25.*24/i],
    ['P04é6', 4, /position 4.*U\+00E9/i],
    ['P0🚗56', 3, /position 3/i],
    ['P9', 3, /too short/i],
    ['PGGGG', 2, /position 2.*0, 1, 2 or 3/i],
    ['P0GGG', 3, /position 3.*hexadecimal/i],
    ['P04G6', 4, /position 4.*hexadecimal.*'G'/i],
    ['X0123', 1, /position 1.*P, C, B or U/i],
    ['P4123', 2, /position 2.*0, 1, 2 or 3.*'4'/i],
    ['0000', 1, /padding/i],
    ['00 00', 1, /padding/i],
    ['0x0000', 3, /padding/i],
    ['P0000', 1, /padding/i],
    ['C100', 5, /too short.*C1 00/i],
    ['P045613', 6, /too long.*P0456-13/i],
    ['P0456-', 7, /failure-type byte/i],
    ['P0456-1G', 8, /position 8.*'G'/i],
    ['P0456-1', 8, /two hex digits/i],
    ['P0456-133', 9, /too long/i],
    ['04 5', 4, /two hex digits each/i],
    ['04567', 6, /got 5 hex digits/i],
    ['04 56 13 22', 10, /got 8 hex digits/i],
    ['0x', 3, /after 0x/i],
    ['0456-13', 5, /position 5.*'-'.*spaces/i],
    ['P0 456', 3, /position 3.*written together/i],
  ];

  it.each(cases)('%j → position %p', (input, position, pattern) => {
    const result = parseDtc(input);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.error.position).toBe(position);
    expect(result.error.message).toMatch(pattern);
    expect(result.error.input).toBe(input.trim());
  });

  it('rejects an inner line break by position', () => {
    const result = parseDtc('P04\n56');
    expect(result).toEqual({ ok: false, error: expect.objectContaining({ position: 4 }) });
  });

  it.each([undefined, null, 42, {}, Object.create(null) as object, Symbol('x'), ['P0456']])(
    'returns an error instead of throwing for the non-string %p',
    (value) => {
      const result = parseDtc(value as unknown as string);
      expect(result.ok).toBe(false);
      if (!result.ok) {
        expect(result.error.position).toBeNull();
        expect(result.error.message).toMatch(/expected text/i);
      }
    },
  );
});

describe('range control by letter and second character (SAE J2012 §1 table, domain reference §1)', () => {
  // [code, control]
  const rows: [string, 'sae' | 'manufacturer' | 'reserved', string][] = [
    ['P0456', 'sae', 'J2012 table (domain reference §1)'],
    ['P1456', 'manufacturer', 'J2012 table (domain reference §1)'],
    ['P2456', 'sae', 'J2012 table (domain reference §1)'],
    // P3 split: [std][mem], from memory; python-OBD defining P3400 supports the P34xx entry
    ['P3000', 'manufacturer', 'from memory'],
    ['P33FF', 'manufacturer', 'from memory'],
    ['P3400', 'sae', 'from memory; python-OBD obd/codes.py defines P3400'],
    ['P3FFF', 'sae', 'from memory'],
    // B and C rows: table of contents of SAE J2012 DEC2007 §5.4–5.5 (public copy)
    ['B0001', 'sae', 'J2012 DEC2007 §5.4–5.5'],
    ['B1001', 'manufacturer', 'J2012 DEC2007 §5.4–5.5'],
    ['B2001', 'manufacturer', 'J2012 DEC2007 §5.4–5.5'],
    ['B3001', 'reserved', 'J2012 DEC2007 §5.4–5.5'],
    ['C0035', 'sae', 'J2012 DEC2007 §5.4–5.5'],
    ['C1035', 'manufacturer', 'J2012 DEC2007 §5.4–5.5'],
    ['C2035', 'manufacturer', 'J2012 DEC2007 §5.4–5.5 (scapy wrongly says generic)'],
    ['C3035', 'reserved', 'J2012 DEC2007 §5.4–5.5'],
    ['U0100', 'sae', 'J2012 table (domain reference §1)'],
    ['U1100', 'manufacturer', 'J2012 table (domain reference §1)'],
    ['U2100', 'manufacturer', 'J2012 table (domain reference §1)'],
    // U3: reserved in 2007, later assigned by ISO/SAE — from memory
    ['U3000', 'reserved', 'from memory'],
  ];

  it.each(rows)('%s is %s (%s)', (code, control) => {
    expect(classifyDtc(code).control).toBe(control);
    expect(accepted(parseDtc(code)).control).toBe(control);
  });

  it('labels the generic range and the U3 caveat in words', () => {
    expect(classifyDtc('P0420').controlLabel).toBe('SAE/ISO-defined (generic)');
    expect(classifyDtc('P1420').controlLabel).toMatch(/manufacturer/i);
    const u3 = classifyDtc('U3000');
    expect(u3.controlNote).toMatch(/U3000/);
    expect(u3.controlNote).toMatch(/from memory/);
    expect(classifyDtc('U0100').controlNote).toBeNull();
  });

  it.each([
    ['P0420', 'P', 'Powertrain'],
    ['C0123', 'C', 'Chassis'],
    ['B0003', 'B', 'Body'],
    ['U0100', 'U', 'Network'],
  ])('%s belongs to system %s (%s) — J2012 letter, domain reference §1', (code, system, name) => {
    expect(classifyDtc(code)).toEqual(expect.objectContaining({ system, systemName: name }));
  });
});

describe('third-character groups (SAE J2012 2002/2007 — from memory, domain reference §1)', () => {
  // The first code of each group in python-OBD obd/codes.py fits the group (domain reference §1).
  it.each([
    ['P0456', /auxiliary emission controls \(EGR, catalyst, EVAP\)/i],
    ['P0171', /fuel and air metering/i],
    ['P0201', /injector/i],
    ['P0300', /ignition|misfire/i],
    ['P0500', /vehicle speed/i], // python-OBD: P0500 vehicle speed sensor
    ['P0600', /computer/i], // python-OBD: P0600 serial communication link
    ['P0700', /transmission/i],
    ['P0900', /transmission/i],
    ['P0A80', /hybrid/i],
    ['P0C00', /hybrid/i],
    ['P0D00', /hybrid\/EV/i], // Wal33D/dtc-database: P0D00 "Control Pilot…" (domain reference §1 note)
    ['P2300', /ignition|misfire/i],
    ['P2400', /auxiliary emission/i],
    ['P2700', /transmission/i], // python-OBD: P2700 transmission friction element
    ['P2A00', /fuel and air metering/i],
    ['P2B4A', /hybrid\/EV/i],
  ])('%s → %p', (code, pattern) => {
    expect(classifyDtc(code).group).toMatch(pattern);
  });

  it('gives a generic group elsewhere', () => {
    expect(classifyDtc('P1456').group).toMatch(/manufacturer/i);
    expect(classifyDtc('B0001').group).toBe('Body');
    expect(classifyDtc('C0035').group).toBe('Chassis');
    expect(classifyDtc('U0100').group).toBe('Network communication');
    expect(classifyDtc('U3000').group).toMatch(/reserved/i);
  });
});

describe('strict functions throw RangeError naming the problem', () => {
  it.each(['p0456', ' P0456', 'P4123', 'P0000', '', 'P0456-13'])('encodeDtc(%j)', (input) => {
    expect(() => encodeDtc(input)).toThrow(RangeError);
    expect(() => classifyDtc(input)).toThrow(RangeError);
  });

  it('points to the normal form when the input only needs normalising', () => {
    expect(() => encodeDtc('po456')).toThrow(/"P0456"/);
    expect(() => encodeDtc('P4123')).toThrow(/Position 2/);
  });

  it('decodeDtcWithFailureType refuses padding and non-bytes', () => {
    expect(() => decodeDtcWithFailureType(0, 0, 0x13)).toThrow(/padding/);
    expect(() => decodeDtcWithFailureType(4, 0x20, 256)).toThrow(/failure-type byte/);
  });
});
