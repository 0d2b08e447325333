import fc from 'fast-check';
import {
  decodeDtcWithFailureType,
  decodeObdResponse,
  decodeStatusByte,
  describeFailureType,
  parseDtc,
  parseStatusByte,
} from '../src/dtc';

describe('status byte of UDS $19 (ISO 14229-1)', () => {
  // Bit names b0→b7 as in wireshark/wireshark@00c67067 epan/dissectors/packet-uds.c and
  // scapy uds.py dtcStatus (domain reference §2.2).
  const names = [
    'testFailed',
    'testFailedThisOperationCycle',
    'pendingDTC',
    'confirmedDTC',
    'testNotCompletedSinceLastClear',
    'testFailedSinceLastClear',
    'testNotCompletedThisOperationCycle',
    'warningIndicatorRequested',
  ];

  it('names the bits b0 to b7', () => {
    expect(decodeStatusByte(0).map((b) => b.name)).toEqual(names);
    expect(decodeStatusByte(0).map((b) => b.bit)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
  });

  it('0x2F sets b0, b1, b2, b3 and b5 (domain reference §2.2 example)', () => {
    const set = decodeStatusByte(0x2f).filter((b) => b.set);
    expect(set.map((b) => b.bit)).toEqual([0, 1, 2, 3, 5]);
    expect(set.map((b) => b.name)).toEqual([names[0], names[1], names[2], names[3], names[5]]);
  });

  it('every byte round-trips through its bits', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 255 }), (status) => {
        const bits = decodeStatusByte(status);
        expect(bits.reduce((acc, b) => acc | (b.set ? 1 << b.bit : 0), 0)).toBe(status);
      }),
    );
  });

  it('refuses a value that is not a byte', () => {
    expect(() => decodeStatusByte(256)).toThrow(/status byte/);
    expect(() => decodeStatusByte(-1)).toThrow(RangeError);
  });

  it.each([
    ['0x2F', 0x2f],
    ['2F', 0x2f],
    ['2f', 0x2f],
    ['$2F', 0x2f],
    ['47', 0x47], // hexadecimal, as status bytes are shown in ISO 14229-1 and by scan tools (common practice)
    ['8', 0x08],
    [' 08 ', 0x08],
  ])('parseStatusByte(%j) = %d', (input, value) => {
    expect(parseStatusByte(input)).toBe(value);
  });

  it.each(['', '100', 'G1', '0x', '2F 2F', '-1'])('parseStatusByte(%j) is null', (input) => {
    expect(parseStatusByte(input)).toBeNull();
  });
});

describe('report $19 02 taken apart piece by piece (domain reference §2.2)', () => {
  // 59 02 FF 04 20 00 08 = positive response to $19 (0x19 + 0x40), sub-function 02, availability
  // mask FF, DTC 04 20 00, status 08 → P0420-00, confirmed (domain reference §2.2; scapy uds.py DTC
  // class: 2 + 2 + 12 bits + additional information code).
  const bytes = '59 02 FF 04 20 00 08'.split(' ').map((b) => parseInt(b, 16));

  it('reads P0420-00 with status confirmed', () => {
    expect(bytes[0]).toBe(0x19 + 0x40);
    expect(decodeDtcWithFailureType(bytes[3], bytes[4], bytes[5])).toBe('P0420-00');
    const parsed = parseDtc('04 20 00');
    expect(parsed.ok && parsed.value.display).toBe('P0420-00');
    const set = decodeStatusByte(bytes[6]).filter((b) => b.set);
    expect(set.map((b) => b.name)).toEqual(['confirmedDTC']);
  });
});

describe('failure-type byte categories (ISO 14229-1 Annex D / SAE J2012-DA — from memory, domain reference §2.2)', () => {
  it.each([
    [0x00, /no sub-type/i, /no sub-type/i],
    [0x11, /general electrical/i, /short to ground/i],
    [0x12, /general electrical/i, /short to battery/i],
    [0x13, /general electrical/i, /open/i],
    [0x1f, /general electrical/i, /intermittent/i],
    [0x23, /general signal/i, /stuck low/i],
    [0x2f, /general signal/i, /erratic/i],
    [0x31, /frequency|PWM/i, /no signal/i],
    [0x42, /internal/i, /memory/i],
    [0x54, /programming/i, /calibration/i],
    [0x64, /algorithm/i, /plausibility/i],
    [0x72, /mechanical/i, /stuck open/i],
    [0x87, /bus|message/i, /missing message/i],
    [0x92, /component/i, /performance/i],
  ])('0x%s', (byte, category, description) => {
    const info = describeFailureType(byte);
    expect(info.category).toMatch(category);
    expect(info.description).toMatch(description);
    expect(info.hex).toBe(byte.toString(16).toUpperCase().padStart(2, '0'));
  });

  it('0xF0–0xFF are manufacturer-specific (from memory) and 0xA0–0xEF gaps are reserved', () => {
    expect(describeFailureType(0xf3)).toEqual({ byte: 0xf3, hex: 'F3', category: 'Manufacturer-specific', description: null });
    for (let byte = 0xa0; byte <= 0xef; byte++) expect(describeFailureType(byte).category).toBe('Reserved');
    for (let byte = 0xf0; byte <= 0xff; byte++) expect(describeFailureType(byte).category).toBe('Manufacturer-specific');
  });

  it('values without common wording keep their category but no description', () => {
    const info = describeFailureType(0x1e);
    expect(info.category).toMatch(/general electrical/i);
    expect(info.description).toBeNull();
  });

  it('refuses a value that is not a byte', () => {
    expect(() => describeFailureType(0x100)).toThrow(/failure-type byte/);
  });
});

describe('decodeObdResponse ($03/$07/$0A, SAE J1979)', () => {
  it('reads CAN framing with a count byte: 43 02 01 04 80 03 = P0104 + B0003 (domain reference §2.1)', () => {
    expect(decodeObdResponse('43 02 01 04 80 03')).toEqual({
      ok: true,
      value: { service: '03', framing: 'can', codes: ['P0104', 'B0003'] },
    });
    expect(decodeObdResponse('430201048003')).toEqual(decodeObdResponse('43 02 01 04 80 03'));
  });

  it('maps response bytes 47 and 4A to services $07 and $0A (SAE J1979: response = request + 0x40)', () => {
    const pending = decodeObdResponse('47 01 04 20');
    expect(pending.ok && pending.value).toEqual({ service: '07', framing: 'can', codes: ['P0420'] });
    const permanent = decodeObdResponse('4a 01 c1 00');
    expect(permanent.ok && permanent.value).toEqual({ service: '0A', framing: 'can', codes: ['U0100'] });
  });

  it('reads legacy framing without a count byte and drops 00 00 padding (python-OBD protocol_legacy.py)', () => {
    const result = decodeObdResponse('43 01 04 80 03 00 00');
    expect(result.ok && result.value).toEqual({ service: '03', framing: 'legacy', codes: ['P0104', 'B0003'] });
    const none = decodeObdResponse('43 00 00 00 00 00 00');
    expect(none.ok && none.value).toEqual({ service: '03', framing: 'legacy', codes: [] });
  });

  it('reads a CAN response with no codes', () => {
    const result = decodeObdResponse('43 00');
    expect(result.ok && result.value.codes).toEqual([]);
  });

  it.each([
    ['', null, /empty/i],
    ['43 03 01 04 80 03', 4, /count byte says 3 codes but 2 follow/],
    ['43 01 01 04 80 03', 13, /more bytes follow/],
    ['03', 1, /request/],
    ['41 0C 1A F8', 1, /43, 47 or 4A/],
    ['7F 03 11', 1, /negative response.*\$03.*11/],
    ['43 0G', 5, /position 5.*'G'/i],
    ['43 020', 6, /two hex digits each/],
    ['43020', 6, /odd number/],
    ['43', 3, /count byte or code bytes/],
  ])('%j is refused at position %p', (input, position, pattern) => {
    const result = decodeObdResponse(input);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.error.position).toBe(position);
    expect(result.error.message).toMatch(pattern);
  });

  it('never throws, whatever it is given', () => {
    expect(decodeObdResponse(undefined as unknown as string).ok).toBe(false);
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: 'binary' }), fc.stringMatching(/^(4[37A] )?([0-9A-F]{2} ){0,8}$/)), (input) => {
        const result = decodeObdResponse(input);
        if (!result.ok) expect(result.error.message.length).toBeGreaterThan(0);
      }),
    );
  });
});
