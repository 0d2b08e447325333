import type { CodeStatus } from '@causeway/shared';
import { unitWord } from './mapping';

export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

const fail = (message: string): { ok: false; message: string } => ({ ok: false, message });

// ---------------------------------------------------------------- dates

export interface ScanTime {
  /** The instant, ms since the epoch (a time without an offset is taken as UTC). */
  instant: number;
  /** The calendar date as written, YYYY-MM-DD. */
  day: string;
}

const ISO = /^(\d{4})-(\d{1,2})-(\d{1,2})(?:[T ]+(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?)?$/i;
const NUMERIC = /^(\d{1,2})([/.])(\d{1,2})\2(\d{1,4})(?:[ T,]+(\d{1,2}):(\d{2})(?::(\d{2}))?\s*([ap]\.?m\.?)?)?$/i;
const TIME = /^(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,]\d{1,9})?)?\s*([ap]\.?m\.?)?$/i;

/** The earliest year taken as a scan date: OBD-II readers postdate it (common practice). */
const MIN_YEAR = 1980;
/** Scan tools in other time zones may run ahead of the server's clock by up to a day. */
const FUTURE_SLACK_MS = 36 * 3600 * 1000;

function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

function pad(n: number, w = 2): string {
  return String(n).padStart(w, '0');
}

function hour24(hour: number, meridiem: string | undefined): number | null {
  if (!meridiem) return hour <= 23 ? hour : null;
  if (hour < 1 || hour > 12) return null;
  const pm = meridiem.toLowerCase().startsWith('p');
  return (hour % 12) + (pm ? 12 : 0);
}

function build(year: number, month: number, day: number, hour: number, minute: number, second: number, ms: number, offsetMin: number, now: number): Parsed<ScanTime> {
  if (year < MIN_YEAR) return fail(`year ${year} is before ${MIN_YEAR}`);
  if (month < 1 || month > 12) return fail(`month ${month} does not exist`);
  if (day < 1 || day > daysInMonth(year, month)) return fail(`day ${day} does not exist in ${year}-${pad(month)}`);
  if (minute > 59 || second > 59) return fail('the time is not a time of day');
  const instant = Date.UTC(year, month - 1, day, hour, minute, second, ms) - offsetMin * 60_000;
  if (instant > now + FUTURE_SLACK_MS) return fail('is in the future');
  return { ok: true, value: { instant, day: `${pad(year, 4)}-${pad(month)}-${pad(day)}` } };
}

function parseTime(text: string): Parsed<[number, number, number]> {
  const m = TIME.exec(text);
  if (!m) return fail(`"${text}" is not a time of day (HH:mm or HH:mm:ss)`);
  const h = hour24(Number(m[1]), m[4]);
  if (h === null || Number(m[2]) > 59 || Number(m[3] ?? 0) > 59) return fail(`"${text}" is not a time of day`);
  return { ok: true, value: [h, Number(m[2]), Number(m[3] ?? 0)] };
}

/**
 * A scan date as scan tools and spreadsheets write it; `time` is a separate time-of-day cell.
 * Slash dates follow `order`; dotted dates are always day first. Two-digit years are refused.
 */
export function parseScanDate(text: string, time: string | undefined, order: 'DMY' | 'MDY', now: number): Parsed<ScanTime> {
  const s = text.trim();
  const t = time?.trim() ?? '';
  let extra: [number, number, number] | null = null;
  if (t !== '') {
    const pt = parseTime(t);
    if (!pt.ok) return pt;
    extra = pt.value;
  }
  const iso = ISO.exec(s);
  if (iso) {
    const [, y, mo, d, h, mi, se, frac, zone] = iso;
    let offset = 0;
    if (zone && zone.toUpperCase() !== 'Z') {
      const digits = zone.slice(1).replace(':', '');
      offset = (zone[0] === '-' ? -1 : 1) * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2) || 0));
      if (Math.abs(offset) > 14 * 60) return fail(`"${zone}" is not a UTC offset`);
    }
    const hour = h === undefined ? (extra?.[0] ?? 0) : Number(h);
    if (hour > 23) return fail(`hour ${hour} does not exist`);
    const minute = h === undefined ? (extra?.[1] ?? 0) : Number(mi);
    const second = h === undefined ? (extra?.[2] ?? 0) : Number(se ?? 0);
    const ms = frac ? Math.floor(Number(`0.${frac}`) * 1000) : 0;
    return build(Number(y), Number(mo), Number(d), hour, minute, second, ms, offset, now);
  }
  const num = NUMERIC.exec(s);
  if (num) {
    const [, a, sep, b, y, h, mi, se, mer] = num;
    if (y.length !== 4) return fail(`"${s}": write the year with four digits`);
    const dayFirst = sep === '.' || order === 'DMY';
    const day = Number(dayFirst ? a : b);
    const month = Number(dayFirst ? b : a);
    if (month > 12) {
      const how = sep === '.' ? 'DD.MM.YYYY' : dayFirst ? 'DD/MM/YYYY' : 'MM/DD/YYYY';
      const hint = sep === '/' ? `; set mapping.dateOrder to ${dayFirst ? 'MDY' : 'DMY'} if the file writes the ${dayFirst ? 'month' : 'day'} first` : '';
      return fail(`"${s}" has no month ${month}: this shop reads it as ${how}${hint}`);
    }
    let hour = extra?.[0] ?? 0;
    let minute = extra?.[1] ?? 0;
    let second = extra?.[2] ?? 0;
    if (h !== undefined) {
      const hh = hour24(Number(h), mer);
      if (hh === null) return fail(`"${s}": hour ${h}${mer ? ` ${mer}` : ''} does not exist`);
      hour = hh;
      minute = Number(mi);
      second = Number(se ?? 0);
    }
    return build(Number(y), month, day, hour, minute, second, 0, 0, now);
  }
  const order_ = order === 'MDY' ? 'MM/DD/YYYY' : 'DD/MM/YYYY';
  return fail(`"${s.slice(0, 40)}" is not a date; expected YYYY-MM-DD [HH:mm[:ss]] (ISO 8601), ${order_} [HH:mm] or DD.MM.YYYY [HH:mm]`);
}

// ---------------------------------------------------------------- odometer

/**
 * An odometer reading: digits with optional thousands separators (spaces, apostrophes, or ','/'.'
 * in groups of three), an optional decimal part and an optional unit word after the number.
 */
export function parseOdometer(text: string): Parsed<{ value: number; unit: 'km' | 'mi' | null }> {
  let s = text.trim();
  let unit: 'km' | 'mi' | null = null;
  const u = /^(.*?\d)\s*([a-z.]+)$/i.exec(s);
  if (u) {
    unit = unitWord(u[2]);
    if (!unit) return fail(`"${text.trim().slice(0, 40)}": "${u[2]}" is not a distance unit (km or mi)`);
    s = u[1];
  }
  s = s.replace(/[\s\u00a0\u202f']/g, '');
  let normal: string | null = null;
  if (/^\d+$/.test(s)) normal = s;
  else if (/^\d{1,3}(,\d{3})+(\.\d+)?$/.test(s)) normal = s.replace(/,/g, '');
  else if (/^\d{1,3}(\.\d{3})+(,\d+)?$/.test(s)) normal = s.replace(/\./g, '').replace(',', '.');
  else if (/^\d+[.,]\d+$/.test(s)) normal = s.replace(',', '.');
  if (normal === null) return fail(`"${text.trim().slice(0, 40)}" is not a distance (a number such as 123456 or 123,456.7)`);
  const value = Number(normal);
  if (!Number.isFinite(value)) return fail(`"${text.trim().slice(0, 40)}" is not a distance`);
  return { ok: true, value: { value, unit } };
}

/** Readings beyond this are typing errors (no road vehicle gets near it; common practice). */
export const MAX_ODOMETER_KM = 3_000_000;

// ---------------------------------------------------------------- status

/**
 * Status words scan tools use, lower case. 'confirmed' is the ISO 14229-1 name of a stored code;
 * the J1979 services are $03 stored, $07 pending, $0A permanent (domain-reference §2.1).
 */
const STATUS_WORDS: Record<string, CodeStatus> = {
  stored: 'stored', confirmed: 'stored', current: 'stored', active: 'stored', present: 'stored', hard: 'stored', matured: 'stored',
  'stored dtc': 'stored', 'confirmed dtc': 'stored', 'mode 03': 'stored', 'mode 3': 'stored', $03: 'stored', 'service 03': 'stored',
  pending: 'pending', 'pending dtc': 'pending', maturing: 'pending', soft: 'pending', 'mode 07': 'pending', 'mode 7': 'pending', $07: 'pending', 'service 07': 'pending',
  permanent: 'permanent', 'permanent dtc': 'permanent', perm: 'permanent', 'mode 0a': 'permanent', $0a: 'permanent', 'service 0a': 'permanent',
};

/** Words for codes that are no longer a current fault: refused unless the mapping says otherwise. */
const HISTORY_WORDS = new Set(['history', 'historic', 'historical', 'inactive', 'past', 'cleared', 'old']);

/**
 * A code status. Empty means stored (what a plain code read returns); a UDS status byte written
 * 0x.. is read by its bits (bit 3 confirmed → stored, else bit 2 pending → pending; ISO 14229-1).
 */
export function parseStatus(text: string, extra: Record<string, CodeStatus>): Parsed<CodeStatus> {
  const s = text.trim().toLowerCase().replace(/[\s_-]+/g, ' ');
  if (s === '') return { ok: true, value: 'stored' };
  // Own properties only: a cell saying "constructor" must not find Object's.
  const hit = (Object.hasOwn(extra, s) ? extra[s] : undefined) ?? (Object.hasOwn(STATUS_WORDS, s) ? STATUS_WORDS[s] : undefined);
  if (hit) return { ok: true, value: hit };
  const byte = /^(?:0x|\$)([0-9a-f]{2})$/.exec(s);
  if (byte) {
    const b = parseInt(byte[1], 16);
    if (b & 0x08) return { ok: true, value: 'stored' };
    if (b & 0x04) return { ok: true, value: 'pending' };
    return fail(`status byte ${byte[1].toUpperCase()} has neither the confirmed (bit 3) nor the pending (bit 2) bit set`);
  }
  if (HISTORY_WORDS.has(s)) {
    return fail(`"${text.trim()}": a history code is no longer a current fault and is not imported; map the word with mapping.statusValues to import it anyway`);
  }
  return fail(`"${text.trim().slice(0, 40)}" is not a status; expected stored (or confirmed), pending or permanent`);
}

// ---------------------------------------------------------------- freeze frame

/** A freeze-frame value: a number when it reads as one (decimal comma allowed unless ',' separates fields), text otherwise. */
export function freezeValue(text: string, commaDelimited: boolean): string | number {
  const s = text.trim();
  if (/^-?\d+(\.\d+)?$/.test(s)) return Number(s);
  if (!commaDelimited && /^-?\d+,\d+$/.test(s)) return Number(s.replace(',', '.'));
  return s;
}
