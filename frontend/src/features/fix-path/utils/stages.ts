import type { FixPathDto, PlanStage, StageKind } from '@causeway/shared';

export const STAGE_KIND_LABELS: Record<StageKind, string> = {
  replace: 'Replace',
  check: 'Check',
  escalate: 'Escalate',
};

/** Names for the keys a plan speaks in. */
export interface PlanNames {
  cause: (key: string) => string;
  teardown: (key: string) => string;
}

export function planNames(dto: FixPathDto): PlanNames {
  const causes = new Map(dto.causes.map((c) => [c.key, c.label]));
  const teardowns = new Map(dto.teardowns.map((t) => [t.key, t.name]));
  return {
    cause: (key) => causes.get(key) ?? key,
    teardown: (key) => teardowns.get(key) ?? key,
  };
}

/** The caution keys of a stage: those of the causes it works on (their teardown's, system's and code's). */
export function stageCautionKeys(dto: FixPathDto, stage: PlanStage): string[] {
  const byCause = new Map(dto.causes.map((c) => [c.key, c.cautions]));
  const keys = new Set<string>();
  for (const cause of stage.causes) for (const key of byCause.get(cause) ?? []) keys.add(key);
  for (const teardown of stage.teardowns) for (const key of dto.teardowns.find((t) => t.key === teardown)?.cautions ?? []) keys.add(key);
  return [...keys];
}

/** "1", "1 and 2", "1, 2 and 4". */
export function listNumbers(numbers: number[]): string {
  if (numbers.length <= 1) return numbers.join('');
  return `${numbers.slice(0, -1).join(', ')} and ${numbers[numbers.length - 1]}`;
}
