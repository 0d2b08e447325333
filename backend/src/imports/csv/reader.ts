import { parse, type Parser } from 'csv-parse';
import { Readable } from 'node:stream';
import type { ImportDetected } from '@causeway/shared';
import { FileProblem } from './detect';

export interface CsvRecord {
  /** 1-based line where the record starts. */
  line: number;
  cells: string[];
}

export interface CsvBatch {
  records: CsvRecord[];
  /** Bytes of the file handed to the parser so far (progress). */
  bytes: number;
}

const CHUNK_BYTES = 256 * 1024;
const BATCH = 1000;
/** Longest record accepted; beyond it the file is not a scan export (or a quote was never closed). */
const MAX_RECORD_CHARS = 1_000_000;

function countBreaks(cell: string, br: string): number {
  let n = 0;
  for (let p = cell.indexOf(br); p !== -1; p = cell.indexOf(br, p + 1)) n += 1;
  return n;
}

/**
 * The line where a quoted field opens that is never closed, found by scanning the bytes as RFC 4180
 * quotes them (a quote opens a field only at its start; "" inside is a quote); null when none is.
 */
export function unclosedQuoteLine(buf: Buffer, offset: number, delimiter: string, lineEnding: ImportDetected['lineEnding']): number | null {
  const QUOTE = 0x22;
  const br = lineEnding === 'cr' ? 0x0d : 0x0a;
  const delim = delimiter.charCodeAt(0);
  let line = 1;
  let fieldStart = true;
  let inQuote = false;
  let quoteLine = 0;
  for (let i = offset; i < buf.length; i++) {
    const b = buf[i];
    if (inQuote) {
      if (b === QUOTE) {
        if (buf[i + 1] === QUOTE) i += 1;
        else inQuote = false;
      } else if (b === br) {
        line += 1;
      }
    } else if (b === QUOTE && fieldStart) {
      inQuote = true;
      quoteLine = line;
    } else if (b === br) {
      line += 1;
      fieldStart = true;
    } else if (b === delim) {
      fieldStart = true;
    } else if (b !== 0x0d) {
      fieldStart = false;
    }
  }
  return inQuote ? quoteLine : null;
}

/**
 * Streams the records of an uploaded file through csv-parse, chunk by chunk from the buffer (the
 * file is never decoded into one string), in batches. Line numbers: each record takes one line
 * plus the line breaks inside its quoted fields, so a record keeps the number of the line where
 * it starts. Blank lines come through as records of one empty cell (and count as lines).
 */
export async function* readRecords(buf: Buffer, offset: number, delimiter: string, lineEnding: ImportDetected['lineEnding']): AsyncGenerator<CsvBatch> {
  const parser: Parser = parse({
    delimiter,
    bom: false,
    relax_column_count: true,
    relax_quotes: true,
    skip_empty_lines: false,
    max_record_size: MAX_RECORD_CHARS,
  });
  let fed = offset;
  function* chunks(): Generator<Buffer> {
    for (let i = offset; i < buf.length; i += CHUNK_BYTES) {
      const end = Math.min(i + CHUNK_BYTES, buf.length);
      fed = end;
      yield buf.subarray(i, end);
    }
  }
  const source = Readable.from(chunks(), { objectMode: false });
  source.pipe(parser);
  const br = lineEnding === 'cr' ? '\r' : '\n';
  let line = 1;
  let batch: CsvRecord[] = [];
  try {
    for await (const cells of parser as AsyncIterable<string[]>) {
      batch.push({ line, cells });
      line += 1;
      for (const cell of cells) if (cell.length > 1) line += countBreaks(cell, br);
      if (batch.length >= BATCH) {
        yield { records: batch, bytes: fed };
        batch = [];
      }
    }
    if (batch.length) yield { records: batch, bytes: fed };
  } catch (err) {
    if (err instanceof FileProblem) throw err;
    const e = err as { code?: string; message?: string };
    // Records parsed before the error may not have reached this loop: find the quote's line in the bytes.
    if (e.code === 'CSV_QUOTE_NOT_CLOSED' || e.code === 'CSV_MAX_RECORD_SIZE') line = unclosedQuoteLine(buf, offset, delimiter, lineEnding) ?? line;
    const why =
      e.code === 'CSV_QUOTE_NOT_CLOSED'
        ? 'a quoted field opened here is never closed'
        : e.code === 'CSV_MAX_RECORD_SIZE'
          ? `a record here is longer than ${MAX_RECORD_CHARS.toLocaleString('en-GB')} characters (a quote that is never closed?)`
          : `is not readable CSV here (${(e.message ?? 'parse error').slice(0, 120)})`;
    throw new FileProblem(`line ${line}: ${why}`);
  } finally {
    source.destroy();
    parser.destroy();
  }
}
