import { labourCostMinor, type FixPathDto, type PlanCause, type PlanInput } from '@causeway/shared';

/** A user's own figures for one possible cause; absent fields keep the knowledge base's. */
export interface CauseEdit {
  /** Part price, minor units of the shop's currency, before tax. */
  partCostMinor?: number;
  /** Labour hours to replace the part (the teardown is costed on its own). */
  replaceHours?: number;
}

export interface WhatIfEdits {
  /** Labour per hour before tax, minor units. */
  labourRateMinor?: number;
  causes: Record<string, CauseEdit>;
}

export const NO_EDITS: WhatIfEdits = { causes: {} };

export function hasEdits(edits: WhatIfEdits): boolean {
  return (
    edits.labourRateMinor !== undefined ||
    Object.values(edits.causes).some((e) => e.partCostMinor !== undefined || e.replaceHours !== undefined)
  );
}

/**
 * The planner's input with the user's figures: every labour cost is hours × rate again, with
 * the same rounding as the server, so with no edits this is the server's input exactly. The
 * likelihoods and the unlisted mass are the server's and are not edited.
 */
export function whatIfInput(dto: FixPathDto, edits: WhatIfEdits): PlanInput {
  const rate = edits.labourRateMinor ?? dto.money.labourRateMinor;
  const causeInfo = new Map(dto.causes.map((c) => [c.key, c]));
  const teardownHours = new Map(dto.teardowns.map((t) => [t.key, t.hours]));
  const addOnInfo = new Map((dto.addOnCosts ?? []).map((a) => [a.key, a]));

  const causes = dto.input.causes.map((cause): PlanCause => {
    const info = causeInfo.get(cause.key);
    if (!info) return cause;
    const edit = edits.causes[cause.key] ?? {};
    const part = edit.partCostMinor ?? info.partCost.minor;
    const hours = edit.replaceHours ?? info.replaceHours;
    return {
      ...cause,
      replaceCost: part + labourCostMinor(hours, rate),
      ...(cause.checkCost !== undefined && info.check ? { checkCost: labourCostMinor(info.check.hours, rate) } : {}),
    };
  });

  const teardowns = Object.fromEntries(
    Object.entries(dto.input.teardowns).map(([key, cost]) => {
      const hours = teardownHours.get(key);
      return [key, hours === undefined ? cost : labourCostMinor(hours, rate)];
    }),
  );

  const input: PlanInput = {
    causes,
    teardowns,
    verificationCost: labourCostMinor(dto.verification.hours, rate),
    unlistedProbability: dto.input.unlistedProbability,
  };
  if (dto.input.escalationCost !== undefined) {
    input.escalationCost = dto.escalation ? labourCostMinor(dto.escalation.hours, rate) : dto.input.escalationCost;
  }
  if (dto.input.addOns) {
    input.addOns = dto.input.addOns.map((addOn) => {
      const info = addOnInfo.get(addOn.key);
      return info ? { ...addOn, cost: info.partCost.minor + labourCostMinor(info.hours, rate) } : addOn;
    });
  }
  return input;
}
