import { constants as zlibConstants, inflateSync } from 'node:zlib';

/**
 * PDF name tokens that make a document do something when opened or clicked: scripts, launching
 * programs, embedded files, rich media, XML forms and form submission (ISO 32000-1 §12.6 actions,
 * §7.11.4 embedded file streams; list from common practice in PDF sanitisers). An invoice needs
 * none of them.
 */
const ACTIVE_NAMES = ['JavaScript', 'JS', 'Launch', 'EmbeddedFile', 'EmbeddedFiles', 'RichMedia', 'XFA', 'SubmitForm', 'ImportData', 'GoToE'];
const ACTIVE = new RegExp(`/(${ACTIVE_NAMES.join('|')})(?=[\\s()<>\\[\\]{}/%]|$)`, 'g');

/** Most bytes all the decompressed streams of one PDF may add up to before we give up checking. */
const MAX_INFLATED = 64 * 1024 * 1024;

export interface PdfScan {
  /** Active-content names found, e.g. ['/JavaScript', '/JS']. */
  found: string[];
  /** True when the file could not be checked completely (then it must be refused). */
  incomplete: boolean;
}

/** Names may spell characters as #xx (ISO 32000-1 §7.3.5): `/J#61vaScript` is `/JavaScript`. */
function decodeNameEscapes(text: string): string {
  return text.replace(/#([0-9A-Fa-f]{2})/g, (_m, hex: string) => String.fromCharCode(parseInt(hex, 16)));
}

function scanText(text: string, found: Set<string>): void {
  for (const m of decodeNameEscapes(text).matchAll(ACTIVE)) found.add(`/${m[1]}`);
}

/**
 * Looks for active content in a PDF: in the file as stored and inside every Flate-compressed
 * stream, since object streams (PDF 1.5) can hide a /JS dictionary in compressed form.
 */
export function scanPdf(buf: Buffer): PdfScan {
  const found = new Set<string>();
  const text = buf.toString('latin1');
  scanText(text, found);
  let inflated = 0;
  let incomplete = false;
  const streamStart = /stream\r?\n/g;
  let m: RegExpExecArray | null;
  while ((m = streamStart.exec(text)) !== null) {
    const start = m.index + m[0].length;
    const end = text.indexOf('endstream', start);
    if (end < 0) break;
    streamStart.lastIndex = end + 9;
    const raw = buf.subarray(start, end);
    let out: Buffer;
    try {
      out = inflateSync(raw, { maxOutputLength: MAX_INFLATED - inflated, finishFlush: zlibConstants.Z_SYNC_FLUSH });
    } catch (err) {
      // Not Flate data (images, other filters) is fine; running out of budget is not.
      if ((err as NodeJS.ErrnoException).code === 'ERR_BUFFER_TOO_LARGE') {
        incomplete = true;
        break;
      }
      continue;
    }
    inflated += out.length;
    scanText(out.toString('latin1'), found);
  }
  return { found: [...found], incomplete };
}
