import { parseDtc, type CodeStatus, type FreezeFrame, type JobCodeInput } from '@causeway/shared';

export interface FreezeFrameRow {
  name?: string;
  value?: string;
}

/** One code as the new-job form holds it. */
export interface CodeRow {
  code?: string;
  status?: CodeStatus;
  freezeFrame?: FreezeFrameRow[];
}

const NUMBER = /^-?\d+(?:\.\d+)?$/;

/** Freeze-frame rows to the name → value object the server keeps; numbers stay numbers. */
export function toFreezeFrame(rows: FreezeFrameRow[] | undefined): FreezeFrame | undefined {
  const frame: FreezeFrame = {};
  for (const row of rows ?? []) {
    const name = row.name?.trim();
    const value = row.value?.trim();
    if (!name || value === undefined || value === '') continue;
    frame[name] = NUMBER.test(value) ? Number(value) : value;
  }
  return Object.keys(frame).length ? frame : undefined;
}

/** A code row as sent: the code in its normal form (the user has seen every correction). */
export function toJobCodeInput(row: CodeRow): JobCodeInput {
  const raw = row.code?.trim() ?? '';
  const parsed = parseDtc(raw);
  const freezeFrame = toFreezeFrame(row.freezeFrame);
  return {
    code: parsed.ok ? parsed.value.display : raw,
    status: row.status ?? 'stored',
    ...(freezeFrame ? { freezeFrame } : {}),
  };
}
