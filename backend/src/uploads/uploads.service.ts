import { BadRequestException, Injectable, Logger } from '@nestjs/common';
import { fromBuffer } from 'file-type';
import sharp from 'sharp';
import { ATTACHMENT_LIMITS, type AttachmentContentType, type FieldError } from '@causeway/shared';
import { scanPdf } from './pdf-scan';
import { StorageService } from './storage.service';

/** What multer hands over (memory storage). */
export interface IncomingFile {
  originalname: string;
  buffer: Buffer;
  size: number;
}

/** A file that passed every check, ready to store. */
export interface CheckedFile {
  name: string;
  contentType: AttachmentContentType;
  data: Buffer;
  width: number | null;
  height: number | null;
}

export interface StoredFile extends CheckedFile {
  storageKey: string;
}

const EXTENSION: Record<AttachmentContentType, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'application/pdf': 'pdf',
};

/** Refuse images above this many pixels before decoding them (decompression bombs). */
const MAX_INPUT_PIXELS = 50_000_000;

const ACCEPTED = 'JPEG, PNG or WebP photos and PDF invoices';

/**
 * A name that says where to write the file (`../../etc/passwd.jpg`, `C:\x.jpg`) or hides
 * characters is refused outright: it is never used on disk, but it is a clear sign of abuse.
 */
function nameProblem(raw: string): string | null {
  if (raw.length === 0) return null;
  if (/[/\\]/.test(raw) || raw.split(/[/\\]/).includes('..')) return 'the file name must not contain a path (/, \\ or ..)';
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\u007f]/.test(raw)) return 'the file name must not contain control characters';
  if (raw.length > 255) return 'the file name must be at most 255 characters';
  return null;
}

/** The name kept as metadata: letters, digits, dot, dash, underscore and space, with the extension of the real type. */
export function sanitiseName(raw: string, type: AttachmentContentType): string {
  let base = raw.normalize('NFKD').replace(/[^\w.\- ]+/g, '_');
  base = base.replace(/\.[^.]*$/, '').replace(/^[.\s_-]+/, '').replace(/[\s_]+$/, '').slice(0, 100);
  return `${base || 'file'}.${EXTENSION[type]}`;
}

/**
 * Checks uploads and turns them into what is stored: the type is decided by the content
 * (file-type's magic numbers), photos are decoded and re-encoded with sharp, which writes no
 * EXIF (so no GPS position, camera serial or time) unless asked, and PDFs with active
 * content are refused. All files of a request pass or none is stored.
 */
@Injectable()
export class UploadsService {
  private readonly logger = new Logger(UploadsService.name);

  constructor(private readonly storage: StorageService) {}

  async check(files: IncomingFile[], field = 'files'): Promise<CheckedFile[]> {
    const errors: FieldError[] = [];
    const out: CheckedFile[] = [];
    for (const [i, f] of files.entries()) {
      const where = `${field}.${i}`;
      const label = JSON.stringify(f.originalname.slice(0, 80));
      const problem = nameProblem(f.originalname);
      if (problem) {
        errors.push({ field: where, message: `${label}: ${problem}` });
        continue;
      }
      if (f.size === 0 || f.buffer.length === 0) {
        errors.push({ field: where, message: `${label}: is empty` });
        continue;
      }
      const detected = await fromBuffer(f.buffer);
      const type = detected?.mime as string | undefined;
      if (!type || !(ATTACHMENT_LIMITS.contentTypes as readonly string[]).includes(type)) {
        errors.push({ field: where, message: `${label}: its content is ${type ? `${type}` : 'not a recognised file type'}, whatever its name says; accepted are ${ACCEPTED}` });
        continue;
      }
      const contentType = type as AttachmentContentType;
      try {
        out.push(contentType === 'application/pdf' ? this.checkPdf(f, label) : await this.reencode(f, contentType));
      } catch (err) {
        if (err instanceof UploadRejected) errors.push({ field: where, message: err.message });
        else throw err;
      }
    }
    if (errors.length) {
      throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: `Nothing was uploaded. ${errors.map((e) => `${e.field}: ${e.message}`).join('; ')}`, errors });
    }
    return out;
  }

  /** Writes checked files under new random keys; if one write fails, the others are removed. */
  async store(files: CheckedFile[]): Promise<StoredFile[]> {
    const stored: StoredFile[] = [];
    try {
      for (const f of files) {
        const storageKey = this.storage.newKey();
        await this.storage.put(storageKey, f.data);
        stored.push({ ...f, storageKey });
      }
    } catch (err) {
      await this.remove(stored.map((s) => s.storageKey));
      throw err;
    }
    return stored;
  }

  async remove(keys: string[]): Promise<void> {
    for (const key of keys) {
      try {
        await this.storage.delete(key);
      } catch (err) {
        this.logger.error(`Could not remove stored file ${key}: ${(err as Error).message}`);
      }
    }
  }

  read(key: string): Promise<Buffer | null> {
    return this.storage.get(key);
  }

  private checkPdf(f: IncomingFile, label: string): CheckedFile {
    const scan = scanPdf(f.buffer);
    if (scan.found.length) {
      throw new UploadRejected(`${label}: the PDF contains active content (${scan.found.join(', ')}); only plain PDF invoices are accepted`);
    }
    if (scan.incomplete) throw new UploadRejected(`${label}: the PDF's compressed content is too large to check`);
    return { name: sanitiseName(f.originalname, 'application/pdf'), contentType: 'application/pdf', data: f.buffer, width: null, height: null };
  }

  private async reencode(f: IncomingFile, type: AttachmentContentType): Promise<CheckedFile> {
    const label = JSON.stringify(f.originalname.slice(0, 80));
    try {
      // rotate() applies the EXIF orientation to the pixels before the metadata is dropped.
      const img = sharp(f.buffer, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' }).rotate();
      const encoded =
        type === 'image/jpeg' ? img.jpeg({ quality: 88, mozjpeg: true }) : type === 'image/png' ? img.png({ compressionLevel: 9 }) : img.webp({ quality: 85 });
      const { data, info } = await encoded.toBuffer({ resolveWithObject: true });
      return { name: sanitiseName(f.originalname, type), contentType: type, data, width: info.width, height: info.height };
    } catch (err) {
      throw new UploadRejected(`${label}: the image could not be read (${(err as Error).message.split('\n')[0].slice(0, 120)})`);
    }
  }
}

class UploadRejected extends Error {}
