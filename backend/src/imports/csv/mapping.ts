import { IMPORT_FIELDS, type CodeStatus, type FieldError, type ImportField, type ImportMapping, type ImportMappingInput } from '@causeway/shared';

const STATUSES: readonly CodeStatus[] = ['stored', 'pending', 'permanent'];

/**
 * Header spellings per field, in normal form (lower case, runs of spaces, '_', '-', '.', '/'
 * made one space). Chosen from the wording scan tools and spreadsheets commonly use (common
 * practice); no program's export format is copied.
 */
export const HEADER_ALIASES: Record<ImportField, readonly string[]> = {
  date: ['date', 'datetime', 'date time', 'timestamp', 'time stamp', 'scan date', 'scan date time', 'scanned', 'scanned at', 'scanned on', 'read date', 'read at', 'date read', 'recorded', 'recorded at', 'date of scan', 'test date', 'session date', 'captured at'],
  time: ['time', 'scan time', 'time read', 'read time', 'time of day'],
  vin: ['vin', 'vin number', 'vin no', 'vehicle vin', 'vehicle identification number', 'chassis', 'chassis number', 'chassis no', 'frame number'],
  odometer: ['odometer', 'odometer reading', 'odometer value', 'odo', 'mileage', 'kilometrage', 'distance', 'km', 'kms', 'kilometres', 'kilometers', 'miles'],
  odometerUnit: ['odometer unit', 'odo unit', 'unit', 'units', 'mileage unit', 'distance unit'],
  module: ['module', 'ecu', 'ecu name', 'module name', 'control module', 'controller', 'system', 'node', 'source'],
  code: ['code', 'dtc', 'dtc code', 'dtc number', 'fault code', 'trouble code', 'diagnostic trouble code', 'error code', 'fault', 'p code'],
  status: ['status', 'dtc status', 'code status', 'fault status', 'state', 'dtc state', 'type', 'dtc type'],
  description: ['description', 'desc', 'text', 'fault text', 'dtc description', 'fault description', 'definition', 'meaning', 'title'],
  make: ['make', 'manufacturer', 'brand'],
  model: ['model', 'vehicle model'],
  year: ['year', 'model year', 'my'],
  engine: ['engine', 'engine code', 'engine type', 'motor'],
  plate: ['plate', 'registration', 'reg', 'reg no', 'registration number', 'licence plate', 'license plate', 'number plate', 'plate number'],
};

const UNIT_WORDS: Record<string, 'km' | 'mi'> = {
  km: 'km', kms: 'km', kilometre: 'km', kilometres: 'km', kilometer: 'km', kilometers: 'km',
  mi: 'mi', mile: 'mi', miles: 'mi',
};

/** Reads a unit word (km, kms, kilometres, mi, miles …), or null. */
export function unitWord(s: string): 'km' | 'mi' | null {
  const word = s.trim().toLowerCase().replace(/\.$/, '');
  return Object.hasOwn(UNIT_WORDS, word) ? UNIT_WORDS[word] : null;
}

export function normaliseHeader(h: string): string {
  return h.replace(/^\uFEFF/, '').trim().toLowerCase().replace(/[\s_\-./]+/g, ' ').trim();
}

const FREEZE_FRAME_HEADER = /^\s*(?:ff|freeze[\s_-]*frame)\s*[:._\-\s]\s*(\S.*)$/i;

/** The freeze-frame key of a header such as "FF: RPM" or "Freeze frame: Coolant temp", or null. */
export function freezeFrameKey(header: string): string | null {
  const m = FREEZE_FRAME_HEADER.exec(header.replace(/^\uFEFF/, ''));
  const key = m ? m[1].trim().slice(0, 60) : null;
  return key && !RESERVED_KEYS.has(key) ? key : null;
}

/** Keys that would reach an object's prototype rather than be stored. */
export const RESERVED_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

/** A header's field and, for an odometer header, the unit it names ("Odometer (mi)", "mileage_km"). */
export function classifyHeader(header: string): { field: ImportField; unit: 'km' | 'mi' | null } | null {
  const raw = header.replace(/^\uFEFF/, '').trim();
  const bracket = /^(.*?)\s*[([]\s*([^)\]]*?)\s*[)\]]\s*$/.exec(raw);
  const candidates: Array<{ base: string; unit: 'km' | 'mi' | null }> = [];
  if (bracket) candidates.push({ base: normaliseHeader(bracket[1]), unit: unitWord(bracket[2]) });
  const norm = normaliseHeader(raw);
  candidates.push({ base: norm, unit: null });
  const suffix = /^(.*\S)\s+(\S+)$/.exec(norm);
  if (suffix && unitWord(suffix[2])) candidates.push({ base: suffix[1], unit: unitWord(suffix[2]) });
  for (const { base, unit } of candidates) {
    for (const field of IMPORT_FIELDS) {
      if (HEADER_ALIASES[field].includes(base)) {
        if (field === 'odometer') return { field, unit: unit ?? unitWord(base) };
        return { field, unit: null };
      }
    }
  }
  return null;
}

export function emptyMapping(): ImportMapping {
  return { columns: {}, freezeFrame: [], odometerUnit: null, dateOrder: null, statusValues: {} };
}

/** The mapping read from the headers alone: the first header of each field wins. */
export function detectMapping(headers: string[]): ImportMapping {
  const mapping = emptyMapping();
  for (const header of headers) {
    const ff = freezeFrameKey(header);
    if (ff) {
      mapping.freezeFrame.push({ header: header.replace(/^\uFEFF/, '').trim(), key: ff });
      continue;
    }
    const hit = classifyHeader(header);
    if (!hit || mapping.columns[hit.field]) continue;
    mapping.columns[hit.field] = header.replace(/^\uFEFF/, '').trim();
    if (hit.field === 'odometer' && hit.unit) mapping.odometerUnit = hit.unit;
  }
  // A lone "Time" column is read as the date and time together.
  if (!mapping.columns.date && mapping.columns.time) {
    mapping.columns.date = mapping.columns.time;
    delete mapping.columns.time;
  }
  return mapping;
}

/** `base` with each override applied in turn: columns key by key (null removes), the rest replaced when given. */
export function mergeMapping(base: ImportMapping, ...overrides: Array<ImportMappingInput | null | undefined>): ImportMapping {
  const out: ImportMapping = { columns: { ...base.columns }, freezeFrame: [...base.freezeFrame], odometerUnit: base.odometerUnit, dateOrder: base.dateOrder, statusValues: { ...base.statusValues } };
  for (const o of overrides) {
    if (!o) continue;
    for (const [field, header] of Object.entries(o.columns ?? {}) as Array<[ImportField, string | null]>) {
      if (header === null || header === '') delete out.columns[field];
      else out.columns[field] = header;
    }
    if (o.freezeFrame !== undefined) out.freezeFrame = [...o.freezeFrame];
    if (o.odometerUnit !== undefined) out.odometerUnit = o.odometerUnit;
    if (o.dateOrder !== undefined) out.dateOrder = o.dateOrder;
    if (o.statusValues !== undefined) Object.assign(out.statusValues, o.statusValues);
  }
  return out;
}

export interface ResolvedColumns {
  index: Partial<Record<ImportField, number>>;
  /** The header of each mapped field as written in the file. */
  header: Partial<Record<ImportField, string>>;
  freezeFrame: Array<{ index: number; key: string; header: string }>;
  unmapped: string[];
}

/** Column positions of a mapping in a header row; mapped headers missing from the file are errors naming the mapping entry. */
export function resolveColumns(mapping: ImportMapping, headers: string[], field = 'mapping'): { resolved: ResolvedColumns; errors: FieldError[] } {
  const norm = headers.map(normaliseHeader);
  const find = (h: string) => {
    const exact = headers.findIndex((x) => x.replace(/^\uFEFF/, '').trim() === h.trim());
    return exact !== -1 ? exact : norm.indexOf(normaliseHeader(h));
  };
  const errors: FieldError[] = [];
  const resolved: ResolvedColumns = { index: {}, header: {}, freezeFrame: [], unmapped: [] };
  const used = new Set<number>();
  for (const [f, h] of Object.entries(mapping.columns) as Array<[ImportField, string | null | undefined]>) {
    if (!h) continue;
    const i = find(h);
    if (i === -1) {
      errors.push({ field: `${field}.columns.${f}`, message: `names the header "${h}", which the file does not have` });
      continue;
    }
    resolved.index[f] = i;
    resolved.header[f] = headers[i].replace(/^\uFEFF/, '').trim();
    used.add(i);
  }
  mapping.freezeFrame.forEach((ff, n) => {
    const i = find(ff.header);
    if (i === -1) {
      errors.push({ field: `${field}.freezeFrame.${n}.header`, message: `names the header "${ff.header}", which the file does not have` });
      return;
    }
    resolved.freezeFrame.push({ index: i, key: ff.key, header: headers[i].replace(/^\uFEFF/, '').trim() });
    used.add(i);
  });
  resolved.unmapped = headers.flatMap((h, i) => (used.has(i) || h.trim() === '' ? [] : [h.replace(/^\uFEFF/, '').trim()]));
  return { resolved, errors };
}

// ---------------------------------------------------------------- validation of a client's mapping

function isPlainObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Checks a mapping sent by a client; returns it typed, or the errors naming each bad entry. */
export function validateMappingInput(value: unknown, field = 'mapping'): { mapping: ImportMappingInput | null; errors: FieldError[] } {
  const errors: FieldError[] = [];
  if (!isPlainObject(value)) return { mapping: null, errors: [{ field, message: 'must be an object such as {"columns":{"code":"DTC"}}' }] };
  const out: ImportMappingInput = {};
  for (const key of Object.keys(value)) {
    if (!['columns', 'freezeFrame', 'odometerUnit', 'dateOrder', 'statusValues'].includes(key)) errors.push({ field: `${field}.${key}`, message: 'is not an accepted field' });
  }
  if (value.columns !== undefined) {
    if (!isPlainObject(value.columns)) {
      errors.push({ field: `${field}.columns`, message: 'must be an object of field → header' });
    } else {
      out.columns = {};
      for (const [k, v] of Object.entries(value.columns)) {
        if (!(IMPORT_FIELDS as readonly string[]).includes(k)) {
          errors.push({ field: `${field}.columns.${k}`, message: `is not a field; fields are ${IMPORT_FIELDS.join(', ')}` });
        } else if (v !== null && (typeof v !== 'string' || v.trim() === '' || v.length > 200)) {
          errors.push({ field: `${field}.columns.${k}`, message: 'must be a header of 1–200 characters, or null' });
        } else {
          out.columns[k as ImportField] = v === null ? null : v.trim();
        }
      }
    }
  }
  if (value.freezeFrame !== undefined) {
    if (!Array.isArray(value.freezeFrame) || value.freezeFrame.length > 100) {
      errors.push({ field: `${field}.freezeFrame`, message: 'must be a list of at most 100 {header, key}' });
    } else {
      out.freezeFrame = [];
      value.freezeFrame.forEach((e: unknown, i) => {
        const header = isPlainObject(e) ? e.header : undefined;
        const key = isPlainObject(e) ? (e.key ?? e.header) : undefined;
        if (typeof header !== 'string' || header.trim() === '' || header.length > 200) {
          errors.push({ field: `${field}.freezeFrame.${i}.header`, message: 'must be a header of 1–200 characters' });
        } else if (typeof key !== 'string' || key.trim() === '' || key.length > 60 || RESERVED_KEYS.has(key.trim())) {
          errors.push({ field: `${field}.freezeFrame.${i}.key`, message: 'must be a key of 1–60 characters (not __proto__, constructor or prototype)' });
        } else {
          out.freezeFrame!.push({ header: header.trim(), key: key.trim() });
        }
      });
    }
  }
  if (value.odometerUnit !== undefined) {
    if (value.odometerUnit !== null && value.odometerUnit !== 'km' && value.odometerUnit !== 'mi') errors.push({ field: `${field}.odometerUnit`, message: 'must be km, mi or null' });
    else out.odometerUnit = value.odometerUnit;
  }
  if (value.dateOrder !== undefined) {
    if (value.dateOrder !== null && value.dateOrder !== 'DMY' && value.dateOrder !== 'MDY') errors.push({ field: `${field}.dateOrder`, message: 'must be DMY, MDY or null' });
    else out.dateOrder = value.dateOrder;
  }
  if (value.statusValues !== undefined) {
    if (!isPlainObject(value.statusValues) || Object.keys(value.statusValues).length > 50) {
      errors.push({ field: `${field}.statusValues`, message: 'must be an object of at most 50 word → stored | pending | permanent' });
    } else {
      out.statusValues = {};
      for (const [k, v] of Object.entries(value.statusValues)) {
        if (k.trim() === '' || k.length > 40 || RESERVED_KEYS.has(k.trim().toLowerCase())) errors.push({ field: `${field}.statusValues`, message: `"${k.slice(0, 40)}" must be a word of 1–40 characters (not __proto__, constructor or prototype)` });
        else if (!STATUSES.includes(v as CodeStatus)) errors.push({ field: `${field}.statusValues.${k}`, message: 'must be stored, pending or permanent' });
        else out.statusValues[k.trim().toLowerCase()] = v as CodeStatus;
      }
    }
  }
  return { mapping: errors.length ? null : out, errors };
}
