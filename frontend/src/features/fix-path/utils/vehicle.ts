import type { PossibleCauseRowDto, VehicleScopeQuery } from '@causeway/shared';

const KEYS = ['make', 'model', 'engine', 'year'] as const;

/** The vehicle in the bay, as kept in the address (`?make=Halden&model=Tarn&engine=1.6+T&year=2019`). */
export function parseVehicleParams(search: URLSearchParams): VehicleScopeQuery {
  const text = (key: string) => {
    const value = (search.get(key) ?? '').trim().slice(0, 60);
    return value || undefined;
  };
  const make = text('make');
  const model = make ? text('model') : undefined;
  const engine = model ? text('engine') : undefined;
  const year = Number.parseInt(search.get('year') ?? '', 10);
  return {
    ...(make ? { make } : {}),
    ...(model ? { model } : {}),
    ...(engine ? { engine } : {}),
    ...(Number.isSafeInteger(year) && year >= 1950 && year <= 2100 ? { year } : {}),
  };
}

/** The address's other parameters, with the vehicle's replaced. */
export function withVehicleParams(search: URLSearchParams, vehicle: VehicleScopeQuery): URLSearchParams {
  const next = new URLSearchParams(search);
  for (const key of KEYS) next.delete(key);
  if (vehicle.make) next.set('make', vehicle.make);
  if (vehicle.make && vehicle.model) next.set('model', vehicle.model);
  if (vehicle.make && vehicle.model && vehicle.engine) next.set('engine', vehicle.engine);
  if (vehicle.year) next.set('year', String(vehicle.year));
  return next;
}

export function describeVehicle(vehicle: VehicleScopeQuery): string {
  const parts = [vehicle.make, vehicle.model, vehicle.engine].filter(Boolean);
  if (parts.length === 0) return vehicle.year ? `any vehicle from ${vehicle.year}` : 'any vehicle';
  return `${parts.join(' ')}${vehicle.year ? ` (${vehicle.year})` : ''}`;
}

export interface ModelOption {
  model: string;
  engines: string[];
  /** Earliest and latest model year the knowledge base has rows for; null = open. */
  yearFrom: number | null;
  yearTo: number | null;
}

export interface MakeOption {
  make: string;
  models: ModelOption[];
}

/** The makes, models and engines the knowledge base has vehicle-specific rows for. */
export function vehicleOptions(rows: readonly Pick<PossibleCauseRowDto, 'make' | 'model' | 'engine' | 'yearFrom' | 'yearTo'>[]): MakeOption[] {
  const makes = new Map<string, Map<string, ModelOption>>();
  for (const row of rows) {
    if (!row.make) continue;
    const models = makes.get(row.make) ?? new Map<string, ModelOption>();
    makes.set(row.make, models);
    if (!row.model) continue;
    const option = models.get(row.model) ?? { model: row.model, engines: [], yearFrom: row.yearFrom, yearTo: row.yearTo };
    if (row.engine && !option.engines.includes(row.engine)) option.engines.push(row.engine);
    option.yearFrom = option.yearFrom === null || row.yearFrom === null ? null : Math.min(option.yearFrom, row.yearFrom);
    option.yearTo = option.yearTo === null || row.yearTo === null ? null : Math.max(option.yearTo, row.yearTo);
    models.set(row.model, option);
  }
  return [...makes.entries()]
    .map(([make, models]) => ({
      make,
      models: [...models.values()].map((m) => ({ ...m, engines: m.engines.sort() })).sort((a, b) => a.model.localeCompare(b.model)),
    }))
    .sort((a, b) => a.make.localeCompare(b.make));
}
