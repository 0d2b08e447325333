import {
  parseDtc,
  toKm,
  fromKm,
  type ConfirmedFixPayload,
  type CorrectionField,
  type CorrectionPayload,
  type DistanceUnit,
  type FieldError,
  type FieldReportDto,
  type FieldReportKind,
  type FieldReportRequest,
  type NewCausePayload,
  type PartSystem,
  type PossibleCauseRowDto,
} from '@causeway/shared';
import { ApiError, isApiError } from '@/lib/api-client';
import type { FieldErrorOptions } from '@/lib/form-errors';
import { fromMinorUnits, toMinorUnits } from '@/utils/money';
import { scopeOf } from '@/utils/vehicle-scope';

/** What the report form holds; each kind reads its own fields. */
export interface ReportFormValues {
  kind: FieldReportKind;
  code: string;
  codeTitle?: string;
  // confirmed fix: the vehicle; new cause and correction: the vehicle scope
  make?: string;
  model?: string;
  engine?: string;
  year?: number | null;
  yearFrom?: number | null;
  yearTo?: number | null;
  part?: string;
  odometer?: number | null;
  triedFirst?: string[];
  notes?: string;
  // new cause
  newPart?: boolean;
  newPartKey?: string;
  partName?: string;
  system?: PartSystem;
  /** Whole or decimal percent, 0–100. */
  prior?: number | null;
  /** As typed, in `currency`. */
  partCost?: string;
  currency?: string;
  replaceHours?: number | null;
  teardown?: string | null;
  withCheck?: boolean;
  checkDescription?: string;
  checkHours?: number | null;
  checkMustPrecede?: boolean;
  // correction
  target?: 'cause' | 'code';
  /** The possible cause corrected: `causeKey(row)`. */
  cause?: string;
  field?: CorrectionField;
  valueMoney?: string;
  valueHours?: number | null;
  valueText?: string;
  reason?: string;
}

export interface FormContext {
  distanceUnit: DistanceUnit;
  /** The currency a new cause's part cost is typed in by default (the shop's). */
  currency: string;
}

const blank = (s: string | null | undefined): string | null => {
  const t = s?.trim() ?? '';
  return t === '' ? null : t;
};

/** The normalised code, or the input itself so the server names the problem. */
export function normalisedCode(input: string | undefined): string {
  const parsed = parseDtc(input ?? '');
  return parsed.ok ? parsed.value.code : (input ?? '').trim();
}

/** A possible cause of a code, named by its part and scope; stable without fetching the row. */
export function causeKey(row: { partKey?: string | null; part?: string | null; make?: string | null; model?: string | null; engine?: string | null; yearFrom?: number | null; yearTo?: number | null }): string {
  return JSON.stringify([row.partKey ?? row.part ?? '', row.make ?? null, row.model ?? null, row.engine ?? null, row.yearFrom ?? null, row.yearTo ?? null]);
}

function parseCauseKey(key: string | undefined): Pick<CorrectionPayload, 'part' | 'make' | 'model' | 'engine' | 'yearFrom' | 'yearTo'> | null {
  if (!key) return null;
  try {
    const [part, make, model, engine, yearFrom, yearTo] = JSON.parse(key) as [string, string | null, string | null, string | null, number | null, number | null];
    return { part, make, model, engine, yearFrom, yearTo };
  } catch {
    return null;
  }
}

/** 5 (%) → 0.05, without binary noise such as 0.05000000000000001. */
export function percentToFraction(percent: number): number {
  return Number((percent / 100).toFixed(8));
}

export function fractionToPercent(fraction: number): number {
  return Number((fraction * 100).toFixed(6));
}

export function toRequest(values: ReportFormValues, ctx: FormContext, causes: PossibleCauseRowDto[] = []): FieldReportRequest {
  const code = normalisedCode(values.code);
  if (values.kind === 'confirmed-fix') {
    const payload: ConfirmedFixPayload = {
      code,
      make: values.make?.trim() ?? '',
      model: values.model?.trim() ?? '',
      engine: blank(values.engine),
      year: values.year ?? null,
      part: values.part ?? '',
      odometerKm: values.odometer === null || values.odometer === undefined ? null : Math.round(toKm(values.odometer, ctx.distanceUnit)),
      triedFirst: values.triedFirst ?? [],
      notes: values.notes?.trim() ?? '',
      codeTitle: blank(values.codeTitle),
    };
    return { kind: 'confirmed-fix', payload };
  }
  if (values.kind === 'new-cause') {
    const currency = values.currency ?? ctx.currency;
    const payload: NewCausePayload = {
      code,
      part: values.newPart ? (values.newPartKey?.trim() ?? '') : (values.part ?? ''),
      partName: values.newPart ? blank(values.partName) : null,
      system: values.newPart ? (values.system ?? null) : null,
      prior: values.prior === null || values.prior === undefined ? Number.NaN : percentToFraction(values.prior),
      partCostMinor: toMinorUnits(values.partCost, currency) ?? Number.NaN,
      currency,
      replaceHours: values.replaceHours ?? Number.NaN,
      teardown: values.teardown ?? null,
      check: values.withCheck
        ? { description: values.checkDescription?.trim() ?? '', hours: values.checkHours ?? Number.NaN, mustPrecede: values.checkMustPrecede ?? false }
        : null,
      ...scopeOf(values),
      notes: values.notes?.trim() ?? '',
      codeTitle: blank(values.codeTitle),
    };
    return { kind: 'new-cause', payload };
  }
  const target = values.target ?? 'cause';
  const field = values.field ?? (target === 'cause' ? 'partCostMinor' : 'title');
  let value: number | string;
  if (field === 'partCostMinor') {
    const row = causes.find((c) => causeKey(c) === values.cause);
    value = toMinorUnits(values.valueMoney, row?.currency ?? ctx.currency) ?? Number.NaN;
  } else if (field === 'replaceHours') value = values.valueHours ?? Number.NaN;
  else value = values.valueText ?? '';
  const scope = target === 'cause' ? parseCauseKey(values.cause) : null;
  const payload: CorrectionPayload = {
    target,
    code,
    part: scope?.part ?? null,
    make: target === 'cause' ? (scope?.make ?? null) : blank(values.make),
    model: scope?.model ?? null,
    engine: scope?.engine ?? null,
    yearFrom: scope?.yearFrom ?? null,
    yearTo: scope?.yearTo ?? null,
    field,
    value,
    reason: values.reason?.trim() ?? '',
  };
  return { kind: 'correction', payload };
}

/** A saved report back into the form (edit a draft, or file a similar one). */
export function toFormValues(report: Pick<FieldReportDto, 'kind' | 'payload'>, ctx: FormContext): ReportFormValues {
  if (report.kind === 'confirmed-fix') {
    const p = report.payload as ConfirmedFixPayload;
    return {
      kind: 'confirmed-fix',
      code: p.code,
      codeTitle: p.codeTitle ?? undefined,
      make: p.make,
      model: p.model,
      engine: p.engine ?? undefined,
      year: p.year ?? null,
      part: p.part,
      odometer: p.odometerKm === null || p.odometerKm === undefined ? null : Math.round(fromKm(p.odometerKm, ctx.distanceUnit)),
      triedFirst: p.triedFirst ?? [],
      notes: p.notes ?? '',
    };
  }
  if (report.kind === 'new-cause') {
    const p = report.payload as NewCausePayload;
    const isNew = !!p.partName;
    return {
      kind: 'new-cause',
      code: p.code,
      codeTitle: p.codeTitle ?? undefined,
      newPart: isNew,
      part: isNew ? undefined : p.part,
      newPartKey: isNew ? p.part : undefined,
      partName: p.partName ?? undefined,
      system: p.system ?? undefined,
      prior: fractionToPercent(p.prior),
      partCost: fromMinorUnits(p.partCostMinor, p.currency),
      currency: p.currency,
      replaceHours: p.replaceHours,
      teardown: p.teardown ?? null,
      withCheck: !!p.check,
      checkDescription: p.check?.description,
      checkHours: p.check?.hours ?? null,
      checkMustPrecede: p.check?.mustPrecede ?? false,
      make: p.make ?? undefined,
      model: p.model ?? undefined,
      engine: p.engine ?? undefined,
      yearFrom: p.yearFrom ?? null,
      yearTo: p.yearTo ?? null,
      notes: p.notes ?? '',
    };
  }
  const p = report.payload as CorrectionPayload;
  return {
    kind: 'correction',
    code: p.code,
    target: p.target,
    cause: p.target === 'cause' ? causeKey(p) : undefined,
    make: p.target === 'code' ? (p.make ?? undefined) : undefined,
    field: p.field,
    // The cause's currency is not in the payload; minor units of 2-digit currencies are the common case.
    valueMoney: p.field === 'partCostMinor' && typeof p.value === 'number' ? (p.value / 100).toFixed(2) : undefined,
    valueHours: p.field === 'replaceHours' && typeof p.value === 'number' ? p.value : null,
    valueText: (p.field === 'title' || p.field === 'description') && typeof p.value === 'string' ? p.value : undefined,
    reason: p.reason,
  };
}

export function emptyFormValues(kind: FieldReportKind, ctx: FormContext): ReportFormValues {
  return { kind, code: '', triedFirst: [], currency: ctx.currency, target: 'cause', field: 'partCostMinor', withCheck: false, checkMustPrecede: false, newPart: false };
}

/** The labels the user sees, by the server's `payload.<field>` path, and where each sits in the form. */
export function reportFieldErrorOptions(values: ReportFormValues): FieldErrorOptions {
  const labels: Record<string, string> = {
    'payload.code': 'Fault code',
    'payload.codeTitle': 'Title of the code',
    'payload.notes': 'Notes',
    'payload.make': 'Make',
    'payload.model': 'Model',
    'payload.engine': 'Engine',
  };
  const rename: Record<string, string> = {};
  for (const key of Object.keys(labels)) rename[key] = key.slice('payload.'.length);
  const add = (server: string, form: string, label: string) => {
    labels[server] = label;
    rename[server] = form;
  };
  if (values.kind === 'confirmed-fix') {
    add('payload.year', 'year', 'Model year');
    add('payload.part', 'part', 'The part that fixed it');
    add('payload.odometerKm', 'odometer', 'Odometer');
    add('payload.triedFirst', 'triedFirst', 'Tried first');
  } else if (values.kind === 'new-cause') {
    add('payload.part', values.newPart ? 'newPartKey' : 'part', values.newPart ? 'Key of the new part' : 'Part');
    add('payload.partName', 'partName', 'Name of the new part');
    add('payload.system', 'system', 'System');
    add('payload.prior', 'prior', 'Proposed prior');
    add('payload.partCostMinor', 'partCost', 'Part cost');
    add('payload.currency', 'currency', 'Currency');
    add('payload.replaceHours', 'replaceHours', 'Labour hours to replace');
    add('payload.teardown', 'teardown', 'Teardown');
    add('payload.check', 'checkDescription', 'Check');
    add('payload.check.description', 'checkDescription', 'What the check does');
    add('payload.check.hours', 'checkHours', 'Hours of the check');
    add('payload.check.mustPrecede', 'checkMustPrecede', 'Check first');
    add('payload.yearFrom', 'yearFrom', 'From model year');
    add('payload.yearTo', 'yearTo', 'To model year');
  } else {
    const target = values.target ?? 'cause';
    add('payload.target', 'target', 'What to correct');
    add('payload.field', 'field', 'Field');
    add('payload.reason', 'reason', 'Reason');
    const valueField = values.field === 'partCostMinor' ? 'valueMoney' : values.field === 'replaceHours' ? 'valueHours' : 'valueText';
    add('payload.value', valueField, 'The correct value');
    if (target === 'cause') {
      for (const f of ['part', 'make', 'model', 'engine', 'yearFrom', 'yearTo']) add(`payload.${f}`, 'cause', 'Possible cause');
    }
  }
  return { labels, rename };
}

/**
 * The server speaks in fractions and minor units; the form in percent and currency. Its field
 * messages are put in the form's terms before they are shown.
 */
export function inFormTerms(error: unknown): unknown {
  if (!isApiError(error) || error.fieldErrors.length === 0) return error;
  const errors: FieldError[] = error.fieldErrors.map((raw) => {
    // `payload.triedFirst.2` belongs to the one "tried first" field; whole sentences become predicates.
    const e = {
      field: raw.field.replace(/^payload\.triedFirst\.\d+$/, 'payload.triedFirst'),
      message: raw.message
        .replace(/^there is no (?:[a-z-]+ )+?(\S+)(;|$)/, 'names $1, which does not exist$2')
        .replace(/^the (?:teardown|part|scope) is for /, 'is for '),
    };
    if (e.field === 'payload.prior') return { ...e, message: e.message.replace(/between 0 and 1\b/, 'between 0 % and 100 %') };
    if (e.field === 'payload.partCostMinor' || (e.field === 'payload.value' && /minor units/.test(e.message))) {
      return { ...e, message: e.message.replace(/between 0 and (\d+)/, (_m, max: string) => `between 0 and ${(Number(max) / 100).toLocaleString('en')}`).replace(/\s*\(minor units[^)]*\)/, '') };
    }
    return e;
  });
  return new ApiError(error.status, { ...error.body, errors });
}
