import { formatPercent } from '@causeway/shared';

export function taxRateLabel(taxRateBp: number, locale: string): string {
  return new Intl.NumberFormat(locale, { style: 'percent', maximumFractionDigits: 2 }).format(taxRateBp / 10_000);
}

export function percent(p: number, locale: string): string {
  return formatPercent(p, locale);
}

export function formatWhen(iso: string, locale: string): string {
  return new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(iso));
}

export function formatDay(iso: string, locale: string): string {
  return new Intl.DateTimeFormat(locale, { dateStyle: 'long' }).format(new Date(iso));
}

export const DEFER_PREFIX = "Follow the vehicle maker's procedure";
