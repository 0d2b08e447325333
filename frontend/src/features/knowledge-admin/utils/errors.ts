import type { FieldError } from '@causeway/shared';
import { ApiError, isApiError } from '@/lib/api-client';

/**
 * Some server messages are whole sentences ("the priors of … would sum to …", "there is no
 * teardown x"); the form puts the field's label in front, so they are turned into predicates.
 */
export function asPredicate(message: string): string {
  return message
    .replace(/^the priors of (.+?) would sum to ([^;]+)/, 'would make the priors of $1 sum to $2')
    .replace(/^the (?:teardown|part|scope) is for /, 'is for ')
    .replace(/^there is no (?:[a-z-]+ )+?(\S+)$/, 'names $1, which does not exist');
}

function percent(fraction: string): string {
  return `${Number((Number(fraction) * 100).toFixed(1))} %`;
}

/**
 * The server speaks of priors as fractions and costs in minor units; the forms in percent and
 * currency. Field messages are put in the form's terms, and nested paths (`check.hours`,
 * `cautions.2`) are moved onto the field that shows them.
 */
export function inFormTerms(error: unknown, nested: Record<string, string> = {}): unknown {
  if (!isApiError(error) || error.fieldErrors.length === 0) return error;
  const errors: FieldError[] = error.fieldErrors.map((e) => {
    let field = e.field;
    for (const [prefix, target] of Object.entries(nested)) if (field === prefix || field.startsWith(`${prefix}.`)) field = target;
    let message = e.message;
    if (e.field === 'prior') {
      message = message
        .replace(/between 0 and 1\b/, 'between 0 % and 100 %')
        .replace(/would sum to ([\d.]+)/, (_m, sum: string) => `would sum to ${percent(sum)}`)
        .replace(/at most 1 \(/, 'at most 100 % (');
    }
    if (e.field === 'partCostMinor') message = message.replace(/between 0 and (\d+)/, (_m, max: string) => `between 0 and ${(Number(max) / 100).toLocaleString('en')}`);
    return { field, message: asPredicate(message) };
  });
  return new ApiError(error.status, { ...error.body, errors });
}
