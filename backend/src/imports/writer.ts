import type { CodeStatus, FreezeFrame } from '@causeway/shared';
import type { NormalRow } from './rows';
import { uuid7 } from './uuid7';

/**
 * The commit step, written once as a generator of SQL operations so that it runs synchronously on
 * the embedded SQLite (prepared statements, one transaction that nothing else can interleave with)
 * and asynchronously on PostgreSQL. Identifiers are double-quoted and parameters are `?`.
 */
export type SqlOp = { kind: 'get' | 'all' | 'run'; sql: string; params: unknown[] };
export type Row = Record<string, unknown>;
export type WriteProgram<T> = Generator<SqlOp, T, unknown>;

const get = (sql: string, ...params: unknown[]): SqlOp => ({ kind: 'get', sql, params });
const all = (sql: string, ...params: unknown[]): SqlOp => ({ kind: 'all', sql, params });
const run = (sql: string, ...params: unknown[]): SqlOp => ({ kind: 'run', sql, params });

export interface WriteContext {
  shopId: string;
  userId: string;
  importId: string;
  fileName: string;
  now: Date;
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

const STATUS_RANK: Record<CodeStatus, number> = { pending: 0, stored: 1, permanent: 2 };

const SQL = {
  seen: 'SELECT 1 AS "x" FROM "import_rows" WHERE "shopId" = ? AND "hash" = ?',
  vehicle: 'SELECT "id", "odometerKm" FROM "vehicles" WHERE "shopId" = ? AND "vin" = ?',
  insertVehicle:
    'INSERT INTO "vehicles" ("id", "shopId", "vin", "make", "model", "engine", "year", "plate", "createdAt", "updatedAt") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)',
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
  insertRow:
    'INSERT INTO "import_rows" ("shopId", "importId", "hash", "line", "vehicleId", "jobId", "scanDay", "code", "module") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)',
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
  created: boolean;
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
  nextPosition: number;
  codes: Map<string, CodeState>;
}

/** Per VIN and per vehicle-day: what the new vehicle or job starts with. */
function firstPass(rows: NormalRow[]) {
  const vins = new Map<string, { make: string | null; model: string | null; engine: string | null; year: number | null; plate: string | null }>();
  const days = new Map<string, { openedAt: number; odometerKm: number | null }>();
  for (const r of rows) {
    const v = vins.get(r.vin);
    if (!v) vins.set(r.vin, { make: r.make, model: r.model, engine: r.engine, year: r.year, plate: r.plate });
    else {
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
    if (seen.has(r.hash) || (yield get(SQL.seen, ctx.shopId, r.hash))) {
      result.skippedDuplicates += 1;
      if (ctx.previewLines.has(r.line)) result.duplicateLines.push(r.line);
      continue;
    }
    seen.add(r.hash);

    let vehicle = vehicles.get(r.vin);
    if (!vehicle) {
      const found = (yield get(SQL.vehicle, ctx.shopId, r.vin)) as Row | undefined;
      if (found) {
        vehicle = { id: String(found.id), created: false, odometerKm: found.odometerKm === null ? null : Number(found.odometerKm), newKm: null, newKmAt: 0 };
      } else {
        const info = vins.get(r.vin)!;
        vehicle = { id: uuid7(), created: true, odometerKm: null, newKm: null, newKmAt: 0 };
        yield run(SQL.insertVehicle, vehicle.id, ctx.shopId, r.vin, info.make ?? '', info.model ?? '', info.engine, info.year ?? modelYearOf(r.vin), info.plate, now, now);
        result.createdVehicles += 1;
      }
      vehicles.set(r.vin, vehicle);
    }
    if (r.odometerKm !== null && (vehicle.newKm === null || r.odometerKm > vehicle.newKm)) {
      vehicle.newKm = r.odometerKm;
      vehicle.newKmAt = r.scannedAt;
    }

    const dayKey = `${r.vin}|${r.scanDay}`;
    let job = jobs.get(dayKey);
    if (!job) {
      const existing = vehicle.created ? undefined : ((yield get(SQL.importedJob, ctx.shopId, vehicle.id, r.scanDay)) as Row | undefined);
      if (existing) {
        const codes = (yield all(SQL.jobCodes, existing.jobId)) as Row[];
        job = { id: String(existing.jobId), created: false, nextPosition: 0, codes: new Map() };
        for (const c of codes) {
          job.codes.set(String(c.code), { id: String(c.id), status: c.status as CodeStatus, freezeFrame: parseJson(c.freezeFrame), dirty: false });
          job.nextPosition = Math.max(job.nextPosition, Number(c.position) + 1);
        }
      } else {
        const day = days.get(dayKey)!;
        job = { id: uuid7(), created: true, nextPosition: 0, codes: new Map() };
        const complaint = `Codes read with a scan tool on ${r.scanDay}, imported from "${ctx.fileName}".`;
        yield run(SQL.insertJob, job.id, ctx.shopId, vehicle.id, complaint, ctx.userId, day.odometerKm, new Date(day.openedAt), ctx.userId, now, now);
        yield run(SQL.insertImportJob, job.id, ctx.shopId, vehicle.id, r.scanDay, ctx.importId);
        result.createdJobs += 1;
      }
      jobs.set(dayKey, job);
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
      yield run(SQL.insertCode, id, job.id, r.code, r.display, job.nextPosition, r.status, JSON.stringify(r.freezeFrame));
      job.nextPosition += 1;
      job.codes.set(r.code, { id, status: r.status, freezeFrame: { ...r.freezeFrame }, dirty: false });
      result.createdCodes += 1;
    }
    yield run(SQL.insertRow, ctx.shopId, ctx.importId, r.hash, r.line, vehicle.id, job.id, r.scanDay, r.display, r.module);
  }

  for (const v of vehicles.values()) {
    if (v.newKm === null || (v.odometerKm !== null && v.newKm <= v.odometerKm)) continue;
    yield run(SQL.updateOdometer, v.newKm, new Date(v.newKmAt), now, v.id);
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
