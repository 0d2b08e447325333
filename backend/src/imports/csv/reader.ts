import { parse, type Parser } from 'csv-parse';
import { Readable } from 'node:stream';
import type { ImportDetected } from '@causeway/shared';
import { FileProblem } from './detect';

export interface CsvRecord {
  /** 1-based line where the record starts. */
  line: number;
  cells: string[];
  /** Bytes of the file read so far. */
  bytes: number;
}

const CHUNK_BYTES = 256 * 1024;
/** Longest record accepted; beyond it the file is not a scan export (or a quote was never closed). */
const MAX_RECORD_CHARS = 1_000_000;

function* chunks(buf: Buffer, offset: number): Generator<Buffer> {
  for (let i = offset; i < buf.length; i += CHUNK_BYTES) yield buf.subarray(i, Math.min(i + CHUNK_BYTES, buf.length));
}

/**
 * Streams the records of an uploaded file through csv-parse, chunk by chunk from the buffer
 * (the file is never decoded into one string). Line numbers are counted from the bytes consumed,
 * so a quoted field with embedded newlines keeps the number of the line where its record starts.
 */
export async function* readRecords(buf: Buffer, offset: number, delimiter: string, lineEnding: ImportDetected['lineEnding']): AsyncGenerator<CsvRecord> {
  const parser: Parser = parse({
    delimiter,
    bom: false,
    info: true,
    relax_column_count: true,
    relax_quotes: true,
    skip_empty_lines: false,
    max_record_size: MAX_RECORD_CHARS,
  });
  const source = Readable.from(chunks(buf, offset), { objectMode: false });
  source.pipe(parser);
  const breakByte = lineEnding === 'cr' ? 0x0d : 0x0a;
  let line = 1;
  let consumed = 0;
  try {
    for await (const out of parser as AsyncIterable<{ record: string[]; info: { bytes: number } }>) {
      const start = line;
      const end = offset + out.info.bytes;
      for (let p = buf.indexOf(breakByte, offset + consumed); p !== -1 && p < end; p = buf.indexOf(breakByte, p + 1)) line += 1;
      consumed = out.info.bytes;
      yield { line: start, cells: out.record, bytes: end };
    }
  } catch (err) {
    if (err instanceof FileProblem) throw err;
    const e = err as { code?: string; message?: string };
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
