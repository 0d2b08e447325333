import { parseDtc, type DtcParseError, type DtcStructure } from '@causeway/shared';
import { isApiError } from '@/lib/api-client';

export type CodeLookupProblem =
  | { kind: 'invalid'; reason: DtcParseError }
  | { kind: 'not-in-catalogue'; structure: DtcStructure; message: string }
  | { kind: 'failed'; message: string };

function isStructure(x: unknown): x is DtcStructure {
  return typeof x === 'object' && x !== null && typeof (x as DtcStructure).code === 'string' && typeof (x as DtcStructure).bytes === 'string';
}

function isParseError(x: unknown): x is DtcParseError {
  return typeof x === 'object' && x !== null && typeof (x as DtcParseError).message === 'string' && 'position' in x;
}

/**
 * Why a code page has no entry to show. The server's answer is preferred; where it lacks the
 * details, the code is decoded here with the same codec, so the page can still explain it.
 */
export function codeLookupProblem(code: string, error: unknown): CodeLookupProblem {
  const parsed = parseDtc(code);
  if (isApiError(error) && error.status === 400) {
    const details = error.body.details;
    if (isParseError(details)) return { kind: 'invalid', reason: details };
    if (!parsed.ok) return { kind: 'invalid', reason: parsed.error };
  }
  if (isApiError(error) && error.status === 404) {
    const details = error.body.details as { structure?: unknown } | undefined;
    const structure = isStructure(details?.structure) ? details.structure : parsed.ok ? parsed.value : null;
    if (structure) return { kind: 'not-in-catalogue', structure, message: error.message };
  }
  if (!parsed.ok) return { kind: 'invalid', reason: parsed.error };
  return { kind: 'failed', message: error instanceof Error ? error.message : 'The code could not be loaded.' };
}
