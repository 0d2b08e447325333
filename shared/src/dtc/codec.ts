/**
 * Fault-code codec: the five-character text form (SAE J2012 / ISO 15031-6) and the two-byte
 * form of SAE J1979 services $03/$07/$0A, plus the three-byte UDS form whose third byte is the
 * failure type (ISO 14229-1).
 *
 * Two-byte layout:
 *   byte A: b7b6 letter (00 P, 01 C, 10 B, 11 U) | b5b4 second character 0–3 | b3–b0 third (hex)
 *   byte B: b7–b4 fourth character (hex)          | b3–b0 fifth character (hex)
 * Positions 3–5 are hexadecimal; reading them as decimal mangles codes such as P2B4A.
 */

import { classifyValidCode, type DtcClassification, type DtcSystem } from './classify';
import { byteHex, describeFailureType, isByte, type FailureTypeInfo } from './failure-type';
import { showValue } from './show-value';

export type DtcInputForm = 'text' | 'text-ftb' | 'hex2' | 'hex3';

export interface DtcCorrection {
  /** 1-based position in the trimmed input. */
  position: number;
  from: string;
  to: string;
  message: string;
}

export interface DtcStructure extends DtcClassification {
  /** Normalised five characters, e.g. 'P0456'. */
  code: string;
  /** 'P0456', or 'P0456-13' when a failure-type byte was given. */
  display: string;
  /** Upper-case hex bytes, '04 56' or '04 56 13'. */
  bytes: string;
  failureType: FailureTypeInfo | null;
  inputForm: DtcInputForm;
  corrections: DtcCorrection[];
}

export interface DtcParseError {
  /** The input after trimming, which `position` refers to ('' when the input was not text). */
  input: string;
  /** 1-based position in `input` where the problem is, or null when it concerns the whole. */
  position: number | null;
  message: string;
}

export type DtcParseResult = { ok: true; value: DtcStructure } | { ok: false; error: DtcParseError };

/** Longest input examined; the longest accepted form ('0x04 56 13' with extra spaces) is far shorter. */
export const DTC_INPUT_MAX_LENGTH = 24;

const LETTERS: readonly DtcSystem[] = ['P', 'C', 'B', 'U'];
const HEX_DIGIT = /^[0-9A-F]$/;
const CANONICAL_CODE = /^[PCBU][0-3][0-9A-F]{3}$/;
const PADDING_MESSAGE = '00 00 is padding, not a code';

function fail(input: string, position: number | null, message: string): DtcParseResult {
  return { ok: false, error: { input, position, message } };
}

function showChar(ch: string): string {
  const cp = ch.codePointAt(0) ?? 0;
  if (cp >= 0x21 && cp <= 0x7e) return `'${ch}'`;
  if (ch === ' ') return 'a space';
  return `U+${cp.toString(16).toUpperCase().padStart(4, '0')}`;
}

function isWhitespace(ch: string): boolean {
  return ch === ' ' || ch === '\t';
}

function encodeValidCode(code: string): [number, number] {
  const high = (LETTERS.indexOf(code[0] as DtcSystem) << 6) | (Number(code[1]) << 4) | parseInt(code[2], 16);
  return [high, parseInt(code.slice(3), 16)];
}

function decodeValidBytes(high: number, low: number): string {
  const second = (high >> 4) & 0x3;
  const third = (high & 0xf).toString(16).toUpperCase();
  return `${LETTERS[high >> 6]}${second}${third}${byteHex(low)}`;
}

function buildStructure(
  code: string,
  ftb: number | null,
  inputForm: DtcInputForm,
  corrections: DtcCorrection[],
): DtcStructure {
  const [high, low] = encodeValidCode(code);
  const byteList = ftb === null ? [high, low] : [high, low, ftb];
  return {
    code,
    display: ftb === null ? code : `${code}-${byteHex(ftb)}`,
    ...classifyValidCode(code),
    bytes: byteList.map(byteHex).join(' '),
    failureType: ftb === null ? null : describeFailureType(ftb),
    inputForm,
    corrections,
  };
}

/**
 * Reads hex bytes: either contiguous digits ('0456') or two-digit groups separated by spaces
 * ('04 56 13'). `start` skips an already-checked '0x' prefix.
 */
function parseHexForm(trimmed: string, upper: string, start: number): DtcParseResult {
  const digits: { value: number; position: number }[] = [];
  const groups: { position: number; length: number }[] = [];
  for (let i = start; i < upper.length; i++) {
    const ch = upper[i];
    if (isWhitespace(ch)) continue;
    if (!HEX_DIGIT.test(ch)) {
      const hint = ch === '-' ? '; separate bytes with spaces, e.g. 04 56 13' : '';
      return fail(trimmed, i + 1, `Position ${i + 1}: expected a hexadecimal digit (0–9, A–F), got ${showChar(ch)}${hint}`);
    }
    if (i > start && !isWhitespace(upper[i - 1])) {
      groups[groups.length - 1].length++;
    } else {
      groups.push({ position: i + 1, length: 1 });
    }
    digits.push({ value: parseInt(ch, 16), position: i + 1 });
  }
  if (digits.length === 0) {
    return fail(trimmed, start + 1, `Position ${start + 1}: expected hex digits after 0x, e.g. 0x0456`);
  }
  if (groups.length > 1) {
    const bad = groups.find((g) => g.length !== 2);
    if (bad) {
      const position = bad.length > 2 ? bad.position + 2 : bad.position;
      return fail(trimmed, position, `Position ${position}: bytes separated by spaces take two hex digits each, e.g. 04 56 13`);
    }
  }
  if (digits.length !== 4 && digits.length !== 6) {
    const position = digits.length > 6 ? digits[6].position : digits[digits.length - 1].position + 1;
    return fail(
      trimmed,
      position,
      `Position ${position}: expected 2 bytes (4 hex digits, e.g. 04 56) or 3 bytes with a failure-type byte ` +
        `(6 hex digits, e.g. 04 56 13); got ${digits.length} hex digit${digits.length === 1 ? '' : 's'}`,
    );
  }
  const bytes: number[] = [];
  for (let i = 0; i < digits.length; i += 2) bytes.push(digits[i].value * 16 + digits[i + 1].value);
  if (bytes[0] === 0 && bytes[1] === 0) {
    return fail(trimmed, digits[0].position, `Position ${digits[0].position}: ${PADDING_MESSAGE}`);
  }
  const code = decodeValidBytes(bytes[0], bytes[1]);
  return { ok: true, value: buildStructure(code, bytes[2] ?? null, bytes.length === 3 ? 'hex3' : 'hex2', []) };
}

function parseTextForm(trimmed: string, upper: string): DtcParseResult {
  const first = upper[0];
  if (!LETTERS.includes(first as DtcSystem)) {
    return fail(trimmed, 1, `Position 1: expected P, C, B or U (or hex bytes such as 04 56), got ${showChar(first)}`);
  }

  let sepIndex = -1;
  for (let i = 0; i < upper.length; i++) {
    if (isWhitespace(upper[i]) || upper[i] === '-') {
      sepIndex = i;
      break;
    }
  }
  const head = sepIndex === -1 ? upper : upper.slice(0, sepIndex);

  if (head.length < 5) {
    if (sepIndex !== -1) {
      return fail(
        trimmed,
        sepIndex + 1,
        `Position ${sepIndex + 1}: ${showChar(upper[sepIndex])} inside the code; a fault code is 5 characters written together, e.g. P0456`,
      );
    }
    // 'C100' could be meant as the bytes C1 00; say how to write those unambiguously.
    const hexHint = /^[0-9A-F]{4}$/.test(head)
      ? `; for hex bytes starting with a letter, write them spaced (${head.slice(0, 2)} ${head.slice(2)}) or with 0x`
      : '';
    return fail(
      trimmed,
      head.length + 1,
      `Position ${head.length + 1}: too short; a fault code has 5 characters (a letter and 4 digits), e.g. P0456${hexHint}`,
    );
  }
  if (head.length > 5) {
    const ftbHint = head.length === 7 ? '; write a failure-type byte after a dash, e.g. P0456-13' : '';
    return fail(trimmed, 6, `Position 6: too long; a fault code has 5 characters, e.g. P0456${ftbHint}`);
  }

  const corrections: DtcCorrection[] = [];
  const chars = head.split('');
  for (let i = 1; i < 5; i++) {
    const position = i + 1;
    if (chars[i] === 'O') {
      corrections.push({
        position,
        from: 'O',
        to: '0',
        message: `Position ${position}: letter O read as digit 0`,
      });
      chars[i] = '0';
    }
    const ch = chars[i];
    if (i === 1 && !/^[0-3]$/.test(ch)) {
      return fail(
        trimmed,
        position,
        `Position 2: expected 0, 1, 2 or 3, got ${showChar(ch)} (the second character is 2 bits in the encoded form)`,
      );
    }
    if (i > 1 && !HEX_DIGIT.test(ch)) {
      return fail(trimmed, position, `Position ${position}: expected a hexadecimal digit (0–9, A–F), got ${showChar(ch)}`);
    }
  }
  const code = chars.join('');
  if (code === 'P0000') {
    return fail(trimmed, 1, `Position 1: P0000 is the all-zero value; ${PADDING_MESSAGE}`);
  }
  if (sepIndex === -1) {
    return { ok: true, value: buildStructure(code, null, 'text', corrections) };
  }

  // Failure-type byte after a dash and/or spaces: 'P0456-13', 'P0456 13', 'P0456 - 13'.
  let j = sepIndex;
  while (j < upper.length && isWhitespace(upper[j])) j++;
  if (upper[j] === '-') j++;
  while (j < upper.length && isWhitespace(upper[j])) j++;
  const tail = upper.slice(j);
  const expected = 'a failure-type byte of two hex digits after the code, e.g. P0456-13';
  if (tail.length === 0) {
    return fail(trimmed, j + 1, `Position ${j + 1}: expected ${expected}`);
  }
  for (let k = 0; k < tail.length; k++) {
    const position = j + k + 1;
    if (k >= 2) return fail(trimmed, position, `Position ${position}: too long; expected ${expected}`);
    if (!HEX_DIGIT.test(tail[k])) {
      return fail(trimmed, position, `Position ${position}: expected ${expected}, got ${showChar(tail[k])}`);
    }
  }
  if (tail.length === 1) {
    return fail(trimmed, j + 2, `Position ${j + 2}: expected ${expected} (write 03, not 3)`);
  }
  return { ok: true, value: buildStructure(code, parseInt(tail, 16), 'text-ftb', corrections) };
}

/**
 * Parses a fault code as a person or a scan tool wrote it. Never throws, whatever it is given.
 *
 * Accepted: 'P0456' (any case, letter O repaired to digit 0 in positions 2–5 and reported),
 * 'P0456-13' or 'P0456 13' (with failure-type byte), hex bytes '04 56', '0456', '0x0456',
 * '04 56 13', '045613'. Contiguous hex must start with a digit or '0x'; 'C100' is read as a
 * short code, while 'C1 00' is read as bytes. Everything else is rejected with the position
 * and what was expected there.
 */
export function parseDtc(input: string): DtcParseResult {
  const raw: unknown = input;
  if (typeof raw !== 'string') {
    return fail('', null, `Expected text, got ${showValue(raw)}`);
  }
  const trimmed = raw.trim();
  if (trimmed === '') {
    return fail(trimmed, null, 'Empty: enter a fault code such as P0456, or its bytes such as 04 56');
  }
  const chars = Array.from(trimmed);
  if (chars.length > DTC_INPUT_MAX_LENGTH) {
    const position = DTC_INPUT_MAX_LENGTH + 1;
    return fail(trimmed, position, `Too long: ${chars.length} characters, at most ${DTC_INPUT_MAX_LENGTH}`);
  }
  const badIndex = chars.findIndex((ch) => {
    const cp = ch.codePointAt(0) ?? 0;
    return !(ch === '\t' || (cp >= 0x20 && cp <= 0x7e));
  });
  if (badIndex !== -1) {
    const position = badIndex + 1;
    return fail(
      trimmed,
      position,
      `Position ${position}: ${showChar(chars[badIndex])} is not used in fault codes (expected letters, digits, spaces or '-')`,
    );
  }
  const upper = trimmed.toUpperCase();
  if (upper.startsWith('0X')) return parseHexForm(trimmed, upper, 2);
  if (/^[0-9]/.test(upper) || /^[0-9A-F]{2}([ \t]+[0-9A-F]{2})+$/.test(upper)) {
    return parseHexForm(trimmed, upper, 0);
  }
  return parseTextForm(trimmed, upper);
}

/** The normalised five-character code, or null when `input` is not a valid code. */
export function normaliseDtc(input: string): string | null {
  const result = parseDtc(input);
  return result.ok ? result.value.code : null;
}

/** True for a code already in normal form: upper case, five characters, not the padding value. */
export function isNormalDtc(code: string): boolean {
  return typeof code === 'string' && CANONICAL_CODE.test(code) && code !== 'P0000';
}

function requireNormalCode(code: string, what: string): string {
  if (isNormalDtc(code)) return code;
  const parsed = parseDtc(code);
  const reason = parsed.ok
    ? `not in normal form; use ${JSON.stringify(parsed.value.code)} (see parseDtc)`
    : parsed.error.message;
  throw new RangeError(`${what}: invalid fault code ${showValue(code)}: ${reason}`);
}

function requireByte(value: number, name: string): void {
  if (!isByte(value)) throw new RangeError(`${name}: expected an integer 0–255, got ${showValue(value)}`);
}

/**
 * The two J1979 bytes of a normalised code (e.g. 'P0456' → [0x04, 0x56]). Throws RangeError for
 * anything not in normal form; parse user input with `parseDtc` first.
 */
export function encodeDtc(code: string): [number, number] {
  return encodeValidCode(requireNormalCode(code, 'encodeDtc'));
}

/** The code for two J1979 bytes; null for 00 00, which is padding. Throws RangeError unless both are bytes. */
export function decodeDtc(high: number, low: number): string | null {
  requireByte(high, 'high byte');
  requireByte(low, 'low byte');
  if (high === 0 && low === 0) return null;
  return decodeValidBytes(high, low);
}

/** A UDS three-byte code for display, e.g. (0x04, 0x20, 0x00) → 'P0420-00'. Throws RangeError on 00 00 padding. */
export function decodeDtcWithFailureType(high: number, mid: number, ftb: number): string {
  requireByte(high, 'high byte');
  requireByte(mid, 'middle byte');
  requireByte(ftb, 'failure-type byte');
  if (high === 0 && mid === 0) throw new RangeError(`high and middle byte: ${PADDING_MESSAGE}`);
  return `${decodeValidBytes(high, mid)}-${byteHex(ftb)}`;
}

/** System, range control and default group of a normalised code. Throws RangeError otherwise. */
export function classifyDtc(code: string): DtcClassification {
  return classifyValidCode(requireNormalCode(code, 'classifyDtc'));
}
