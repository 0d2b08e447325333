import type { VehicleDto, VehicleInput } from '@causeway/shared';

/** A vehicle as the form holds it. */
export interface VehicleFormValues {
  vin: string;
  make: string;
  model: string;
  engine?: string;
  year?: number | null;
  plate?: string;
  odometer?: number | null;
  ownerName?: string;
  ownerEmail?: string;
}

export const VEHICLE_FIELD_LABELS = {
  vin: 'VIN',
  make: 'Make',
  model: 'Model',
  engine: 'Engine',
  year: 'Model year',
  plate: 'Registration plate',
  odometer: 'Odometer',
  ownerName: "Owner's name",
  ownerEmail: "Owner's e-mail",
} as const satisfies Record<keyof VehicleFormValues, string>;

export function vehicleToFormValues(vehicle: VehicleDto): VehicleFormValues {
  return {
    vin: vehicle.vin,
    make: vehicle.make,
    model: vehicle.model,
    engine: vehicle.engine ?? '',
    year: vehicle.year,
    plate: vehicle.plate ?? '',
    odometer: vehicle.odometer,
    ownerName: vehicle.ownerName ?? '',
    ownerEmail: vehicle.ownerEmail ?? '',
  };
}

function textOrNull(value: string | undefined): string | null {
  const trimmed = value?.trim() ?? '';
  return trimmed === '' ? null : trimmed;
}

/**
 * The form's values as the server takes them. A new vehicle without a year leaves it out, so the
 * server reads it from VIN position 10; an edited one sends null to clear it.
 */
export function formValuesToVehicle(values: VehicleFormValues, { editing }: { editing: boolean }): VehicleInput {
  const year = values.year ?? null;
  const odometer = values.odometer ?? null;
  return {
    vin: values.vin.trim(),
    make: values.make.trim(),
    model: values.model.trim(),
    engine: textOrNull(values.engine),
    ...(year !== null || editing ? { year } : {}),
    plate: textOrNull(values.plate),
    ...(odometer !== null || editing ? { odometer } : {}),
    ownerName: textOrNull(values.ownerName),
    ownerEmail: textOrNull(values.ownerEmail),
  };
}
