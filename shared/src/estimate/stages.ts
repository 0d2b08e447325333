import type { CautionDto } from '../api/codes';
import type { EstimateStageDto, EstimateTotals, TaxedMoney } from '../api/jobs';
import type { FixPathDto } from '../api/knowledge';
import { applyTaxMinor } from '../money/index';

export interface CodeFixPath {
  code: string;
  title: string | null;
  fixPath: FixPathDto;
}

/** A non-negative planner cost (minor units, possibly fractional for an expectation) as whole minor units, half up. */
export function toMinor(cost: number): number {
  return Math.floor(cost + 0.5);
}

function sumTaxed(items: TaxedMoney[]): TaxedMoney {
  return items.reduce((s, x) => ({ net: s.net + x.net, tax: s.tax + x.tax, gross: s.gross + x.gross }), { net: 0, tax: 0, gross: 0 });
}

/** Ends a phrase with a full stop unless it already has closing punctuation. */
function sentence(s: string): string {
  const t = s.trim();
  return /[.!?]$/.test(t) ? t : `${t}.`;
}

function names(keys: string[], label: Map<string, string>): string {
  const list = keys.map((k) => label.get(k) ?? k);
  return list.length <= 1 ? (list[0] ?? '') : `${list.slice(0, -1).join(', ')} and ${list[list.length - 1]}`;
}

/**
 * The stages of a staged estimate from the current fix path of each code: each priced net, with
 * tax and gross at the shop's rate (integer minor units, tax per stage), its chance of fixing the
 * fault, the cumulative chance, what happens if it does not, and its safety cautions. The server
 * saves exactly this and the client previews it, so the owner gets what was previewed.
 */
export function buildStages(paths: CodeFixPath[], taxRateBp: number): { stages: EstimateStageDto[]; totals: EstimateTotals } {
  const stages: EstimateStageDto[] = [];
  let expectedNet = 0;
  for (const { code, fixPath: fp } of paths) {
    const label = new Map(fp.causes.map((c) => [c.key, c.label]));
    const teardownName = new Map(fp.teardowns.map((t) => [t.key, t.name]));
    const cautionByKey = new Map<string, CautionDto>(fp.cautions.map((c) => [c.key, c]));
    const causeOf = new Map(fp.input.causes.map((c) => [c.key, c]));
    const info = new Map(fp.causes.map((c) => [c.key, c]));
    const planStages = fp.plan.stages;
    const titles = planStages.map((s) =>
      s.kind === 'replace'
        ? `Replace ${names(s.causes, label)}`
        : s.kind === 'check'
          ? s.causes.length === 1
            ? `Check ${names(s.causes, label)}; replace it if at fault`
            : `Check ${names(s.causes, label)} in turn; replace the one at fault`
          : 'Further diagnosis by a specialist',
    );
    expectedNet += toMinor(fp.plan.expectedCost);
    planStages.forEach((s, k) => {
      const opens = s.teardowns.map((t) => teardownName.get(t) ?? t);
      let description: string;
      let upTo: TaxedMoney | null = null;
      if (s.kind === 'escalate') {
        description = fp.escalation?.description ?? 'The job is handed over for further diagnosis.';
      } else {
        const opening = opens.length ? `Takes apart: ${opens.join('; ')}. ` : '';
        const checks =
          s.kind === 'check'
            ? s.causes.map((c) => sentence(`${label.get(c) ?? c}: ${info.get(c)?.check?.description ?? 'checked'}`)).join(' ') + ' '
            : '';
        description = `${opening}${checks}Then the verification: clear the code, drive and confirm it stays away${fp.verification.monitor ? ` (${fp.verification.monitor})` : ''}.`;
        if (s.kind === 'check') {
          const open = s.teardowns.reduce((t, g) => t + (fp.input.teardowns[g] ?? 0), 0);
          const allChecks = s.causes.reduce((t, c) => t + (causeOf.get(c)?.checkCost ?? 0), 0);
          const dearest = Math.max(0, ...s.causes.map((c) => causeOf.get(c)?.replaceCost ?? 0));
          upTo = applyTaxMinor(toMinor(open + allChecks + dearest + fp.input.verificationCost), taxRateBp);
        }
      }
      const next = k + 1 < planStages.length ? planStages[k + 1] : null;
      let ifNotFixed: string;
      if (next === null) {
        ifNotFixed =
          s.kind === 'escalate'
            ? 'This is the last stage: the specialist’s findings decide what comes next, and we will ask you before any further work.'
            : 'No further stage is planned: the fault would then be a cause not listed, and we will contact you before any further work.';
      } else {
        ifNotFixed = `Next: stage ${stages.length + 2} — ${titles[k + 1]}.`;
      }
      const keys = s.kind === 'escalate' ? [...cautionByKey.keys()] : [...new Set(s.causes.flatMap((c) => info.get(c)?.cautions ?? []))];
      stages.push({
        index: stages.length,
        code,
        kind: s.kind,
        title: titles[k],
        description,
        parts: s.causes.map((c) => ({ key: c, label: label.get(c) ?? c })),
        price: applyTaxMinor(toMinor(s.cost), taxRateBp),
        priceUpTo: upTo,
        fixProbability: s.fixProbability,
        fixProbabilityIfReached: s.reachProbability > 0 ? s.fixProbability / s.reachProbability : 0,
        cumulativeFixProbability: s.cumulativeFixProbability,
        ifNotFixed,
        cautions: keys.flatMap((key) => {
          const c = cautionByKey.get(key);
          return c ? [c] : [];
        }),
      });
    });
  }
  return { stages, totals: { expected: applyTaxMinor(expectedNet, taxRateBp), allStages: sumTaxed(stages.map((s) => s.price)) } };
}
