/** The browser's locale; the shop's locale is preferred wherever the user has a shop. */
export function browserLocale(): string {
  return typeof navigator !== 'undefined' && navigator.language ? navigator.language : 'en-GB';
}

export function formatDate(iso: string, locale: string = browserLocale()): string {
  return new Intl.DateTimeFormat(locale, { dateStyle: 'medium' }).format(new Date(iso));
}

export function formatDateTime(iso: string, locale: string = browserLocale()): string {
  return new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(iso));
}
