import type { EstimateAnswerDto, EstimateDto, EstimateSummaryDto } from '@causeway/shared';
import type { EstimateAnswer } from './entities/estimate-answer.entity';
import type { Estimate } from './entities/estimate.entity';

/** How every amount of a staged estimate is rounded; shown on the estimate. */
export const ESTIMATE_ROUNDING =
  "Each stage's net price is the fix path's cost rounded half up to a whole minor unit (penny, cent). " +
  'Tax is worked out per stage: net × tax rate, rounded half away from zero to a whole minor unit; gross = net + tax. ' +
  'The total for every stage is the sum of the stage lines, so it adds up exactly as shown. ' +
  "The expected total is each code's fix-path expected cost rounded half up to a minor unit, summed, with tax worked out on that sum the same way.";

export const ESTIMATE_NOTE =
  'A staged estimate: each stage is done only if the ones before it did not fix the fault. ' +
  'The chances come from recorded repairs of this fault and are estimates, not promises. ' +
  "All work follows the vehicle maker's procedure, local regulations and licensed practice.";

export function toAnswerDto(a: EstimateAnswer): EstimateAnswerDto {
  return { stageIndex: a.stageIndex, decision: a.decision, name: a.name, answeredAt: new Date(a.answeredAt).toISOString() };
}

export function sortedAnswers(answers: EstimateAnswer[] | undefined): EstimateAnswerDto[] {
  return (answers ?? []).map(toAnswerDto).sort((a, b) => a.answeredAt.localeCompare(b.answeredAt));
}

/** The latest answer per stage, null where none came. */
export function decisionsOf(stageCount: number, answers: EstimateAnswerDto[]): Array<EstimateAnswerDto | null> {
  const out: Array<EstimateAnswerDto | null> = Array.from({ length: stageCount }, () => null);
  for (const a of answers) if (a.stageIndex >= 0 && a.stageIndex < stageCount) out[a.stageIndex] = a;
  return out;
}

export function toEstimateSummary(e: Estimate, now: Date = new Date()): EstimateSummaryDto {
  const expiresAt = new Date(e.expiresAt);
  return {
    id: e.id,
    createdAt: new Date(e.createdAt).toISOString(),
    expiresAt: expiresAt.toISOString(),
    expired: expiresAt.getTime() <= now.getTime(),
    recipientEmail: e.recipientEmail,
    emailedAt: e.emailedAt ? new Date(e.emailedAt).toISOString() : null,
    emailError: e.emailError,
    stageCount: e.stages.length,
    totals: e.totals,
    answers: sortedAnswers(e.answers),
  };
}

export function toEstimateDto(e: Estimate, now: Date = new Date()): EstimateDto {
  return {
    ...toEstimateSummary(e, now),
    jobId: e.jobId,
    currency: e.currency,
    locale: e.locale,
    taxRateBp: e.taxRateBp,
    stages: e.stages,
    rounding: ESTIMATE_ROUNDING,
    note: ESTIMATE_NOTE,
  };
}
