import type { CodeStatus, FreezeFrame } from '@causeway/shared';
import type { NormalRow } from './rows';
import { uuid7 } from './uuid7';

/**
 * The commit step, written once as a generator of SQL operations so that it runs synchronously on
 * the embedded SQLite (prepared statements, one transaction that nothing else can interleave with)
 * and asynchronously on PostgreSQL. Identifiers are double-quoted and parameters are `?`.
 */
export type SqlOp = { kind: 'get' | 'all' | 'run'; sql: string; params: Array<string | number | null> };
export type Row = Record<string, unknown>;
export type WriteProgram<T> = Generator<SqlOp, T, unknown>;

type Param = string | number | null;
const get = (sql: string, ...params: Param[]): SqlOp => ({ kind: 'get', sql, params });
const all = (sql: string, ...params: Param[]): SqlOp => ({ kind: 'all', sql, params });
const run = (sql: string, ...params: Param[]): SqlOp => ({ kind: 'run', sql, params });

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
  importedJob:
    'SELECT i."jobId" AS "jobId" FROM "import_jobs" i JOIN "jobs" j ON j."id" = i."jobId" WHERE i."shopId" = ? AND i."vehicleId" = ? AND i."scanDay" = ? AND j."status" = \'open\' ORDER BY j."openedAt" DESC LIMIT 1',
  insertImportJob: 'INSERT INTO "import_jobs" ("jobId", "shopId", "vehicleId", "scanDay", "importId") VALUES (?, ?, ?, ?, ?)',
  jobCodes: 'SELECT "id", "code", "status", "freezeFrame", "position" FROM "job_codes" WHERE "jobId" = ?',
  insertJob:
    'INSERT INTO "jobs" ("id", "shopId", "vehicleId", "complaint", "technicianId", "status", "odometerKm", "openedAt", "createdById", "createdAt", "updatedAt") VALUES (?, ?, ?, ?, ?, \'open\', ?, ?, ?, ?, ?)',
  insertCode: 'INSERT INTO "job_codes" ("id", "jobId", "code", "display", "position", "status", "freezeFrame") VALUES (?, ?, ?, ?, ?, ?, ?)',
  updateCode: 'UPDATE "job_codes" SET "status" = ?, "freezeFrame" = ? WHERE "id" = ?',
  touchJob: 'UPDATE "jobs" SET "updatedAt" = ? WHERE "id" = ?',
  // Inserted first: no row comes back when the shop already has the hash (a duplicate).
  insertRow:
    'INSERT INTO "import_rows" ("shopId", "importId", "hash", "line", "vehicleId", "jobId", "scanDay", "code", "module") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?) ON CONFLICT ("shopId", "vehicleId", "hash") DO NOTHING RETURNING "line"',
};

/**
 * The columns of other modules' tables this writer sets, per entity. Every other column must be
 * nullable or have a default (checked at start-up against the entities' metadata).
 */
export const WRITTEN_COLUMNS = {
  vehicles: ['id', 'shopId', 'vin', 'make', 'model', 'engine', 'year', 'plate', 'odometerKm', 'odometerReadAt', 'createdAt', 'updatedAt'],
  jobs: ['id', 'shopId', 'vehicleId', 'complaint', 'technicianId', 'status', 'odometerKm', 'openedAt', 'createdById', 'createdAt', 'updatedAt'],
  job_codes: ['id', 'jobId', 'code', 'display', 'position', 'status', 'freezeFrame'],
} as const;

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
}

interface CodeState {
  id: string;
  status: CodeStatus;
  freezeFrame: FreezeFrame;
  dirty: boolean;
}

interface JobState {
  id: string;
  created: boolean;
  inserted: boolean;
  nextPosition: number;
  codes: Map<string, CodeState>;
}

/** Per VIN and per vehicle-day: what the new vehicle or job starts with. */
function firstPass(rows: NormalRow[]) {
  const vins = new Map<string, { make: string | null; model: string | null; engine: string | null; year: number | null; plate: string | null; km: number | null; kmAt: number }>();
  const days = new Map<string, { openedAt: number; odometerKm: number | null }>();
  for (const r of rows) {
    const v = vins.get(r.vin);
    if (!v) vins.set(r.vin, { make: r.make, model: r.model, engine: r.engine, year: r.year, plate: r.plate, km: r.odometerKm, kmAt: r.scannedAt });
    else {
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
    const key = `${r.vin}|${r.scanDay}`;
    const d = days.get(key);
    if (!d) days.set(key, { openedAt: r.scannedAt, odometerKm: r.odometerKm });
    else {
      if (r.scannedAt < d.openedAt) d.openedAt = r.scannedAt;
      if (r.odometerKm !== null && (d.odometerKm === null || r.odometerKm > d.odometerKm)) d.odometerKm = r.odometerKm;
    }
  }
  return { vins, days };
}

/**
 * Writes the valid rows: vehicles by VIN (created when new to the shop; the odometer only ever
 * raised), one job per vehicle and scan day (an open job an earlier import made for that day is
 * reused), its codes deduplicated per job, and one `import_rows` entry per new row. A row whose
 * content hash the shop already has changes nothing.
 */
export function* writeRows(ctx: WriteContext, rows: NormalRow[], modelYearOf: (vin: string) => number | null): WriteProgram<WriteResult> {
  const result: WriteResult = { skippedDuplicates: 0, createdVehicles: 0, updatedVehicles: 0, createdJobs: 0, createdCodes: 0, duplicateLines: [] };
  const { vins, days } = firstPass(rows);
  const vehicles = new Map<string, VehicleState>();
  const jobs = new Map<string, JobState>();
  const seen = new Set<string>();
  const now = ctx.now;

  for (const r of rows) {
    if (seen.has(r.hash)) {
      result.skippedDuplicates += 1;
      if (ctx.previewLines.has(r.line)) result.duplicateLines.push(r.line);
      continue;
    }
    seen.add(r.hash);

    let vehicle = vehicles.get(r.vin);
    if (!vehicle) {
      const found = (yield get(SQL.vehicle, ctx.shopId, r.vin)) as Row | undefined;
      vehicle = found
        ? { id: String(found.id), created: false, inserted: true, odometerKm: found.odometerKm === null ? null : Number(found.odometerKm), newKm: null, newKmAt: 0 }
        : { id: uuid7(), created: true, inserted: false, odometerKm: null, newKm: null, newKmAt: 0 };
      vehicles.set(r.vin, vehicle);
    }
    const dayKey = `${r.vin}|${r.scanDay}`;
    let job = jobs.get(dayKey);
    if (!job) {
      const existing = vehicle.created ? undefined : ((yield get(SQL.importedJob, ctx.shopId, vehicle.id, r.scanDay)) as Row | undefined);
      if (existing) {
        const codes = (yield all(SQL.jobCodes, String(existing.jobId))) as Row[];
        job = { id: String(existing.jobId), created: false, inserted: true, nextPosition: 0, codes: new Map() };
        for (const c of codes) {
          job.codes.set(String(c.code), { id: String(c.id), status: c.status as CodeStatus, freezeFrame: parseJson(c.freezeFrame), dirty: false });
          job.nextPosition = Math.max(job.nextPosition, Number(c.position) + 1);
        }
      } else {
        job = { id: uuid7(), created: true, inserted: false, nextPosition: 0, codes: new Map() };
      }
      jobs.set(dayKey, job);
    }

    if (!(yield get(SQL.insertRow, ctx.shopId, ctx.importId, r.hash, r.line, vehicle.id, job.id, r.scanDay, r.display, r.module))) {
      result.skippedDuplicates += 1;
      if (ctx.previewLines.has(r.line)) result.duplicateLines.push(r.line);
      continue;
    }
    if (!vehicle.inserted) {
      const info = vins.get(r.vin)!;
      // Written with the highest reading of its rows in the file, so the odometer needs no update after.
      yield run(SQL.insertVehicle, vehicle.id, ctx.shopId, r.vin, info.make ?? '', info.model ?? '', info.engine, info.year ?? modelYearOf(r.vin), info.plate, info.km, info.km === null ? null : dbTime(info.kmAt), now, now);
      vehicle.inserted = true;
      vehicle.odometerKm = info.km;
      result.createdVehicles += 1;
    }
    if (r.odometerKm !== null && (vehicle.newKm === null || r.odometerKm > vehicle.newKm)) {
      vehicle.newKm = r.odometerKm;
      vehicle.newKmAt = r.scannedAt;
    }
    if (!job.inserted) {
      const day = days.get(dayKey)!;
      const complaint = `Codes read with a scan tool on ${r.scanDay}, imported from "${ctx.fileName}".`;
      yield run(SQL.insertJob, job.id, ctx.shopId, vehicle.id, complaint, ctx.userId, day.odometerKm, dbTime(day.openedAt), ctx.userId, now, now);
      yield run(SQL.insertImportJob, job.id, ctx.shopId, vehicle.id, r.scanDay, ctx.importId);
      job.inserted = true;
      result.createdJobs += 1;
    }

    const code = job.codes.get(r.code);
    if (code) {
      // The same code again in the job: keep the more serious status and add freeze-frame values not yet held.
      if (STATUS_RANK[r.status] > STATUS_RANK[code.status]) {
        code.status = r.status;
        code.dirty = true;
      }
      for (const [k, v] of Object.entries(r.freezeFrame)) {
        if (!(k in code.freezeFrame)) {
          code.freezeFrame[k] = v;
          code.dirty = true;
        }
      }
    } else {
      const id = uuid7();
      yield run(SQL.insertCode, id, job.id, r.code, r.display, job.nextPosition, r.status, r.freezeFrameJson);
      job.nextPosition += 1;
      job.codes.set(r.code, { id, status: r.status, freezeFrame: { ...r.freezeFrame }, dirty: false });
      result.createdCodes += 1;
    }
  }

  for (const v of vehicles.values()) {
    if (!v.inserted || v.newKm === null || (v.odometerKm !== null && v.newKm <= v.odometerKm)) continue;
    yield run(SQL.updateOdometer, v.newKm, dbTime(v.newKmAt), now, v.id);
    if (!v.created) result.updatedVehicles += 1;
  }
  for (const job of jobs.values()) {
    let touched = false;
    for (const c of job.codes.values()) {
      if (!c.dirty) continue;
      yield run(SQL.updateCode, c.status, JSON.stringify(c.freezeFrame), c.id);
      touched = true;
    }
    if (touched && !job.created) yield run(SQL.touchJob, now, job.id);
  }
  return result;
}

function parseJson(v: unknown): FreezeFrame {
  if (typeof v !== 'string') return (v as FreezeFrame) ?? {};
  try {
    const parsed = JSON.parse(v) as unknown;
    return parsed && typeof parsed === 'object' && !Array.isArray(parsed) ? (parsed as FreezeFrame) : {};
  } catch {
    return {};
  }
}
