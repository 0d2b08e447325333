import { formatMoney, formatPercent, type MoneyContext } from '@causeway/shared';

/** Expected costs are averages and may fall between minor units; they are shown to the nearest one. */
export function money(minor: number, ctx: Pick<MoneyContext, 'currency' | 'locale'>): string {
  return formatMoney(Math.round(minor), ctx.currency, ctx.locale);
}

/** A probability as a whole percentage in the shop's style. */
export function percent(p: number, locale: string): string {
  return formatPercent(Math.min(1, Math.max(0, p)), locale);
}

export function hours(h: number, locale: string): string {
  return `${new Intl.NumberFormat(locale, { maximumFractionDigits: 2 }).format(h)} h`;
}
