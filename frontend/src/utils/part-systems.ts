import type { PartSystem } from '@causeway/shared';

/** A part's system in words, as the pickers and tables show it. */
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

/** A part's system in words; an unknown key is shown as it is. */
export function systemLabel(system: string): string {
  return SYSTEM_LABELS[system as PartSystem] ?? system;
}
