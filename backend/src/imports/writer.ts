import type { CodeStatus, FreezeFrame } from '@causeway/shared';
import type { NormalRow } from './rows';
import { uuid7 } from './uuid7';

/**
 * The commit step, written once as a generator of SQL operations so that it runs synchronously on
 * the embedded SQLite (prepared statements, one transaction that nothing else can interleave with)
 * and asynchronously on PostgreSQL. Identifiers are double-quoted and parameters are `?`.
 */
export type SqlParam = string | number | null;
export type SqlOp = { kind: 'get' | 'all' | 'run'; sql: string; params: SqlParam[] };
export type Row = Record<string, unknown>;
export type WriteProgram<T> = Generator<SqlOp, T, unknown>;

const get = (sql: string, ...params: SqlParam[]): SqlOp => ({ kind: 'get', sql, params });
const all = (sql: string, ...params: SqlParam[]): SqlOp => ({ kind: 'all', sql, params });
const run = (sql: string, ...params: SqlParam[]): SqlOp => ({ kind: 'run', sql, params });

export interface WriteContext {
  shopId: string;
  userId: string;
  importId: string;
  fileName: string;
  /** In the database's text form (see `dbTime`). */
  now: string;
  /** Lines whose duplicate state the preview shows. */
  previewLines: Set<number>;
}

export interface WriteResult {
  skippedDuplicates: number;
  createdVehicles: number;
  updatedVehicles: number;
  createdJobs: number;
  createdCodes: number;
  duplicateLines: number[];
}

/**
 * An instant in the text form TypeORM writes on SQLite (DateUtils.mixedDateToUtcDatetimeString:
 * UTC 'YYYY-MM-DD HH:mm:ss.SSS'), which PostgreSQL also reads for a timestamp. Parameters of the
 * write program are only strings, numbers and null, so that no conversion runs per statement.
 */
export function dbTime(ms: number | Date): string {
  return new Date(ms).toISOString().replace('T', ' ').replace('Z', '');
}

const STATUS_RANK: Record<CodeStatus, number> = { pending: 0, stored: 1, permanent: 2 };

const SQL = {
  vehicle: 'SELECT "id", "odometerKm" FROM "vehicles" WHERE "shopId" = ? AND "vin" = ?',
  insertVehicle:
    'INSERT INTO "vehicles" ("id", "shopId", "vin", "make", "model", "engine", "year", "plate", "odometerKm", "odometerReadAt", "createdAt", "updatedAt") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)',
  updateOdometer: 'UPDATE "vehicles" SET "odometerKm" = ?, "odometerReadAt" = ?, "updatedAt" = ? WHERE "id" = ?',
  day: 'SELECT d."jobId" AS "jobId", d."hashes" AS "hashes", d."modules" AS "modules", j."status" AS "jobStatus" FROM "import_days" d LEFT JOIN "jobs" j ON j."id" = d."jobId" WHERE d."shopId" = ? AND d."vehicleId" = ? AND d."scanDay" = ?',
  insertDay: 'INSERT INTO "import_days" ("shopId", "vehicleId", "scanDay", "jobId", "importId", "hashes", "modules") VALUES (?, ?, ?, ?, ?, ?, ?)',
  updateDay: 'UPDATE "import_days" SET "jobId" = ?, "importId" = ?, "hashes" = "hashes" || ?, "modules" = ? WHERE "shopId" = ? AND "vehicleId" = ? AND "scanDay" = ?',
  jobCodes: 'SELECT "id", "code", "status", "freezeFrame", "position" FROM "job_codes" WHERE "jobId" = ?',
  insertJob:
    'INSERT INTO "jobs" ("id", "shopId", "vehicleId", "complaint", "technicianId", "status", "odometerKm", "openedAt", "createdById", "createdAt", "updatedAt") VALUES (?, ?, ?, ?, ?, \'open\', ?, ?, ?, ?, ?)',
  insertCode: 'INSERT INTO "job_codes" ("id", "jobId", "code", "display", "position", "status", "freezeFrame") VALUES (?, ?, ?, ?, ?, ?, ?)',
  updateCode: 'UPDATE "job_codes" SET "status" = ?, "freezeFrame" = ? WHERE "id" = ?',
  touchJob: 'UPDATE "jobs" SET "updatedAt" = ? WHERE "id" = ?',
};

/** Length of one stored hash: sha256 in base64url. */
export const HASH_LENGTH = 43;

/**
 * The columns of other modules' tables this writer sets, per entity. Every other column must be
 * nullable or have a default (checked at start-up against the entities' metadata).
 */
export const WRITTEN_COLUMNS = {
  vehicles: ['id', 'shopId', 'vin', 'make', 'model', 'engine', 'year', 'plate', 'odometerKm', 'odometerReadAt', 'createdAt', 'updatedAt'],
  jobs: ['id', 'shopId', 'vehicleId', 'complaint', 'technicianId', 'status', 'odometerKm', 'openedAt', 'createdById', 'createdAt', 'updatedAt'],
  job_codes: ['id', 'jobId', 'code', 'display', 'position', 'status', 'freezeFrame'],
} as const;

interface CodeState {
  id: string;
  code: string;
  status: CodeStatus;
  /** Parsed only when a second row of the same code is merged in. */
  freezeFrame: FreezeFrame | null;
  freezeFrameJson: string;
  dirty: boolean;
}

/** One vehicle and scan day: its job and the hashes of the rows it already has. */
interface DayState {
  scanDay: string;
  jobId: string;
  /** The job was opened by this import (its id chosen here). */
  jobCreated: boolean;
  /** Written: a new job is written with its day's first new row. */
  jobInserted: boolean;
  nextPosition: number;
  /** A job has a handful of codes: a list is cheaper than a map. */
  codes: CodeState[];
  /** Hashes stored by earlier imports (null: none, the day is new). */
  known: Set<string> | null;
  /** An import_days row exists for the day. */
  stored: boolean;
  newHashes: string[];
  modules: Record<string, string> | null;
}

interface DayInfo {
  scanDay: string;
  openedAt: number;
  odometerKm: number | null;
}

/** What the file says about one VIN, gathered before writing. */
interface VinInfo {
  make: string | null;
  model: string | null;
  engine: string | null;
  year: number | null;
  plate: string | null;
  km: number | null;
  kmAt: number;
  days: DayInfo[];
}

interface VehicleState {
  id: string;
  /** New to the shop (its id chosen here). */
  created: boolean;
  /** Written: a new vehicle is written with its first new row, so that all-duplicate files create nothing. */
  inserted: boolean;
  odometerKm: number | null;
  /** The highest reading among the new rows, and when it was read. */
  newKm: number | null;
  newKmAt: number;
  info: VinInfo;
  days: DayState[];
}

function gather(rows: NormalRow[]): Map<string, VinInfo> {
  const vins = new Map<string, VinInfo>();
  for (const r of rows) {
    let v = vins.get(r.vin);
    if (!v) {
      v = { make: r.make, model: r.model, engine: r.engine, year: r.year, plate: r.plate, km: r.odometerKm, kmAt: r.scannedAt, days: [] };
      vins.set(r.vin, v);
    } else {
      if (r.odometerKm !== null && (v.km === null || r.odometerKm > v.km)) {
        v.km = r.odometerKm;
        v.kmAt = r.scannedAt;
      }
      v.make ??= r.make;
      v.model ??= r.model;
      v.engine ??= r.engine;
      v.year ??= r.year;
      v.plate ??= r.plate;
    }
    let d: DayInfo | undefined;
    for (const x of v.days) if (x.scanDay === r.scanDay) d = x;
    if (!d) v.days.push({ scanDay: r.scanDay, openedAt: r.scannedAt, odometerKm: r.odometerKm });
    else {
      if (r.scannedAt < d.openedAt) d.openedAt = r.scannedAt;
      if (r.odometerKm !== null && (d.odometerKm === null || r.odometerKm > d.odometerKm)) d.odometerKm = r.odometerKm;
    }
  }
  return vins;
}

function parseModules(json: unknown): Record<string, string> | null {
  if (typeof json !== 'string' || json === '') return null;
  try {
    const parsed = JSON.parse(json) as unknown;
    return parsed && typeof parsed === 'object' && !Array.isArray(parsed) ? (parsed as Record<string, string>) : null;
  } catch {
    return null;
  }
}

function parseFreezeFrame(json: unknown): FreezeFrame {
  if (typeof json !== 'string') return json && typeof json === 'object' ? { ...(json as FreezeFrame) } : {};
  try {
    const parsed = JSON.parse(json) as unknown;
    return parsed && typeof parsed === 'object' && !Array.isArray(parsed) ? (parsed as FreezeFrame) : {};
  } catch {
    return {};
  }
}

/**
 * Writes the valid rows: vehicles by VIN (created when new to the shop; the odometer only ever
 * raised), one job per vehicle and scan day (the day's job from an earlier import is reused while it
 * is open), its codes deduplicated per job, and the new rows' hashes per vehicle and day. A row
 * whose content hash is already stored for its vehicle and day changes nothing.
 */
export function* writeRows(ctx: WriteContext, rows: NormalRow[], modelYearOf: (vin: string) => number | null): WriteProgram<WriteResult> {
  const result: WriteResult = { skippedDuplicates: 0, createdVehicles: 0, updatedVehicles: 0, createdJobs: 0, createdCodes: 0, duplicateLines: [] };
  const vins = gather(rows);
  const vehicles = new Map<string, VehicleState>();
  const seen = new Set<string>();
  const { now, shopId, importId } = ctx;
  const times = new Map<number, string>();
  const time = (ms: number): string => {
    let t = times.get(ms);
    if (t === undefined) times.set(ms, (t = dbTime(ms)));
    return t;
  };
  const duplicate = (line: number) => {
    result.skippedDuplicates += 1;
    if (ctx.previewLines.has(line)) result.duplicateLines.push(line);
  };

  for (const r of rows) {
    if (seen.has(r.hash)) {
      duplicate(r.line);
      continue;
    }
    seen.add(r.hash);

    let vehicle = vehicles.get(r.vin);
    if (!vehicle) {
      const info = vins.get(r.vin)!;
      const found = (yield get(SQL.vehicle, shopId, r.vin)) as Row | undefined;
      vehicle = found
        ? { id: String(found.id), created: false, inserted: true, odometerKm: found.odometerKm === null ? null : Number(found.odometerKm), newKm: null, newKmAt: 0, info, days: [] }
        : { id: uuid7(), created: true, inserted: false, odometerKm: null, newKm: null, newKmAt: 0, info, days: [] };
      vehicles.set(r.vin, vehicle);
    }
    let day: DayState | undefined;
    for (const d of vehicle.days) if (d.scanDay === r.scanDay) day = d;
    if (!day) {
      const stored = vehicle.created ? undefined : ((yield get(SQL.day, shopId, vehicle.id, r.scanDay)) as Row | undefined);
      day = { scanDay: r.scanDay, jobId: '', jobCreated: true, jobInserted: false, nextPosition: 0, codes: [], known: null, stored: stored !== undefined, newHashes: [], modules: null };
      if (stored) {
        const hashes = String(stored.hashes ?? '');
        day.known = new Set();
        for (let i = 0; i + HASH_LENGTH <= hashes.length; i += HASH_LENGTH) day.known.add(hashes.slice(i, i + HASH_LENGTH));
        day.modules = parseModules(stored.modules);
      }
      if (stored && stored.jobStatus === 'open') {
        // The day's job is still open: the new rows' codes join it.
        day.jobId = String(stored.jobId);
        day.jobCreated = false;
        day.jobInserted = true;
        for (const c of (yield all(SQL.jobCodes, day.jobId)) as Row[]) {
          day.codes.push({ id: String(c.id), code: String(c.code), status: c.status as CodeStatus, freezeFrame: null, freezeFrameJson: String(c.freezeFrame ?? '{}'), dirty: false });
          day.nextPosition = Math.max(day.nextPosition, Number(c.position) + 1);
        }
      } else {
        day.jobId = uuid7();
      }
      vehicle.days.push(day);
    }
    if (day.known?.has(r.hash)) {
      duplicate(r.line);
      continue;
    }
    day.newHashes.push(r.hash);
    if (r.module !== null && day.modules?.[r.code] !== r.module) {
      day.modules ??= {};
      day.modules[r.code] = r.module;
    }

    if (!vehicle.inserted) {
      // Written with the highest reading of its rows in the file, so the odometer needs no update after.
      const info = vehicle.info;
      yield run(SQL.insertVehicle, vehicle.id, shopId, r.vin, info.make ?? '', info.model ?? '', info.engine, info.year ?? modelYearOf(r.vin), info.plate, info.km, info.km === null ? null : time(info.kmAt), now, now);
      vehicle.inserted = true;
      vehicle.odometerKm = info.km;
      result.createdVehicles += 1;
    }
    if (r.odometerKm !== null && (vehicle.newKm === null || r.odometerKm > vehicle.newKm)) {
      vehicle.newKm = r.odometerKm;
      vehicle.newKmAt = r.scannedAt;
    }
    if (!day.jobInserted) {
      let info: DayInfo | undefined;
      for (const d of vehicle.info.days) if (d.scanDay === r.scanDay) info = d;
      const complaint = `Codes read with a scan tool on ${r.scanDay}, imported from "${ctx.fileName}".`;
      yield run(SQL.insertJob, day.jobId, shopId, vehicle.id, complaint, ctx.userId, info!.odometerKm, time(info!.openedAt), ctx.userId, now, now);
      day.jobInserted = true;
      result.createdJobs += 1;
    }

    let code: CodeState | undefined;
    for (const c of day.codes) if (c.code === r.code) code = c;
    if (code) {
      // The same code again in the job: keep the more serious status and add freeze-frame values not yet held.
      if (STATUS_RANK[r.status] > STATUS_RANK[code.status]) {
        code.status = r.status;
        code.dirty = true;
      }
      if (r.freezeFrameJson !== '{}' && r.freezeFrameJson !== code.freezeFrameJson) {
        code.freezeFrame ??= parseFreezeFrame(code.freezeFrameJson);
        for (const [k, v] of Object.entries(parseFreezeFrame(r.freezeFrameJson))) {
          if (!(k in code.freezeFrame)) {
            code.freezeFrame[k] = v;
            code.dirty = true;
          }
        }
      }
    } else {
      const id = uuid7();
      yield run(SQL.insertCode, id, day.jobId, r.code, r.display, day.nextPosition, r.status, r.freezeFrameJson);
      day.nextPosition += 1;
      day.codes.push({ id, code: r.code, status: r.status, freezeFrame: null, freezeFrameJson: r.freezeFrameJson, dirty: false });
      result.createdCodes += 1;
    }
  }

  for (const v of vehicles.values()) {
    if (v.inserted && v.newKm !== null && (v.odometerKm === null || v.newKm > v.odometerKm)) {
      yield run(SQL.updateOdometer, v.newKm, time(v.newKmAt), now, v.id);
      if (!v.created) result.updatedVehicles += 1;
    }
    for (const day of v.days) {
      if (day.newHashes.length === 0) continue;
      const modules = day.modules ? JSON.stringify(day.modules) : null;
      if (day.stored) yield run(SQL.updateDay, day.jobId, importId, day.newHashes.join(''), modules, shopId, v.id, day.scanDay);
      else yield run(SQL.insertDay, shopId, v.id, day.scanDay, day.jobId, importId, day.newHashes.join(''), modules);
      let touched = false;
      for (const c of day.codes) {
        if (!c.dirty) continue;
        yield run(SQL.updateCode, c.status, c.freezeFrame ? JSON.stringify(c.freezeFrame) : c.freezeFrameJson, c.id);
        touched = true;
      }
      if (touched && !day.jobCreated) yield run(SQL.touchJob, now, day.jobId);
    }
  }
  return result;
}
