/**
 * Responses to SAE J1979 services $03 (stored), $07 (pending) and $0A (permanent codes).
 *
 * CAN framing: response byte, a count byte, then that many two-byte codes ('43 02 01 04 80 03').
 * Older links send no count byte and pad each frame with 00 00 pairs ('43 01 04 00 00 00 00').
 * A response byte followed by an odd number of bytes therefore carries a count; an even number
 * does not.
 */

import { byteHex } from './failure-type';
import { decodeDtc, type DtcParseError } from './codec';
import { showValue } from './show-value';

export type ObdDtcService = '03' | '07' | '0A';
export type ObdFraming = 'can' | 'legacy';

export interface ObdDtcResponse {
  service: ObdDtcService;
  framing: ObdFraming;
  /** Codes in the order sent; 00 00 padding dropped. */
  codes: string[];
}

export type ObdResponseResult = { ok: true; value: ObdDtcResponse } | { ok: false; error: DtcParseError };

/** Longest response text examined; a full CAN response of 255 codes is about 1,540 characters. */
export const OBD_RESPONSE_MAX_LENGTH = 4096;

const SERVICES: Readonly<Record<number, ObdDtcService>> = { 0x43: '03', 0x47: '07', 0x4a: '0A' };
const REQUESTS = new Set([0x03, 0x07, 0x0a]);

interface PositionedByte {
  value: number;
  /** 1-based position of the byte's first digit in the trimmed input. */
  position: number;
}

function fail(input: string, position: number | null, message: string): ObdResponseResult {
  return { ok: false, error: { input, position, message } };
}

type ByteReadResult = { ok: true; bytes: PositionedByte[] } | { ok: false; position: number; message: string };

/** Spaced bytes ('43 02 01 04') or contiguous digits ('43020104'); line breaks count as spaces. */
function readBytes(text: string): ByteReadResult {
  const groups: { digits: string; position: number }[] = [];
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (/\s/.test(ch)) continue;
    if (!/[0-9A-Fa-f]/.test(ch)) {
      const cp = ch.codePointAt(0) ?? 0;
      const shown = cp >= 0x21 && cp <= 0x7e ? `'${ch}'` : `U+${cp.toString(16).toUpperCase().padStart(4, '0')}`;
      return { ok: false, position: i + 1, message: `Position ${i + 1}: expected a hexadecimal digit (0–9, A–F), got ${shown}` };
    }
    if (i > 0 && !/\s/.test(text[i - 1])) {
      groups[groups.length - 1].digits += ch;
    } else {
      groups.push({ digits: ch, position: i + 1 });
    }
  }
  const spaced = groups.length > 1;
  const bytes: PositionedByte[] = [];
  for (const group of groups) {
    if (spaced && group.digits.length !== 2) {
      const position = group.digits.length > 2 ? group.position + 2 : group.position;
      return { ok: false, position, message: `Position ${position}: bytes separated by spaces take two hex digits each` };
    }
    if (group.digits.length % 2 !== 0) {
      const position = group.position + group.digits.length;
      return { ok: false, position, message: `Position ${position}: odd number of hex digits; each byte takes two` };
    }
    for (let k = 0; k < group.digits.length; k += 2) {
      bytes.push({ value: parseInt(group.digits.slice(k, k + 2), 16), position: group.position + k });
    }
  }
  return { ok: true, bytes };
}

function pairsToCodes(pairs: PositionedByte[]): string[] {
  const codes: string[] = [];
  for (let i = 0; i + 1 < pairs.length; i += 2) {
    const code = decodeDtc(pairs[i].value, pairs[i + 1].value);
    if (code !== null) codes.push(code);
  }
  return codes;
}

/**
 * Decodes a $03/$07/$0A response written as hex. Never throws: problems come back as an error
 * naming the position in the trimmed input.
 */
export function decodeObdResponse(hex: string): ObdResponseResult {
  const raw: unknown = hex;
  if (typeof raw !== 'string') return fail('', null, `Expected text, got ${showValue(raw)}`);
  const trimmed = raw.trim();
  if (trimmed === '') return fail(trimmed, null, 'Empty: paste the response bytes, e.g. 43 02 01 04 80 03');
  if (trimmed.length > OBD_RESPONSE_MAX_LENGTH) {
    return fail(trimmed, OBD_RESPONSE_MAX_LENGTH + 1, `Too long: ${trimmed.length} characters, at most ${OBD_RESPONSE_MAX_LENGTH}`);
  }
  const read = readBytes(trimmed);
  if (!read.ok) return fail(trimmed, read.position, read.message);
  const [head, ...rest] = read.bytes;

  if (head.value === 0x7f) {
    const detail =
      rest.length >= 2
        ? `: service $${byteHex(rest[0].value)} refused with reason code ${byteHex(rest[1].value)}`
        : '';
    return fail(trimmed, 1, `Position 1: negative response (7F)${detail}`);
  }
  const service = SERVICES[head.value];
  if (service === undefined) {
    const hint = REQUESTS.has(head.value) ? ' (that is the request; paste the response)' : '';
    return fail(
      trimmed,
      1,
      `Position 1: expected a response to service $03, $07 or $0A (first byte 43, 47 or 4A), got ${byteHex(head.value)}${hint}`,
    );
  }
  if (rest.length === 0) {
    const position = trimmed.length + 1;
    return fail(trimmed, position, `Position ${position}: expected a count byte or code bytes after ${byteHex(head.value)}`);
  }

  if (rest.length % 2 === 0) {
    return { ok: true, value: { service, framing: 'legacy', codes: pairsToCodes(rest) } };
  }

  const [countByte, ...pairs] = rest;
  const count = countByte.value;
  const available = pairs.length / 2;
  if (count > available) {
    return fail(
      trimmed,
      countByte.position,
      `Position ${countByte.position}: count byte says ${count} code${count === 1 ? '' : 's'} but ${available} follow${available === 1 ? 's' : ''}`,
    );
  }
  const counted = pairs.slice(0, count * 2);
  // Bytes after the counted codes are tolerated only as 00 padding, as some adapters add it.
  const extra = pairs.slice(count * 2).find((b) => b.value !== 0);
  if (extra) {
    return fail(
      trimmed,
      extra.position,
      `Position ${extra.position}: count byte says ${count} code${count === 1 ? '' : 's'} but more bytes follow`,
    );
  }
  return { ok: true, value: { service, framing: 'can', codes: pairsToCodes(counted) } };
}
