import type { JobCodeState, StepKind, StepResult } from '@causeway/shared';

export interface StepFact {
  code: string;
  kind: StepKind;
  parts: string[];
  result: StepResult;
}

export interface CodeProgress {
  /** Ruled out in this job: checked not at fault, or replaced and the code came back. */
  excluded: string[];
  /** A check found this part at fault and it has not been replaced since. */
  found: string | null;
  /** The parts of the replacement that cleared the code (the last step said so). */
  clearedBy: string[];
  state: Exclude<JobCodeState, 'exhausted'>;
}

/**
 * What a code's steps, in order, say about its possible causes (in-job conditioning,
 * product.md §2): a part checked good or replaced without the code going away is excluded;
 * a check that finds a part at fault narrows the path to replacing it; a replacement that
 * clears the code ends the search until a later step says otherwise.
 */
export function codeProgress(code: string, steps: StepFact[]): CodeProgress {
  const excluded = new Set<string>();
  let found: string | null = null;
  let clearedBy: string[] = [];
  for (const step of steps) {
    if (step.code !== code) continue;
    if (step.kind === 'check') {
      const part = step.parts[0];
      if (step.result === 'at-fault') {
        found = part;
        excluded.delete(part);
      } else {
        excluded.add(part);
        if (found === part) found = null;
      }
      clearedBy = [];
    } else if (step.result === 'cleared') {
      clearedBy = [...step.parts];
      found = null;
    } else {
      for (const p of step.parts) excluded.add(p);
      if (found !== null && step.parts.includes(found)) found = null;
      clearedBy = [];
    }
  }
  const state = clearedBy.length > 0 ? 'cleared' : found !== null ? 'cause-found' : 'open';
  return { excluded: [...excluded], found, clearedBy, state };
}
