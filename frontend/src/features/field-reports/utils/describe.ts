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

/** "all vehicles", "Halden", "Halden Tarn 1.6 T, 2015–2020". */
export function describeScope(scope: Partial<VehicleScopeDto>): string {
  const name = [scope.make, scope.model, scope.engine].filter((x) => x).join(' ');
  const from = scope.yearFrom ?? null;
  const to = scope.yearTo ?? null;
  const years = from !== null && to !== null ? (from === to ? `${from}` : `${from}–${to}`) : from !== null ? `${from} on` : to !== null ? `up to ${to}` : '';
  if (!name && !years) return 'all vehicles';
  return [name || 'all makes', years].filter(Boolean).join(', ');
}
