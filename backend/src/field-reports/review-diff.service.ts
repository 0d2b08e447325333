import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, type EntityManager, type EntityTarget, type ObjectLiteral } from 'typeorm';
import type {
  ConfirmedFixPayload,
  CorrectionPayload,
  LikelihoodDto,
  NewCausePayload,
  ReviewDiffDto,
  ReviewFieldChangeDto,
  ReviewLikelihoodChangeDto,
  VehicleScopeQuery,
} from '@causeway/shared';
import type { CauseLikelihood } from '@causeway/shared';
import { DtcCode } from '../codes/entities/dtc-code.entity';
import { readReferenceTitles } from '../seed/catalogue.seeder';
import { Outcome } from '../knowledge/entities/outcome.entity';
import { Part } from '../knowledge/entities/part.entity';
import { PossibleCause } from '../knowledge/entities/possible-cause.entity';
import { Teardown } from '../knowledge/entities/teardown.entity';
import { LikelihoodService, type CodeLikelihoods } from '../knowledge/likelihood.service';
import { describeScope, normaliseVehicle, scopeKey, type Scoped } from '../knowledge/scope';
import { KnowledgeEditsService, normaliseScope, scopeCovers } from '../moderation/knowledge-edits.service';
import type { FieldReport } from './entities/field-report.entity';
import { overlayManager } from './overlay-manager';

function likelihoodDto(c: CauseLikelihood): LikelihoodDto {
  return { probability: c.probability, lower: c.lower, upper: c.upper, evidence: c.evidence, inheritedEvidence: c.inheritedEvidence, priorWeight: c.priorWeight };
}

function pct(p: number): string {
  return `${(p * 100).toFixed(1)} %`;
}

/** The vehicle that stands for a scope when showing a list's likelihoods. */
function vehicleOfScope(s: Scoped): VehicleScopeQuery {
  return normaliseVehicle({ make: s.make ?? undefined, model: s.model ?? undefined, engine: s.engine ?? undefined, year: s.yearFrom ?? s.yearTo ?? undefined });
}

/** The catalogue title a proposed code would get: the report's, else the reference dataset's, else a placeholder. */
export function proposedCodeTitle(code: string, proposed: string | null | undefined): string {
  if (proposed) return proposed;
  return readReferenceTitles().get(code) ?? `${code} (title to be confirmed by a moderator)`;
}

/**
 * Before / after of a field report for the review desk. Likelihoods come from the same
 * LikelihoodService (shared dirichletPosterior / backoffPosterior, influence caps) as every
 * ranking, fed the rows approval would write through an overlay, so "after" is exactly what
 * the ranking shows once the report is approved.
 */
@Injectable()
export class ReviewDiffService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly likelihood: LikelihoodService,
    private readonly edits: KnowledgeEditsService,
  ) {}

  async diff(report: FieldReport, em: EntityManager = this.dataSource.manager): Promise<ReviewDiffDto> {
    const warnings: string[] = [];
    if (report.proposesNewCode) {
      const still = !(await em.getRepository(DtcCode).exist({ where: { code: report.code } }));
      if (still) {
        const title = proposedCodeTitle(report.code, (report.payload as ConfirmedFixPayload | NewCausePayload).codeTitle);
        warnings.push(`${report.code} is a valid code that is not in the catalogue: approving adds a catalogue entry titled "${title}".`);
      }
    }
    if (report.kind === 'confirmed-fix') return this.confirmedFix(em, report, warnings);
    if (report.kind === 'new-cause') return this.newCause(em, report, warnings);
    return this.correction(em, report, warnings);
  }

  /** The outcome rows LikelihoodService.recordOutcome would write for this report (one part, full credit). */
  virtualOutcome(report: FieldReport, lik: CodeLikelihoods): Outcome {
    const p = report.payload as ConfirmedFixPayload;
    const v = normaliseVehicle({ make: p.make, model: p.model, engine: p.engine ?? undefined, year: p.year ?? undefined });
    return Object.assign(new Outcome(), {
      id: `preview-${report.id}`,
      source: 'field-report',
      sourceId: report.id,
      userId: report.authorId,
      shopId: report.shopId,
      code: report.code,
      make: v.make ?? null,
      model: v.model ?? null,
      engine: v.engine ?? null,
      year: v.year ?? null,
      causeKey: lik.byKey.has(p.part) ? p.part : null,
      weight: 1,
      createdAt: new Date(),
    });
  }

  private async confirmedFix(em: EntityManager, report: FieldReport, warnings: string[]): Promise<ReviewDiffDto> {
    const p = report.payload as ConfirmedFixPayload;
    const vehicle = normaliseVehicle({ make: p.make, model: p.model, engine: p.engine ?? undefined, year: p.year ?? undefined });
    const before = await this.likelihood.likelihoods(report.code, vehicle, em);
    const outcome = this.virtualOutcome(report, before);
    const after = await this.likelihood.likelihoods(report.code, vehicle, overlayManager(em, new Map<EntityTarget<ObjectLiteral>, ObjectLiteral[]>([[Outcome, [outcome]]])));
    const partName = (await em.getRepository(Part).findOneBy({ key: p.part }))?.name ?? p.part;
    const listed = before.byKey.has(p.part);
    if (!listed) warnings.push(`${partName} is not a possible cause of ${report.code} for this vehicle: the fix counts for "a cause not listed". Consider adding it as a possible cause.`);
    if (after.capped) warnings.push("The contributor's (or their shop's) outcomes for this code and vehicle are at the influence cap: this one is counted at reduced weight.");
    const subjectBefore = listed ? before.byKey.get(p.part)! : before.unlisted;
    const subjectAfter = listed ? after.byKey.get(p.part)! : after.unlisted;
    const changes: ReviewFieldChangeDto[] = [
      { field: 'evidence', label: `Outcomes counted for ${report.code} on ${describeVehicle(vehicle)}`, before: round(before.totalEvidence), after: round(after.totalEvidence) },
      { field: 'probability', label: `Likelihood of ${listed ? partName : 'a cause not listed'}`, before: subjectBefore.probability, after: subjectAfter.probability },
    ];
    return {
      summary: `Counts one verified fix of ${report.code} by ${partName} on ${describeVehicle(vehicle)}: its likelihood goes from ${pct(subjectBefore.probability)} to ${pct(subjectAfter.probability)}.`,
      target: { entityType: 'outcome', entityId: null, label: `${report.code} on ${describeVehicle(vehicle)}` },
      changes,
      likelihoods: this.likelihoodTable(before, after, listed ? p.part : null),
      warnings,
      applicable: true,
      blockers: [],
    };
  }

  private async newCause(em: EntityManager, report: FieldReport, warnings: string[]): Promise<ReviewDiffDto> {
    const p = report.payload as NewCausePayload;
    const scope = normaliseScope(p, []);
    const blockers: string[] = [];
    const part = await em.getRepository(Part).findOneBy({ key: p.part });
    const partName = part?.name ?? p.partName ?? p.part;
    if (!part) {
      warnings.push(`Approving adds a new part "${partName}" (${p.part})${p.system ? ` in the ${p.system} system` : ''}.`);
      if (!p.system) warnings.push('The report names no system for the new part: choose one when approving (it decides the safety cautions).');
    }
    const siblings = await this.edits.sameScope(em, report.code, scope);
    if (siblings.some((c) => c.partKey === p.part)) blockers.push(`${p.part} is already a possible cause of ${report.code} for ${describeScope(scope)}.`);
    const sumProblem = this.edits.priorSumProblem(siblings, p.prior, report.code, scope);
    if (sumProblem) blockers.push(`Approving would fail: ${sumProblem}. Lower the other priors first (direct edit) or reject.`);
    if (p.teardown) {
      const t = await em.getRepository(Teardown).findOneBy({ key: p.teardown });
      if (!t) blockers.push(`The teardown ${p.teardown} no longer exists.`);
      else if (!scopeCovers(t, scope)) blockers.push(`The teardown ${p.teardown} is for ${describeScope(t)}, which does not cover ${describeScope(scope)}.`);
    }

    const vehicle = vehicleOfScope(scope);
    const before = await this.likelihood.likelihoods(report.code, vehicle, em);
    const row = Object.assign(new PossibleCause(), {
      id: `preview-${report.id}`,
      code: report.code,
      partKey: p.part,
      part: Object.assign(new Part(), { id: `preview-${p.part}`, key: p.part, name: partName, system: part?.system ?? p.system ?? '' }),
      prior: p.prior,
      partCostMinor: p.partCostMinor,
      currency: p.currency,
      replaceHours: p.replaceHours,
      teardownKey: p.teardown ?? null,
      teardown: null,
      checkDescription: p.check?.description ?? '',
      checkHours: p.check?.hours ?? null,
      checkMustPrecede: p.check?.mustPrecede ?? false,
      ...scope,
    });
    const after = blockers.length ? null : await this.likelihood.likelihoods(report.code, vehicle, overlayManager(em, new Map<EntityTarget<ObjectLiteral>, ObjectLiteral[]>([[PossibleCause, [row]]])));
    const key = scopeKey(scope);
    const shown = after !== null && after.listScope !== null && scopeKey(after.listScope) === key;
    if (siblings.length === 0) {
      const replaces = shown && before.listScope !== null && scopeKey(before.listScope) !== key;
      warnings.push(
        `This starts a new possible-cause list of ${report.code} for ${describeScope(scope)}.` +
          (replaces ? ` For these vehicles it takes the place of the list for ${describeScope(before.listScope)} (lists of different scopes are not merged), so it would be the only cause listed.` : ''),
      );
    }
    if (after && !shown) {
      warnings.push(`A more specific list (${describeScope(after.listScope)}) applies to ${describeVehicle(vehicle)}: the new cause shows only for vehicles where the ${describeScope(scope)} list is the most specific one.`);
    }
    const money = (minor: number) => `${minor} minor units of ${p.currency}`;
    const changes: ReviewFieldChangeDto[] = [
      { field: 'prior', label: 'Prior weight', before: null, after: p.prior },
      { field: 'partCostMinor', label: `Part cost (${p.currency}, minor units)`, before: null, after: p.partCostMinor },
      { field: 'replaceHours', label: 'Labour hours to replace', before: null, after: p.replaceHours },
      { field: 'teardownKey', label: 'Teardown', before: null, after: p.teardown ?? null },
      { field: 'check', label: 'Check', before: null, after: p.check ? `${p.check.description} (${p.check.hours} h${p.check.mustPrecede ? ', before replacing' : ''})` : null },
      { field: 'priorSum', label: `Sum of priors for ${describeScope(scope)}`, before: round(siblings.reduce((s, c) => s + c.prior, 0)), after: round(siblings.reduce((s, c) => s + c.prior, 0) + p.prior) },
    ];
    return {
      summary: `Adds ${partName} as a possible cause of ${report.code} for ${describeScope(scope)}, prior ${p.prior}, part ${money(p.partCostMinor)}, ${p.replaceHours} h to replace.`,
      target: { entityType: 'possible-cause', entityId: null, label: `${report.code} · ${partName} · ${describeScope(scope)}` },
      changes,
      likelihoods: after ? this.likelihoodTable(before, after, p.part) : null,
      warnings,
      applicable: blockers.length === 0,
      blockers,
    };
  }

  private async correction(em: EntityManager, report: FieldReport, warnings: string[]): Promise<ReviewDiffDto> {
    const p = report.payload as CorrectionPayload;
    const labels = { partCostMinor: 'Part cost (minor units)', replaceHours: 'Labour hours to replace', title: 'Title', description: 'Description' };
    if (p.target === 'cause') {
      const scope = normaliseScope(p, []);
      const cause = await this.edits.causeWithScope(em, report.code, p.part!, scope);
      const partName = cause?.part?.name ?? p.part!;
      const label = `${report.code} · ${partName} · ${describeScope(scope)}`;
      if (!cause) {
        return { summary: `The possible cause ${label} no longer exists.`, target: { entityType: 'possible-cause', entityId: null, label }, changes: [], likelihoods: null, warnings, applicable: false, blockers: [`The possible cause ${label} no longer exists.`] };
      }
      const before = cause[p.field as 'partCostMinor' | 'replaceHours'];
      const unit = p.field === 'partCostMinor' ? ` (${cause.currency}, minor units)` : '';
      return {
        summary: `Sets the ${p.field === 'partCostMinor' ? 'part cost' : 'labour hours'} of ${label} from ${before} to ${p.value}${unit}.`,
        target: { entityType: 'possible-cause', entityId: cause.id, label },
        changes: [{ field: p.field, label: `${labels[p.field]}${unit ? ` in ${cause.currency}` : ''}`, before, after: p.value }],
        likelihoods: null,
        warnings,
        applicable: true,
        blockers: [],
      };
    }
    const entry = await em.getRepository(DtcCode).find({ where: { code: report.code } });
    const row = p.make ? entry.find((e) => e.make.toLowerCase() === p.make!.toLowerCase()) : entry.find((e) => e.make === '');
    const label = `${report.code}${row?.make ? ` (${row.make})` : ''}`;
    if (!row) {
      return { summary: `${label} is no longer in the catalogue.`, target: { entityType: 'dtc-code', entityId: null, label }, changes: [], likelihoods: null, warnings, applicable: false, blockers: [`${label} is no longer in the catalogue.`] };
    }
    const field = p.field as 'title' | 'description';
    return {
      summary: `Replaces the ${field} of ${label}.`,
      target: { entityType: 'dtc-code', entityId: row.make ? `${row.code}|${row.make}` : row.code, label },
      changes: [{ field, label: labels[field], before: row[field], after: p.value }],
      likelihoods: null,
      warnings,
      applicable: true,
      blockers: [],
    };
  }

  private likelihoodTable(before: CodeLikelihoods, after: CodeLikelihoods, subject: string | null): NonNullable<ReviewDiffDto['likelihoods']> {
    const names = new Map<string, string>();
    for (const r of [...before.list, ...after.list]) names.set(r.partKey, r.part?.name ?? r.partKey);
    const keys = [...new Set([...after.list.map((r) => r.partKey), ...before.list.map((r) => r.partKey)])];
    const causes: ReviewLikelihoodChangeDto[] = keys
      .map((key) => ({
        key,
        partName: names.get(key) ?? key,
        before: before.byKey.has(key) ? likelihoodDto(before.byKey.get(key)!) : null,
        after: after.byKey.has(key) ? likelihoodDto(after.byKey.get(key)!) : null,
        subject: key === subject,
      }))
      .sort((a, b) => (b.after?.probability ?? 0) - (a.after?.probability ?? 0) || a.key.localeCompare(b.key));
    return {
      vehicle: after.vehicle,
      listScope: after.listScope,
      priorStrength: after.priorStrength,
      evidenceBefore: before.totalEvidence,
      evidenceAfter: after.totalEvidence,
      capped: after.capped,
      causes,
      unlisted: { before: likelihoodDto(before.unlisted), after: likelihoodDto(after.unlisted) },
    };
  }
}

function describeVehicle(v: VehicleScopeQuery): string {
  const name = [v.make, v.model, v.engine, v.year].filter((x) => x !== undefined).join(' ');
  return name || 'any vehicle';
}

function round(x: number): number {
  return Math.round(x * 1e6) / 1e6;
}
