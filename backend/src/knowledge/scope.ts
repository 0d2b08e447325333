import type { VehicleScopeDto, VehicleScopeQuery } from '@causeway/shared';

/**
 * Vehicle scope rules shared by possible causes, teardowns, add-ons and outcomes.
 *
 * A row (make, model, engine, yearFrom, yearTo; null = any) applies to a vehicle when every
 * non-null field matches what the vehicle states, case-insensitively, years inclusive. A make
 * or model the row names must be stated by the vehicle; an engine or year the vehicle does
 * not state does not rule a row out (the picker may not know it yet).
 */
export type Scoped = VehicleScopeDto;

/** 0 all vehicles, 1 make, 2 make + model (+ engine, years). */
export type ScopeLevel = 0 | 1 | 2;

function same(a: string, b: string): boolean {
  return a.trim().toLowerCase() === b.trim().toLowerCase();
}

function clean(s: string | null | undefined): string | undefined {
  const t = s?.trim();
  return t ? t : undefined;
}

export function normaliseVehicle(v: VehicleScopeQuery | null | undefined): VehicleScopeQuery {
  const out: VehicleScopeQuery = {};
  const make = clean(v?.make);
  const model = clean(v?.model);
  const engine = clean(v?.engine);
  if (make) out.make = make;
  // A model or engine without the make above it names nothing.
  if (make && model) out.model = model;
  if (make && model && engine) out.engine = engine;
  if (typeof v?.year === 'number' && Number.isInteger(v.year)) out.year = v.year;
  return out;
}

export function appliesTo(row: Scoped, v: VehicleScopeQuery): boolean {
  if (row.make !== null && (v.make === undefined || !same(row.make, v.make))) return false;
  if (row.model !== null && (v.model === undefined || !same(row.model, v.model))) return false;
  if (row.engine !== null && v.engine !== undefined && !same(row.engine, v.engine)) return false;
  if (v.year !== undefined) {
    if (row.yearFrom !== null && v.year < row.yearFrom) return false;
    if (row.yearTo !== null && v.year > row.yearTo) return false;
  }
  return true;
}

export function rowLevel(row: Scoped): ScopeLevel {
  if (row.make === null) return 0;
  return row.model === null ? 1 : 2;
}

export function vehicleLevel(v: VehicleScopeQuery): ScopeLevel {
  if (v.make === undefined) return 0;
  return v.model === undefined ? 1 : 2;
}

export function scopeKey(row: Scoped): string {
  const s = (x: string | null) => (x === null ? '' : x.trim().toLowerCase());
  return [s(row.make), s(row.model), s(row.engine), row.yearFrom ?? '', row.yearTo ?? ''].join('|');
}

/** Larger = more specific: level, then how many of engine/years are pinned, then the narrower year range. */
function specificity(row: Scoped): [number, number, number] {
  const pinned = (row.engine !== null ? 1 : 0) + (row.yearFrom !== null ? 1 : 0) + (row.yearTo !== null ? 1 : 0);
  const span = (row.yearTo ?? 9999) - (row.yearFrom ?? 0);
  return [rowLevel(row), pinned, -span];
}

function compareSpecificity(a: Scoped, b: Scoped): number {
  const [x, y] = [specificity(a), specificity(b)];
  for (let i = 0; i < 3; i++) if (x[i] !== y[i]) return x[i] - y[i];
  // Same specificity: any fixed order, so the answer never depends on row order.
  return scopeKey(b).localeCompare(scopeKey(a));
}

/**
 * The possible-cause list for a vehicle: the rows of the most specific scope that applies.
 * A vehicle-specific list replaces the generic one (its priors are curated for that vehicle
 * and may name other parts); lists are never merged.
 */
export function chooseList<T extends Scoped>(rows: T[], v: VehicleScopeQuery): { scope: Scoped | null; rows: T[] } {
  const groups = new Map<string, T[]>();
  for (const row of rows) {
    if (!appliesTo(row, v)) continue;
    const key = scopeKey(row);
    const group = groups.get(key);
    if (group) group.push(row);
    else groups.set(key, [row]);
  }
  let best: T[] | null = null;
  for (const group of groups.values()) {
    if (best === null || compareSpecificity(group[0], best[0]) > 0) best = group;
  }
  if (best === null) return { scope: null, rows: [] };
  const { make, model, engine, yearFrom, yearTo } = best[0];
  return { scope: { make, model, engine, yearFrom, yearTo }, rows: best };
}

export interface OutcomeVehicle {
  make: string | null;
  model: string | null;
  engine: string | null;
  year: number | null;
}

/**
 * The most specific back-off level an outcome shares with the vehicle, so every outcome is
 * counted once: 2 = same make and model (same engine when the vehicle states one) and within
 * the list's own scope; 1 = same make otherwise; 0 = any other vehicle.
 */
export function outcomeLevel(o: OutcomeVehicle, v: VehicleScopeQuery, list: Scoped | null): ScopeLevel {
  if (v.make === undefined || o.make === null || !same(o.make, v.make)) return 0;
  if (v.model === undefined || o.model === null || !same(o.model, v.model)) return 1;
  if (v.engine !== undefined && (o.engine === null || !same(o.engine, v.engine))) return 1;
  if (list !== null && rowLevel(list) === 2) {
    const ov: VehicleScopeQuery = { make: o.make, model: o.model, ...(o.engine ? { engine: o.engine } : {}), ...(o.year !== null ? { year: o.year } : {}) };
    if (!appliesTo(list, ov)) return 1;
  }
  return 2;
}

export function levelName(level: ScopeLevel, v: VehicleScopeQuery): string {
  if (level === 0) return 'all vehicles';
  if (level === 1) return v.make ?? '';
  return [v.make, v.model, v.engine].filter(Boolean).join(' ');
}

export function describeScope(s: Scoped | null): string {
  if (s === null || s.make === null) return 'all vehicles';
  const years = s.yearFrom !== null || s.yearTo !== null ? ` ${s.yearFrom ?? ''}–${s.yearTo ?? ''}` : '';
  return `${[s.make, s.model, s.engine].filter(Boolean).join(' ')}${years}`;
}
