import type { DistanceUnit, ShopDto } from '@causeway/shared';
import { basisPointsToPercent, fromMinorUnits, percentToBasisPoints, toMinorUnits } from './money';

export type ShopSettings = Omit<ShopDto, 'id'>;

/** A shop as the form holds it: money and tax as the decimals the user types. */
export interface ShopFormValues {
  name: string;
  currency: string;
  locale: string;
  /** Per hour before tax, in major units ("120.00"). */
  labourRate: string;
  /** Percent ("20", "17.5"). */
  taxRate: string;
  distanceUnit: DistanceUnit;
}

export function shopToFormValues(shop: ShopSettings): ShopFormValues {
  return {
    name: shop.name,
    currency: shop.currency,
    locale: shop.locale,
    labourRate: fromMinorUnits(shop.labourRateMinor, shop.currency),
    taxRate: basisPointsToPercent(shop.taxRateBp),
    distanceUnit: shop.distanceUnit,
  };
}

/** The form's values as the server takes them: integer minor units and basis points. */
export function formValuesToShop(values: ShopFormValues): ShopSettings {
  return {
    name: values.name.trim(),
    currency: values.currency,
    locale: values.locale,
    // The form's rules have already refused anything that is not a number.
    labourRateMinor: toMinorUnits(values.labourRate, values.currency) ?? 0,
    taxRateBp: percentToBasisPoints(values.taxRate) ?? 0,
    distanceUnit: values.distanceUnit,
  };
}

/** Labels of the shop fields by the server's field name, for mapping its field errors. */
export const SHOP_FIELD_LABELS = {
  name: 'Shop name',
  currency: 'Currency',
  locale: 'Number format',
  labourRateMinor: 'Labour rate',
  taxRateBp: 'Tax rate',
  distanceUnit: 'Distance unit',
} as const satisfies Record<keyof ShopSettings, string>;

/** Server field → form field, where the form holds a decimal for the server's integer. */
export const SHOP_FIELD_RENAMES = {
  labourRateMinor: 'labourRate',
  taxRateBp: 'taxRate',
} as const;

/** Labels and renames under a prefix (`shop.` in the register form). */
export function shopFieldErrorOptions(prefix = ''): { labels: Record<string, string>; rename: Record<string, string> } {
  const labels: Record<string, string> = {};
  for (const [field, label] of Object.entries(SHOP_FIELD_LABELS)) labels[`${prefix}${field}`] = label;
  const rename: Record<string, string> = {};
  for (const [from, to] of Object.entries(SHOP_FIELD_RENAMES)) rename[`${prefix}${from}`] = `${prefix}${to}`;
  return { labels, rename };
}
