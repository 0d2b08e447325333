import type { DistanceUnit } from '@causeway/shared';

/** The currencies offered when a shop is set up; any ISO 4217 code can be typed in the search. */
export const COMMON_CURRENCIES = [
  'GBP', 'EUR', 'USD', 'CAD', 'AUD', 'NZD', 'CHF', 'SEK', 'NOK', 'DKK', 'PLN', 'CZK', 'HUF', 'RON',
  'BGN', 'TRY', 'ZAR', 'INR', 'JPY', 'SGD', 'HKD', 'AED', 'MXN', 'BRL',
] as const;

/** Locales (BCP 47) that decide how numbers, money and dates are written. */
export const COMMON_LOCALES = [
  'en-GB', 'en-IE', 'en-US', 'en-CA', 'fr-CA', 'en-AU', 'en-NZ', 'en-ZA', 'en-IN', 'de-DE', 'de-AT', 'de-CH',
  'fr-FR', 'fr-BE', 'nl-NL', 'nl-BE', 'es-ES', 'es-MX', 'pt-PT', 'pt-BR', 'it-IT', 'pl-PL', 'cs-CZ', 'hu-HU',
  'ro-RO', 'sv-SE', 'nb-NO', 'da-DK', 'fi-FI', 'tr-TR', 'ja-JP',
] as const;

const EURO_REGIONS = new Set(['AT', 'BE', 'CY', 'DE', 'EE', 'ES', 'FI', 'FR', 'GR', 'HR', 'IE', 'IT', 'LT', 'LU', 'LV', 'MT', 'NL', 'PT', 'SI', 'SK']);
const REGION_CURRENCIES: Record<string, string> = {
  GB: 'GBP', US: 'USD', CA: 'CAD', AU: 'AUD', NZ: 'NZD', CH: 'CHF', SE: 'SEK', NO: 'NOK', DK: 'DKK', PL: 'PLN',
  CZ: 'CZK', HU: 'HUF', RO: 'RON', BG: 'BGN', TR: 'TRY', ZA: 'ZAR', IN: 'INR', JP: 'JPY', SG: 'SGD', HK: 'HKD',
  AE: 'AED', MX: 'MXN', BR: 'BRL',
};
/** Where road distances are signed in miles. */
const MILE_REGIONS = new Set(['GB', 'US', 'LR', 'MM']);

function region(locale: string): string | undefined {
  try {
    return new Intl.Locale(locale).maximize().region;
  } catch {
    return undefined;
  }
}

/** A sensible starting point for a new shop, from the browser's locale. The user can change all of it. */
export function shopDefaultsFor(locale: string): { locale: string; currency: string; distanceUnit: DistanceUnit } {
  const known = (COMMON_LOCALES as readonly string[]).includes(locale) ? locale : 'en-GB';
  const r = region(known) ?? 'GB';
  const currency = EURO_REGIONS.has(r) ? 'EUR' : (REGION_CURRENCIES[r] ?? 'EUR');
  return { locale: known, currency, distanceUnit: MILE_REGIONS.has(r) ? 'mi' : 'km' };
}

function displayName(type: 'currency' | 'language', code: string): string | undefined {
  try {
    return new Intl.DisplayNames(['en'], { type }).of(code);
  } catch {
    return undefined;
  }
}

export function currencyLabel(code: string): string {
  const name = displayName('currency', code);
  return name && name !== code ? `${code} — ${name}` : code;
}

export function localeLabel(code: string): string {
  const name = displayName('language', code);
  return name && name !== code ? `${name} (${code})` : code;
}
