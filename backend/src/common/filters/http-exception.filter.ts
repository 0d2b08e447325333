import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { STATUS_CODES } from 'node:http';
import type { ApiErrorBody } from '@causeway/shared';

/** Errors raised by Express middleware carry their HTTP status. */
interface BodyParserError {
  status?: number;
  statusCode?: number;
  message?: string;
}

/**
 * One error body for every failure: `{ statusCode, error, message, errors?, details? }`.
 * Middleware errors that carry a 4xx status keep it; anything unexpected is logged and answered with a plain 500 that leaks nothing.
 */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Exceptions');

  catch(exception: unknown, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    if (res.headersSent) return;
    const body = this.toBody(exception);
    res.status(body.statusCode).json(body);
  }

  private toBody(exception: unknown): ApiErrorBody {
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      const response = exception.getResponse();
      const base: ApiErrorBody = { statusCode: status, error: STATUS_CODES[status] ?? 'Error', message: exception.message };
      if (typeof response === 'string') return { ...base, message: response };
      const r = response as Partial<ApiErrorBody> & { message?: string | string[] };
      const message = Array.isArray(r.message) ? r.message.join('; ') : (r.message ?? base.message);
      return { ...base, ...r, statusCode: status, message } as ApiErrorBody;
    }
    const bp = exception as BodyParserError;
    const status = bp?.status ?? bp?.statusCode;
    if (typeof status === 'number' && status >= 400 && status < 500) {
      return { statusCode: status, error: STATUS_CODES[status] ?? 'Error', message: bp.message ?? 'Bad request' };
    }
    this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    return { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, error: 'Internal Server Error', message: 'Something went wrong on the server; nothing was changed' };
  }
}
