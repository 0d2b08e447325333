import { BadRequestException, Injectable, PayloadTooLargeException, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import type { Request, Response } from 'express';
import multer from 'multer';
import type { Observable } from 'rxjs';
import { importLimits } from './import-limits';

function fieldError(field: string, message: string): BadRequestException {
  return new BadRequestException({ statusCode: 400, error: 'Bad Request', message: `${field}: ${message}`, errors: [{ field, message }] });
}

/**
 * Reads the multipart upload (one `file`, text fields `mapping` and `mappingName`) into memory
 * within the import limits, answering every multer failure as a 4xx naming the field.
 */
@Injectable()
export class ImportUploadInterceptor implements NestInterceptor {
  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    const http = context.switchToHttp();
    const req = http.getRequest<Request>();
    const res = http.getResponse<Response>();
    const { maxBytes } = importLimits();
    // File names without an explicit charset are read as UTF-8 (browsers send them so), not Latin-1.
    const upload = multer({ storage: multer.memoryStorage(), defParamCharset: 'utf8', limits: { fileSize: maxBytes, files: 1, fields: 4, fieldSize: 64 * 1024, parts: 6 } }).single('file');
    await new Promise<void>((resolve, reject) => {
      upload(req, res, (err: unknown) => {
        if (!err) return resolve();
        const e = err as { code?: string; field?: string; message?: string };
        const mb = +(maxBytes / (1024 * 1024)).toFixed(2);
        switch (e.code) {
          case 'LIMIT_FILE_SIZE':
            return reject(new PayloadTooLargeException({ statusCode: 413, error: 'Payload Too Large', message: `file: is larger than ${mb} MB, the limit for one import; split it into smaller files`, errors: [{ field: 'file', message: `is larger than ${mb} MB, the limit for one import` }] }));
          case 'LIMIT_UNEXPECTED_FILE':
            return reject(fieldError(e.field ?? 'file', e.field === 'file' ? 'only one file per import' : 'is not an accepted file field; send the CSV as "file"'));
          case 'LIMIT_FILE_COUNT':
            return reject(fieldError('file', 'only one file per import'));
          case 'LIMIT_FIELD_VALUE':
            return reject(fieldError(e.field ?? 'body', 'is longer than 64 KB'));
          case 'LIMIT_FIELD_COUNT':
          case 'LIMIT_PART_COUNT':
          case 'LIMIT_FIELD_KEY':
            return reject(fieldError('body', 'has too many parts; send file, and optionally mapping and mappingName'));
          default:
            return reject(fieldError('file', `the upload is not a readable multipart/form-data body (${(e.message ?? 'unknown error').slice(0, 80)})`));
        }
      });
    });
    return next.handle();
  }
}
