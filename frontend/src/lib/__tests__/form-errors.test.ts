// @vitest-environment node
import type { FormInstance } from 'antd';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { applyFieldErrors, formAlertMessage, toNamePath } from '@/lib/form-errors';

function fakeForm() {
  const setFields = vi.fn();
  return { form: { setFields } as unknown as FormInstance, setFields };
}

describe('form errors', () => {
  it('turns dotted field paths into antd name paths', () => {
    expect(toNamePath('shop.currency')).toEqual(['shop', 'currency']);
    expect(toNamePath('causes.2.probability')).toEqual(['causes', 2, 'probability']);
  });

  it("puts each server error on its form field, worded with the field's label", () => {
    const { form, setFields } = fakeForm();
    const error = new ApiError(400, {
      statusCode: 400,
      error: 'Bad Request',
      message: 'summary',
      errors: [
        { field: 'shop.currency', message: 'must be an ISO 4217 currency code such as GBP or EUR' },
        { field: 'shop.labourRateMinor', message: 'labourRateMinor must be an integer number' },
        { field: 'shop.labourRateMinor', message: 'labourRateMinor must not be less than 0' },
        { field: 'shop', message: 'give either an invite code or a shop' },
      ],
    });

    const unplaced = applyFieldErrors(form, error, {
      labels: { 'shop.currency': 'Currency', 'shop.labourRateMinor': 'Labour rate' },
      rename: { 'shop.labourRateMinor': 'shop.labourRate' },
    });

    expect(setFields).toHaveBeenCalledWith([
      { name: ['shop', 'currency'], errors: ['Currency must be an ISO 4217 currency code such as GBP or EUR'] },
      { name: ['shop', 'labourRate'], errors: ['Labour rate must be an integer number', 'Labour rate must not be less than 0'] },
    ]);
    expect(unplaced).toEqual([{ field: 'shop', message: 'give either an invite code or a shop' }]);
    expect(formAlertMessage(error, unplaced)).toBe('Give either an invite code or a shop');
  });

  it('shows the message of an error without field errors above the form', () => {
    const error = new ApiError(403, { statusCode: 403, error: 'Forbidden', message: 'This account is disabled; ask an administrator' });
    expect(formAlertMessage(error, [])).toBe('This account is disabled; ask an administrator');
  });
});
