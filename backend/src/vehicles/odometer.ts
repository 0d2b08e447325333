import { ConflictException } from '@nestjs/common';
import { fromKm, toKm, type DistanceUnit, type OdometerLowerDetails } from '@causeway/shared';

/** A stored km reading in the shop's unit, as shown: rounded to a whole unit. */
export function shownReading(km: number | null, unit: DistanceUnit): number | null {
  return km === null ? null : Math.round(fromKm(km, unit));
}

/**
 * The km to store for a new reading `given` in the shop's unit, or a 409 when it is lower than
 * the last reading as shown and not confirmed. Comparing with the shown (rounded) reading means
 * that re-entering the number on screen never raises the warning.
 * Returns the stored km unchanged when the reading equals the one shown (no drift from rounding).
 */
export function nextOdometerKm(lastKm: number | null, given: number, unit: DistanceUnit, confirmed: boolean | undefined): number {
  const shown = shownReading(lastKm, unit);
  if (lastKm !== null && shown !== null) {
    if (given === shown) return lastKm;
    if (given < shown && !confirmed) {
      const details: OdometerLowerDetails = {
        reason: 'odometer-lower',
        field: 'odometer',
        lastReading: shown,
        lastReadingKm: lastKm,
        given,
        unit,
        confirmWith: { confirmOdometerLower: true },
      };
      const message = `odometer: ${given} ${unit} is lower than the last reading of ${shown} ${unit}. If it is right (say, the instrument cluster was replaced), send it again with confirmOdometerLower: true`;
      throw new ConflictException({
        statusCode: 409,
        error: 'Conflict',
        message,
        errors: [{ field: 'odometer', message: `is lower than the last reading (${shown} ${unit}); confirm to keep it` }],
        details,
      });
    }
  }
  return toKm(given, unit);
}
