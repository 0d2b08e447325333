import { planFixPath, type FixPathDto, type Plan, type PlanInput } from '@causeway/shared';
import { useDeferredValue, useMemo, useState } from 'react';
import { toMinorUnits } from '@/utils/money';
import { hasEdits, whatIfInput, type WhatIfEdits } from '../utils/what-if';

/** What the user typed, kept as text so half-typed numbers ("12.") survive. */
export interface WhatIfFields {
  labourRate?: string;
  causes: Record<string, { partCost?: string; replaceHours?: string }>;
}

const EMPTY: WhatIfFields = { causes: {} };

function hoursOf(text: string | undefined): number | undefined | null {
  if (text === undefined || text.trim() === '') return undefined;
  const value = Number(text.replace(',', '.'));
  return Number.isFinite(value) && value >= 0 && value <= 1000 ? value : null;
}

function moneyOf(text: string | undefined, currency: string): number | undefined | null {
  if (text === undefined || text.trim() === '') return undefined;
  return toMinorUnits(text, currency);
}

export interface WhatIf {
  fields: WhatIfFields;
  setLabourRate: (text: string | undefined) => void;
  setCause: (key: string, field: 'partCost' | 'replaceHours', text: string | undefined) => void;
  reset: () => void;
  edited: boolean;
  /** Field ids whose text is not a number the planner can use; they keep the knowledge base's figure. */
  invalid: Set<string>;
  /** The labour rate the plan is costed at. */
  labourRateMinor: number;
  input: PlanInput;
  plan: Plan;
  /** Why the edited input could not be planned, when it could not. */
  error: string | null;
}

/**
 * The user's own costs and labour rate, and the fix path re-planned with them in the browser
 * by the same planner the server uses. With nothing edited, the server's plan is shown as is.
 */
export function useWhatIf(dto: FixPathDto): WhatIf {
  const [fields, setFields] = useState<WhatIfFields>(EMPTY);
  const deferred = useDeferredValue(fields);

  const { edits, invalid } = useMemo(() => {
    const bad = new Set<string>();
    const out: WhatIfEdits = { causes: {} };
    const rate = moneyOf(deferred.labourRate, dto.money.currency);
    if (rate === null) bad.add('labourRate');
    else if (rate !== undefined) out.labourRateMinor = rate;
    for (const [key, f] of Object.entries(deferred.causes)) {
      const part = moneyOf(f.partCost, dto.money.currency);
      const h = hoursOf(f.replaceHours);
      if (part === null) bad.add(`${key}.partCost`);
      if (h === null) bad.add(`${key}.replaceHours`);
      out.causes[key] = { ...(typeof part === 'number' ? { partCostMinor: part } : {}), ...(typeof h === 'number' ? { replaceHours: h } : {}) };
    }
    return { edits: out, invalid: bad };
  }, [deferred, dto.money.currency]);

  const edited = hasEdits(edits);
  const { input, plan, error } = useMemo(() => {
    if (!edited) return { input: dto.input, plan: dto.plan, error: null };
    try {
      const next = whatIfInput(dto, edits);
      return { input: next, plan: planFixPath(next), error: null };
    } catch (e) {
      return { input: dto.input, plan: dto.plan, error: e instanceof Error ? e.message : 'These figures cannot be planned.' };
    }
  }, [dto, edits, edited]);

  return {
    fields,
    setLabourRate: (text) => setFields((f) => ({ ...f, labourRate: text })),
    setCause: (key, field, text) => setFields((f) => ({ ...f, causes: { ...f.causes, [key]: { ...f.causes[key], [field]: text } } })),
    reset: () => setFields(EMPTY),
    edited,
    invalid,
    labourRateMinor: edits.labourRateMinor ?? dto.money.labourRateMinor,
    input,
    plan,
    error,
  };
}
