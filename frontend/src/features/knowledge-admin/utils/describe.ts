import type { PartSystem, VehicleScopeDto } from '@causeway/shared';

export const SYSTEM_LABELS: Record<PartSystem, string> = {
  fuel: 'Fuel',
  ignition: 'Ignition',
  'air-intake': 'Air intake',
  'fuel-injection': 'Fuel injection',
  exhaust: 'Exhaust',
  evap: 'Evaporative emissions (EVAP)',
  hybrid: 'Hybrid high-voltage system',
  srs: 'Airbags (SRS)',
  brakes: 'Brakes',
  network: 'Network',
  cooling: 'Cooling',
  electrical: 'Electrical',
  'engine-mechanical': 'Engine mechanical',
};

export function systemLabel(system: string): string {
  return SYSTEM_LABELS[system as PartSystem] ?? system;
}

export function describeScope(scope: Partial<VehicleScopeDto>): string {
  const name = [scope.make, scope.model, scope.engine].filter((x) => x).join(' ');
  const from = scope.yearFrom ?? null;
  const to = scope.yearTo ?? null;
  const years = from !== null && to !== null ? (from === to ? `${from}` : `${from}–${to}`) : from !== null ? `${from} on` : to !== null ? `up to ${to}` : '';
  if (!name && !years) return 'All vehicles';
  return [name || 'All makes', years].filter(Boolean).join(', ');
}

export function scopeKeyOf(scope: Partial<VehicleScopeDto>): string {
  return JSON.stringify([scope.make ?? null, scope.model ?? null, scope.engine ?? null, scope.yearFrom ?? null, scope.yearTo ?? null]);
}
