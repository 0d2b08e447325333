import type { OdometerLowerDetails } from '@causeway/shared';
import { isApiError } from '@/lib/api-client';

/** The details of a 409 "odometer lower than the last reading" answer, or null for any other error. */
export function odometerLowerDetails(error: unknown): OdometerLowerDetails | null {
  if (!isApiError(error) || error.status !== 409) return null;
  const details = error.body.details as Partial<OdometerLowerDetails> | undefined;
  if (!details || details.reason !== 'odometer-lower') return null;
  return details as OdometerLowerDetails;
}

export function formatDistance(value: number, unit: 'km' | 'mi', locale: string): string {
  return `${new Intl.NumberFormat(locale, { maximumFractionDigits: 1 }).format(value)} ${unit === 'mi' ? 'mi' : 'km'}`;
}
