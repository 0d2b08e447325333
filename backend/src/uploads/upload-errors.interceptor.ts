import { BadRequestException, HttpException, Injectable, PayloadTooLargeException, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import { catchError, throwError, type Observable } from 'rxjs';
import { ATTACHMENT_LIMITS } from '@causeway/shared';

const MB = ATTACHMENT_LIMITS.maxBytes / (1024 * 1024);

/**
 * Puts multer's terse limit errors ("File too large", "Too many files") into the one error
 * body, naming the field and the limit. Bind it before the files interceptor so it sees them.
 */
@Injectable()
export class UploadErrorsInterceptor implements NestInterceptor {
  private readonly field = 'files';

  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next.handle().pipe(catchError((err: unknown) => throwError(() => this.translate(err))));
  }

  private translate(err: unknown): unknown {
    if (!(err instanceof HttpException)) return err;
    const body = err.getResponse();
    if (typeof body === 'object' && body !== null && 'errors' in body) return err; // already ours
    const message = err.message;
    const field = this.field;
    if (err instanceof PayloadTooLargeException) {
      const text = `each file must be at most ${MB} MB; nothing was uploaded`;
      return new PayloadTooLargeException({ statusCode: 413, error: 'Payload Too Large', message: `${field}: ${text}`, errors: [{ field, message: text }] });
    }
    if (err instanceof BadRequestException) {
      let text: string | null = null;
      if (/too many files/i.test(message)) text = `at most ${ATTACHMENT_LIMITS.maxFiles} files per report; nothing was uploaded`;
      else if (/unexpected (file )?field/i.test(message)) text = `files must be sent in the multipart field "${field}"`;
      else if (/too many parts|too many fields|field value too long|field name too long/i.test(message)) text = 'the form has too many or too large parts';
      else if (/multipart|boundary/i.test(message)) text = `must be a multipart/form-data upload (${message})`;
      if (text) return new BadRequestException({ statusCode: 400, error: 'Bad Request', message: `${field}: ${text}`, errors: [{ field, message: text }] });
    }
    return err;
  }
}
