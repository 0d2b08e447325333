import { BadRequestException, ValidationError, ValidationPipeOptions } from '@nestjs/common';
import type { FieldError } from '@causeway/shared';

/** Flattens class-validator's tree into dotted field paths (`shop.currency`, `causes.2.probability`). */
export function flattenValidationErrors(errors: ValidationError[], parent = ''): FieldError[] {
  const out: FieldError[] = [];
  for (const error of errors) {
    // A parameter sent with an empty name ("?=x", {"": 1}) still gets a field to be named by.
    const property = error.property === '' ? '(empty name)' : error.property;
    const field = parent ? `${parent}.${property}` : property;
    for (const message of Object.values(error.constraints ?? {})) {
      out.push({ field, message: message.replace(/^property (\S*) should not exist$/, 'is not an accepted field') });
    }
    if (error.children?.length) out.push(...flattenValidationErrors(error.children, field));
  }
  return out;
}

export function validationFailed(errors: FieldError[]): BadRequestException {
  const summary = errors.map((e) => `${e.field}: ${e.message}`).join('; ');
  return new BadRequestException({ statusCode: 400, error: 'Bad Request', message: summary, errors });
}

/** The one set of options for the global ValidationPipe; e2e bootstraps reuse it. */
export const validationPipeOptions: ValidationPipeOptions = {
  whitelist: true,
  forbidNonWhitelisted: true,
  transform: true,
  stopAtFirstError: false,
  exceptionFactory: (errors) => validationFailed(flattenValidationErrors(errors)),
};
