import { IMPORT_LIMITS } from '@causeway/shared';

/** The limits of one import; IMPORT_MAX_BYTES and IMPORT_MAX_ROWS may lower (or raise) them. */
export function importLimits(env: NodeJS.ProcessEnv = process.env): { maxBytes: number; maxRows: number } {
  const num = (v: string | undefined, d: number) => (v && /^\d+$/.test(v) && Number(v) > 0 ? Number(v) : d);
  return { maxBytes: num(env.IMPORT_MAX_BYTES, IMPORT_LIMITS.maxBytes), maxRows: num(env.IMPORT_MAX_ROWS, IMPORT_LIMITS.maxRows) };
}
