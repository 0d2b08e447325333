import type { CautionDto, FixPathDto, PlanStage } from '@causeway/shared';

/** A planner cost (minor units, possibly fractional for an expectation) as whole minor units, half up. */
export function toMinor(cost: number): number {
  return Math.floor(cost + 0.5);
}

export function causeLabel(fixPath: FixPathDto, key: string): string {
  return fixPath.causes.find((c) => c.key === key)?.label ?? key;
}

export function listNames(names: string[]): string {
  if (names.length <= 1) return names[0] ?? '';
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/** The safety cautions a stage touches: its causes' and its teardowns'; escalation carries the code's. */
export function stageCautions(fixPath: FixPathDto, stage: PlanStage): CautionDto[] {
  const keys = new Set<string>();
  if (stage.kind === 'escalate') {
    for (const c of fixPath.cautions) keys.add(c.key);
  } else {
    for (const key of stage.causes) for (const k of fixPath.causes.find((c) => c.key === key)?.cautions ?? []) keys.add(k);
    for (const t of stage.teardowns) for (const k of fixPath.teardowns.find((x) => x.key === t)?.cautions ?? []) keys.add(k);
  }
  return fixPath.cautions.filter((c) => keys.has(c.key));
}

export function stageTitle(fixPath: FixPathDto, stage: PlanStage): string {
  const names = listNames(stage.causes.map((k) => causeLabel(fixPath, k)));
  if (stage.kind === 'replace') return `Replace ${names}`;
  if (stage.kind === 'check') return stage.causes.length === 1 ? `Check ${names}` : `Check ${names} in turn`;
  return 'Further diagnosis by a specialist';
}

/**
 * Suggested actual cost of a step before tax, from the plan's figures: a check costs its check
 * (and the teardown opening); a replacement the parts, labour, openings and the verification.
 */
export function plannedStepCostMinor(fixPath: FixPathDto | null, kind: 'check' | 'replace', parts: string[]): number | null {
  if (!fixPath || parts.length === 0) return null;
  const causes = parts.map((k) => fixPath.causes.find((c) => c.key === k));
  if (causes.some((c) => c === undefined)) return null;
  const teardowns = new Set(causes.flatMap((c) => (c?.teardown ? [c.teardown] : [])));
  const opening = [...teardowns].reduce((sum, key) => sum + (fixPath.teardowns.find((t) => t.key === key)?.openCostMinor ?? 0), 0);
  if (kind === 'check') {
    const check = causes[0]?.check;
    return check ? check.costMinor + opening : null;
  }
  return causes.reduce((sum, c) => sum + (c?.replaceCostMinor ?? 0), 0) + opening + fixPath.verification.costMinor;
}

/** Shares of credit if parts replaced together clear the code: by their current likelihoods. */
export function creditShares(fixPath: FixPathDto | null, parts: string[]): Array<{ key: string; label: string; share: number }> | null {
  if (!fixPath || parts.length < 2) return null;
  const causes = parts.map((k) => fixPath.causes.find((c) => c.key === k));
  if (causes.some((c) => c === undefined)) return null;
  const total = causes.reduce((s, c) => s + (c?.probability ?? 0), 0);
  if (total <= 0) return null;
  return causes.map((c) => ({ key: c!.key, label: c!.label, share: c!.probability / total }));
}

export const DEFER_PREFIX = "Follow the vehicle maker's procedure";

/** A caution's points without the closing sentence, which the caution component always adds itself. */
export function cautionPoints(caution: CautionDto): string[] {
  return caution.points.filter((p) => !p.startsWith(DEFER_PREFIX));
}
