import type { VehicleScopeDto } from '@causeway/shared';

/**
 * "all vehicles", "Halden", "Halden Tarn 1.6 T, 2015–2020".
 * `capitalised` starts the "all …" wording with a capital, for a table cell or a label of its own.
 */
export function describeScope(scope: Partial<VehicleScopeDto>, { capitalised = false }: { capitalised?: boolean } = {}): string {
  const name = [scope.make, scope.model, scope.engine].filter((x) => x).join(' ');
  const from = scope.yearFrom ?? null;
  const to = scope.yearTo ?? null;
  const years = from !== null && to !== null ? (from === to ? `${from}` : `${from}–${to}`) : from !== null ? `${from} on` : to !== null ? `up to ${to}` : '';
  if (!name && !years) return capitalised ? 'All vehicles' : 'all vehicles';
  return [name || (capitalised ? 'All makes' : 'all makes'), years].filter(Boolean).join(', ');
}

/** One string per scope, to group and sort rows of the same scope together. */
export function scopeKeyOf(scope: Partial<VehicleScopeDto>): string {
  return JSON.stringify([scope.make ?? null, scope.model ?? null, scope.engine ?? null, scope.yearFrom ?? null, scope.yearTo ?? null]);
}

/** The scope fields as a form holds them. */
export interface ScopeValues {
  make?: string | null;
  model?: string | null;
  engine?: string | null;
  yearFrom?: number | null;
  yearTo?: number | null;
}

const blank = (s: string | null | undefined) => {
  const t = s?.trim() ?? '';
  return t === '' ? null : t;
};

/** The scope as the server takes it: empty text and missing years are null (any). */
export function scopeOf(values: ScopeValues): VehicleScopeDto {
  return { make: blank(values.make), model: blank(values.model), engine: blank(values.engine), yearFrom: values.yearFrom ?? null, yearTo: values.yearTo ?? null };
}

/** The scope fields' labels, for the form and for naming a field in a server error. */
export const SCOPE_LABELS = { make: 'Make', model: 'Model', engine: 'Engine', yearFrom: 'From model year', yearTo: 'To model year' } as const satisfies Record<keyof VehicleScopeDto, string>;
