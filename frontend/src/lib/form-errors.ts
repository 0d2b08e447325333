import type { FieldError } from '@causeway/shared';
import type { FormInstance } from 'antd';
import { isApiError } from './api-client';

export type NamePath = (string | number)[];

/** `shop.currency` → `['shop', 'currency']`; `causes.2.probability` → `['causes', 2, 'probability']`. */
export function toNamePath(field: string): NamePath {
  return field.split('.').map((part) => (/^\d+$/.test(part) ? Number(part) : part));
}

export interface FieldErrorOptions {
  /**
   * The form's fields by the server's dotted path, with the label the user sees. Errors on
   * fields not listed here are not placed on the form but returned, to be shown above it.
   */
  labels: Record<string, string>;
  /** Server path → form path, where the form holds the value under another name (e.g. a decimal for minor units). */
  rename?: Record<string, string>;
}

/**
 * The server words field errors as a predicate ("is already registered") and class-validator
 * sometimes starts with the property name ("labourRateMinor must be …"); both become a
 * sentence that starts with the label the user sees.
 */
export function describeFieldError(error: FieldError, label?: string): string {
  const property = error.field.split('.').pop() ?? error.field;
  const predicate = error.message.startsWith(`${property} `) ? error.message.slice(property.length + 1) : error.message;
  if (label) return `${label} ${predicate}`;
  return predicate.charAt(0).toUpperCase() + predicate.slice(1);
}

/**
 * Puts the server's field errors (`ApiErrorBody.errors`) on the form's fields with
 * `form.setFields`. Returns the errors that belong to no field of this form.
 */
export function applyFieldErrors(form: FormInstance, error: unknown, options: FieldErrorOptions): FieldError[] {
  if (!isApiError(error)) return [];
  const byField = new Map<string, string[]>();
  const unplaced: FieldError[] = [];
  for (const fieldError of error.fieldErrors) {
    const label = options.labels[fieldError.field];
    if (label === undefined) {
      unplaced.push(fieldError);
      continue;
    }
    const formField = options.rename?.[fieldError.field] ?? fieldError.field;
    const messages = byField.get(formField) ?? [];
    messages.push(describeFieldError(fieldError, label));
    byField.set(formField, messages);
  }
  form.setFields([...byField].map(([field, errors]) => ({ name: toNamePath(field), errors })));
  return unplaced;
}

/** The message to show above a form after a failed submit, or null when every error is on a field. */
export function formAlertMessage(error: unknown, unplaced: FieldError[]): string | null {
  if (!error) return null;
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (error.fieldErrors.length === 0) return error.message;
  if (unplaced.length > 0) return unplaced.map((e) => describeFieldError(e)).join(' ');
  return null;
}
