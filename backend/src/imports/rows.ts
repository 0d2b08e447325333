import { hash as digest } from 'node:crypto';
import {
  parseDtc,
  toKm,
  validateVin,
  type CodeStatus,
  type DtcParseResult,
  type FreezeFrame,
  type ImportCorrection,
  type ImportField,
  type ImportMapping,
  type ImportPreviewRow,
  type ImportRowProblem,
  type VinResult,
} from '@causeway/shared';
import { unitWord, type ResolvedColumns } from './csv/mapping';
import { MAX_ODOMETER_KM, freezeValue, parseOdometer, parseScanDate, parseStatus, type Parsed, type ScanTime } from './csv/values';

/** A row that passed every check, in the form it is stored. */
export interface NormalRow {
  line: number;
  vin: string;
  scannedAt: number;
  scanDay: string;
  odometerKm: number | null;
  module: string | null;
  /** Five characters. */
  code: string;
  /** With the failure-type byte when one was read. */
  display: string;
  status: CodeStatus;
  /** The freeze frame as stored: JSON with the keys in a fixed order. */
  freezeFrameJson: string;
  make: string | null;
  model: string | null;
  engine: string | null;
  year: number | null;
  plate: string | null;
  /** sha256 (base64url) of the normalised values: the same reading imported twice is one row. */
  hash: string;
}

export interface RowCheckerOptions {
  resolved: ResolvedColumns;
  mapping: ImportMapping;
  /** The shop's unit, for readings that name none. */
  distanceUnit: 'km' | 'mi';
  /** The shop's locale: en-US reads slash dates month first. */
  locale: string;
  delimiter: string;
  now: number;
  /** VIN model years are read relative to this year. */
  referenceYear: number;
}

const LIMITS: Partial<Record<ImportField, number>> = { module: 60, description: 500, make: 40, model: 60, engine: 40, plate: 20 };
const FREEZE_VALUE_MAX = 100;

/**
 * Checks and normalises one data row at a time. Problems name the line and the column as written
 * in the file; caches make repeated VINs, codes and dates cheap.
 */
export class RowChecker {
  readonly problems: ImportRowProblem[] = [];
  readonly corrections: ImportCorrection[] = [];
  problemsTotal = 0;
  correctionsTotal = 0;
  readonly preview: ImportPreviewRow[] = [];

  private readonly index: Partial<Record<ImportField, number>>;
  private readonly header: Partial<Record<ImportField, string>>;
  private readonly order: 'DMY' | 'MDY';
  private readonly codeCache = new Map<string, DtcParseResult>();
  private readonly vinCache = new Map<string, VinResult>();
  /** Raw VINs already reported (warnings and corrections once per VIN, not per row). */
  private readonly vinReported = new Set<string>();
  private readonly dateCache = new Map<string, Parsed<ScanTime>>();
  private readonly statusCache = new Map<string, Parsed<CodeStatus>>();
  /** One string per distinct module name, so that 100 000 rows do not hold 100 000 copies. */
  private readonly moduleNames = new Map<string, string>();
  /** Freeze-frame columns in key order, so that equal frames give equal JSON (and hashes); `prefix` is the key as JSON. */
  private readonly freezeColumns: Array<{ index: number; key: string; header: string; prefix: string }>;

  constructor(
    private readonly opts: RowCheckerOptions,
    private readonly maxListed: number,
    private readonly previewRows: number,
  ) {
    this.index = opts.resolved.index;
    this.header = opts.resolved.header;
    this.order = opts.mapping.dateOrder ?? (opts.locale.toLowerCase() === 'en-us' ? 'MDY' : 'DMY');
    // One column per key (the first wins), in key order.
    const byKey = new Map<string, { index: number; key: string; header: string }>();
    for (const ff of opts.resolved.freezeFrame) if (!byKey.has(ff.key)) byKey.set(ff.key, ff);
    this.freezeColumns = [...byKey.values()].sort((a, b) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0)).map((ff) => ({ ...ff, prefix: `${JSON.stringify(ff.key)}:` }));
  }

  private problem(line: number, column: string, message: string, severity: 'error' | 'warning' = 'error'): void {
    this.problemsTotal += 1;
    if (this.problems.length < this.maxListed) this.problems.push({ line, column, message, severity });
  }

  private correction(line: number, column: string, from: string, to: string): void {
    this.correctionsTotal += 1;
    if (this.corrections.length < this.maxListed) this.corrections.push({ line, column, from, to });
  }

  private cell(cells: string[], field: ImportField): string {
    const i = this.index[field];
    return i === undefined ? '' : (cells[i] ?? '').trim();
  }

  private col(field: ImportField): string {
    return this.header[field] ?? field;
  }

  /** A row whose CSV syntax could not be read (an unclosed quote, say). */
  unreadable(line: number, message: string): void {
    this.problem(line, 'row', message);
    if (this.preview.length < this.previewRows) this.preview.push(emptyPreview(line));
  }

  /** Checks one row; null when it has an error (its problems are recorded). */
  check(line: number, cells: string[]): NormalRow | null {
    const before = this.problemsTotal;
    let errors = 0;
    const err = (field: ImportField | string, message: string, column?: string) => {
      errors += 1;
      this.problem(line, column ?? this.col(field as ImportField), message);
    };

    // VIN
    const rawVin = this.cell(cells, 'vin');
    let vin: string | null = null;
    if (rawVin === '') {
      err('vin', 'is empty');
    } else {
      let v = this.vinCache.get(rawVin);
      if (!v) {
        v = validateVin(rawVin, { referenceYear: this.opts.referenceYear });
        if (this.vinCache.size < 20_000) this.vinCache.set(rawVin, v);
      }
      if (!v.valid) {
        err('vin', v.issues.filter((i) => i.severity === 'error').map((i) => i.message).join('; '));
      } else {
        vin = v.vin;
        if (!this.vinReported.has(rawVin)) {
          this.vinReported.add(rawVin);
          for (const w of v.issues) this.problem(line, this.col('vin'), w.message, 'warning');
          if (rawVin !== v.vin) this.correction(line, this.col('vin'), rawVin, v.vin);
        }
      }
    }

    // Code
    const rawCode = this.cell(cells, 'code');
    let code: string | null = null;
    let display: string | null = null;
    if (rawCode === '') {
      err('code', 'is empty');
    } else {
      let parsed = this.codeCache.get(rawCode);
      if (!parsed) {
        parsed = parseDtc(rawCode);
        if (this.codeCache.size < 10_000) this.codeCache.set(rawCode, parsed);
      }
      if (!parsed.ok) {
        err('code', parsed.error.message);
      } else {
        code = parsed.value.code;
        display = parsed.value.display;
        if (rawCode !== display) this.correction(line, this.col('code'), rawCode, display);
      }
    }

    // Date (and time)
    const rawDate = this.cell(cells, 'date');
    const rawTime = this.index.time === undefined ? undefined : this.cell(cells, 'time');
    let scan: ScanTime | null = null;
    if (rawDate === '') {
      err('date', 'is empty');
    } else {
      const key = rawTime === undefined ? rawDate : `${rawDate}\u0001${rawTime}`;
      let parsed = this.dateCache.get(key);
      if (!parsed) {
        parsed = parseScanDate(rawDate, rawTime, this.order, this.opts.now);
        if (this.dateCache.size < 50_000) this.dateCache.set(key, parsed);
      }
      if (parsed.ok) scan = parsed.value;
      else err('date', parsed.message, rawTime !== undefined && /time of day/.test(parsed.message) ? this.col('time') : undefined);
    }

    // Status
    const rawStatus = this.cell(cells, 'status');
    let status: CodeStatus | null = null;
    {
      let parsed = this.statusCache.get(rawStatus);
      if (!parsed) {
        parsed = parseStatus(rawStatus, this.opts.mapping.statusValues);
        if (this.statusCache.size < 1000) this.statusCache.set(rawStatus, parsed);
      }
      if (parsed.ok) status = parsed.value;
      else err('status', parsed.message);
    }

    // Odometer
    let odometerKm: number | null = null;
    const rawOdo = this.cell(cells, 'odometer');
    if (rawOdo !== '') {
      const parsed = parseOdometer(rawOdo);
      if (!parsed.ok) {
        err('odometer', parsed.message);
      } else {
        const rawUnit = this.cell(cells, 'odometerUnit');
        let unit = parsed.value.unit;
        let unitOk = true;
        if (rawUnit !== '') {
          const u = unitWord(rawUnit);
          if (!u) {
            unitOk = false;
            err('odometerUnit', `"${rawUnit.slice(0, 20)}" is not a distance unit (km or mi)`);
          } else if (unit && unit !== u) {
            unitOk = false;
            err('odometer', `says ${unit} but the unit column says ${u}`);
          } else {
            unit = u;
          }
        }
        if (unitOk) {
          const km = toKm(parsed.value.value, unit ?? this.opts.mapping.odometerUnit ?? this.opts.distanceUnit);
          if (km > MAX_ODOMETER_KM) err('odometer', `${rawOdo} is beyond ${MAX_ODOMETER_KM.toLocaleString('en-GB')} km, more than any vehicle runs`);
          else odometerKm = km;
        }
      }
    }

    // Text columns
    const text = (field: ImportField): string | null => {
      const v = this.cell(cells, field);
      if (v === '') return null;
      const max = LIMITS[field];
      if (max && v.length > max) {
        err(field, `is longer than ${max} characters`);
        return null;
      }
      return v;
    };
    let module = text('module');
    if (module !== null) {
      const known = this.moduleNames.get(module);
      if (known !== undefined) module = known;
      else if (this.moduleNames.size < 1000) this.moduleNames.set(module, module);
    }
    const description = text('description');
    const make = text('make');
    const model = text('model');
    const engine = text('engine');
    const plate = text('plate');
    let year: number | null = null;
    const rawYear = this.cell(cells, 'year');
    if (rawYear !== '') {
      const y = Number(rawYear);
      const latest = this.opts.referenceYear + 2;
      if (!/^\d{4}$/.test(rawYear) || y < 1900 || y > latest) err('year', `"${rawYear.slice(0, 20)}" is not a model year (1900–${latest})`);
      else year = y;
    }

    // Freeze frame, and its JSON written directly (keys in a fixed order: equal frames, equal text).
    const freezeFrame: FreezeFrame = {};
    let freezeFrameJson = '{';
    for (const ff of this.freezeColumns) {
      const v = (cells[ff.index] ?? '').trim();
      if (v === '') continue;
      if (v.length > FREEZE_VALUE_MAX) {
        err('freezeFrame', `is longer than ${FREEZE_VALUE_MAX} characters`, ff.header);
        continue;
      }
      const value = freezeValue(v, this.opts.delimiter === ',');
      freezeFrame[ff.key] = value;
      freezeFrameJson += `${freezeFrameJson.length > 1 ? ',' : ''}${ff.prefix}${typeof value === 'number' ? String(value) : JSON.stringify(value)}`;
    }
    freezeFrameJson += '}';

    const valid = errors === 0 && vin !== null && code !== null && display !== null && scan !== null && status !== null;
    if (this.preview.length < this.previewRows) {
      this.preview.push({
        line,
        valid,
        duplicate: false,
        vin,
        scannedAt: scan ? new Date(scan.instant).toISOString() : null,
        scanDay: scan?.day ?? null,
        odometerKm,
        module,
        code: display,
        status,
        description,
        freezeFrame,
        make,
        model,
      });
    }
    if (!valid) {
      if (this.problemsTotal === before) this.problem(line, 'row', 'could not be read');
      return null;
    }
    const hash = digest('sha256', `${vin}\u0001${scan!.instant}\u0001${display}\u0001${status}\u0001${odometerKm ?? ''}\u0001${module ?? ''}\u0001${description ?? ''}\u0001${freezeFrameJson}`, 'base64url');
    return {
      line,
      vin: vin!,
      scannedAt: scan!.instant,
      scanDay: scan!.day,
      odometerKm,
      module,
      code: code!,
      display: display!,
      status: status!,
      freezeFrameJson,
      make,
      model,
      engine,
      year,
      plate,
      hash,
    };
  }
}

function emptyPreview(line: number): ImportPreviewRow {
  return { line, valid: false, duplicate: false, vin: null, scannedAt: null, scanDay: null, odometerKm: null, module: null, code: null, status: null, description: null, freezeFrame: {}, make: null, model: null };
}
