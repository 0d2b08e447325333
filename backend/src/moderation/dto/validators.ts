import { Transform } from 'class-transformer';
import { ValidateBy, type ValidationOptions } from 'class-validator';
import { isIsoCurrency, KNOWLEDGE_LIMITS } from '@causeway/shared';

/**
 * One rule, one message: each decorator here checks type and range together, so a bad value
 * gets a single message naming the rule (`must be a number between 0 and 1`).
 */
export function NumberBetween(min: number, max: number, opts: { integer?: boolean } & ValidationOptions = {}): PropertyDecorator {
  const what = opts.integer ? 'a whole number' : 'a number';
  return ValidateBy(
    {
      name: 'numberBetween',
      validator: {
        validate: (v: unknown) => typeof v === 'number' && Number.isFinite(v) && v >= min && v <= max && (!opts.integer || Number.isInteger(v)),
        defaultMessage: () => `must be ${what} between ${min} and ${max}`,
      },
    },
    opts,
  );
}

export function TextLength(min: number, max: number, opts: ValidationOptions = {}): PropertyDecorator {
  return ValidateBy(
    {
      name: 'textLength',
      validator: {
        validate: (v: unknown) => typeof v === 'string' && v.length >= min && v.length <= max,
        defaultMessage: () => (min > 0 ? `must be text of ${min} to ${max} characters` : `must be text of at most ${max} characters`),
      },
    },
    opts,
  );
}

export const KEY_PATTERN = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

/** A stable key such as `fuel-cap`: lower-case letters and digits joined by single dashes. */
export function KnowledgeKey(max: number, opts: ValidationOptions = {}): PropertyDecorator {
  return ValidateBy(
    {
      name: 'knowledgeKey',
      validator: {
        validate: (v: unknown) => typeof v === 'string' && v.length <= max && KEY_PATTERN.test(v),
        defaultMessage: () => `must be a key of at most ${max} characters: lower-case letters and digits joined by dashes, e.g. fuel-cap`,
      },
    },
    opts,
  );
}

export function IsoCurrency(opts: ValidationOptions = {}): PropertyDecorator {
  return ValidateBy(
    {
      name: 'isoCurrency',
      validator: {
        validate: (v: unknown) => typeof v === 'string' && isIsoCurrency(v),
        defaultMessage: () => 'must be an ISO 4217 currency code such as GBP or EUR',
      },
    },
    opts,
  );
}

export function ModelYear(opts: ValidationOptions = {}): PropertyDecorator {
  return NumberBetween(KNOWLEDGE_LIMITS.yearMin, KNOWLEDGE_LIMITS.yearMax, { integer: true, ...opts });
}

/** Trims text; blank text becomes null (for optional scope fields: null = any). */
export const TrimToNull = () => Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() || null : value));
export const Trim = () => Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));
