import { isUtf8 } from 'node:buffer';
import type { ImportDetected } from '@causeway/shared';

/** A problem with the file as a whole: answered as a 400 naming `file`. */
export class FileProblem extends Error {
  constructor(
    message: string,
    readonly status: 400 | 413 = 400,
  ) {
    super(message);
  }
}

export interface TextShape {
  encoding: ImportDetected['encoding'];
  /** Bytes of the BOM to skip. */
  offset: number;
}

const SAMPLE_BYTES = 64 * 1024;

/** File signatures people upload by mistake, for a message that says what to do. */
const SIGNATURES: Array<{ bytes: number[]; what: string }> = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: 'a ZIP archive (an Excel or OpenDocument workbook is one); save the sheet as CSV' },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0], what: 'an old Excel/Office document; save the sheet as CSV' },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: 'a PDF document' },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: 'a PNG image' },
  { bytes: [0xff, 0xd8, 0xff], what: 'a JPEG image' },
  { bytes: [0x1f, 0x8b], what: 'a gzip archive; unpack it first' },
  { bytes: [0x53, 0x51, 0x4c, 0x69, 0x74, 0x65], what: 'an SQLite database' },
];

function startsWith(buf: Buffer, bytes: number[]): boolean {
  return buf.length >= bytes.length && bytes.every((b, i) => buf[i] === b);
}

/**
 * Checks that the upload is UTF-8 text (with or without a byte-order mark) without decoding it
 * whole. Throws FileProblem with what the file seems to be otherwise.
 */
export function checkText(buf: Buffer): TextShape {
  if (buf.length === 0) throw new FileProblem('is empty');
  if (startsWith(buf, [0xff, 0xfe]) || startsWith(buf, [0xfe, 0xff])) {
    throw new FileProblem('is UTF-16 text; save the export as CSV in UTF-8');
  }
  const known = SIGNATURES.find((s) => startsWith(buf, s.bytes));
  if (known) throw new FileProblem(`is ${known.what}, not a CSV text file`);
  const bom = startsWith(buf, [0xef, 0xbb, 0xbf]);
  const nul = buf.indexOf(0);
  if (nul !== -1) throw new FileProblem(`is not a text file (a zero byte at offset ${nul}); upload the scan tool's CSV export`);
  if (!isUtf8(buf)) {
    throw new FileProblem('is not UTF-8 text (another encoding such as Windows-1252, or binary data); save the export as CSV in UTF-8');
  }
  // Control characters other than tab, CR and LF do not occur in a CSV export.
  const sample = buf.subarray(0, SAMPLE_BYTES);
  for (let i = 0; i < sample.length; i++) {
    const b = sample[i];
    if ((b < 0x20 && b !== 0x09 && b !== 0x0a && b !== 0x0d) || b === 0x7f) {
      throw new FileProblem(`is not a text file (control byte 0x${b.toString(16).padStart(2, '0')} at offset ${i}); upload the scan tool's CSV export`);
    }
  }
  const offset = bom ? 3 : 0;
  if (buf.subarray(offset).every((b) => b === 0x20 || b === 0x09 || b === 0x0a || b === 0x0d)) throw new FileProblem('is empty');
  return { encoding: bom ? 'utf-8-bom' : 'utf-8', offset };
}

/** The beginning of the text, decoded (a character cut at the end is harmless here). */
export function sampleText(buf: Buffer, offset: number): string {
  return buf.subarray(offset, offset + SAMPLE_BYTES).toString('utf8');
}

/**
 * Separator and line ending from the first line (outside quotes): the candidate that occurs most
 * often in the header wins; a header with none of them is read with commas.
 */
export function detectLayout(sample: string): { delimiter: ImportDetected['delimiter']; lineEnding: ImportDetected['lineEnding'] } {
  const counts: Record<string, number> = { ',': 0, ';': 0, '\t': 0 };
  let lineEnding: ImportDetected['lineEnding'] = 'lf';
  let quoted = false;
  for (let i = 0; i < sample.length; i++) {
    const ch = sample[i];
    if (ch === '"') {
      quoted = !quoted;
    } else if (!quoted) {
      if (ch === '\r') {
        lineEnding = sample[i + 1] === '\n' ? 'crlf' : 'cr';
        break;
      }
      if (ch === '\n') {
        lineEnding = 'lf';
        break;
      }
      if (ch in counts) counts[ch] += 1;
    }
  }
  const best = (Object.entries(counts) as Array<[ImportDetected['delimiter'], number]>).reduce((a, b) => (b[1] > a[1] ? b : a));
  return { delimiter: best[1] > 0 ? best[0] : ',', lineEnding };
}
