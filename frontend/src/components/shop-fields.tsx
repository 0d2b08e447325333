import { Form, Input, InputNumber, Radio, Select, Typography } from 'antd';
import { useMemo } from 'react';
import { COMMON_CURRENCIES, COMMON_LOCALES, currencyLabel, localeLabel } from '@/config/locales';
import {
  currencyFractionDigits,
  formatMoney,
  formatTaxRate,
  grossFromNet,
  percentToBasisPoints,
  toMinorUnits,
} from '@/utils/money';
import { SHOP_FIELD_LABELS } from '@/utils/shop-form';

type ShopFieldsProps = {
  /** Where the shop sits in the form's values: `['shop']` in the register form, `[]` on its own. */
  prefix?: string[];
};

const numberPattern = /^\s*\d+(?:[.,]\d*)?\s*$/;

/** The fields of a shop's settings, shared by "Start a new shop" and the shop settings page. */
export function ShopFields({ prefix = [] }: ShopFieldsProps) {
  const form = Form.useFormInstance();
  const name = (field: string) => [...prefix, field];
  const currency = (Form.useWatch(name('currency'), form) as string | undefined) ?? 'EUR';
  const locale = (Form.useWatch(name('locale'), form) as string | undefined) ?? 'en-GB';
  const labourRate = Form.useWatch(name('labourRate'), form) as string | undefined;
  const taxRate = Form.useWatch(name('taxRate'), form) as string | undefined;
  const digits = currencyFractionDigits(currency);

  const currencyOptions = useMemo(() => COMMON_CURRENCIES.map((code) => ({ value: code, label: currencyLabel(code) })), []);
  const localeOptions = useMemo(() => COMMON_LOCALES.map((code) => ({ value: code, label: localeLabel(code) })), []);

  const net = toMinorUnits(labourRate, currency);
  const bp = percentToBasisPoints(taxRate);
  let preview: string | null = null;
  try {
    if (net !== null && bp !== null) {
      preview = `${formatMoney(net, currency, locale)} per hour before tax is ${formatMoney(grossFromNet(net, bp), currency, locale)} with ${formatTaxRate(bp, locale)} tax.`;
    }
  } catch {
    preview = null;
  }

  return (
    <>
      <Form.Item
        name={name('name')}
        label={SHOP_FIELD_LABELS.name}
        rules={[
          { required: true, whitespace: true, message: 'Give the name of the shop' },
          { min: 2, max: 120, message: 'Between 2 and 120 characters' },
        ]}
      >
        <Input autoComplete="organization" />
      </Form.Item>
      <Form.Item
        name={name('currency')}
        label={SHOP_FIELD_LABELS.currency}
        rules={[{ required: true, message: 'Choose the currency you charge in' }]}
      >
        <Select showSearch={{ optionFilterProp: 'label' }} options={currencyOptions} />
      </Form.Item>
      <Form.Item
        name={name('locale')}
        label={SHOP_FIELD_LABELS.locale}
        extra="How money, numbers and dates are written for your shop."
        rules={[{ required: true, message: 'Choose how numbers are written' }]}
      >
        <Select showSearch={{ optionFilterProp: 'label' }} options={localeOptions} />
      </Form.Item>
      <Form.Item
        name={name('labourRate')}
        label={`${SHOP_FIELD_LABELS.labourRateMinor} per hour, before tax (${currency})`}
        rules={[
          { required: true, message: 'Give your labour rate per hour' },
          { pattern: numberPattern, message: 'A number such as 95 or 95.50' },
        ]}
      >
        <InputNumber<string> stringMode min="0" step={digits > 0 ? `0.${'0'.repeat(digits - 1)}1` : '1'} precision={digits} style={{ width: '100%' }} />
      </Form.Item>
      <Form.Item
        name={name('taxRate')}
        label={`${SHOP_FIELD_LABELS.taxRateBp} (%)`}
        extra="Sales tax added to labour and parts, e.g. 20 for 20 % VAT. Enter 0 if you do not charge tax."
        rules={[
          { required: true, message: 'Give your tax rate, or 0' },
          { pattern: numberPattern, message: 'A number such as 20 or 17.5' },
        ]}
      >
        <InputNumber<string> stringMode min="0" max="100" step="0.5" precision={2} suffix="%" style={{ width: '100%' }} />
      </Form.Item>
      {preview && (
        <Typography.Paragraph type="secondary" aria-live="polite">
          {preview}
        </Typography.Paragraph>
      )}
      <Form.Item name={name('distanceUnit')} label={SHOP_FIELD_LABELS.distanceUnit} rules={[{ required: true }]}>
        <Radio.Group
          optionType="button"
          options={[
            { value: 'km', label: 'Kilometres' },
            { value: 'mi', label: 'Miles' },
          ]}
        />
      </Form.Item>
    </>
  );
}
