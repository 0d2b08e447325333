import type { LikelihoodDto } from '@causeway/shared';
import { Tooltip } from 'antd';
import { percent } from '../utils/format';

type ProbabilityProps = {
  /** The figure shown; the likelihood's own mean when absent. */
  value?: number;
  likelihood: Pick<LikelihoodDto, 'probability' | 'lower' | 'upper' | 'evidence'>;
  locale: string;
};

/** A probability as a whole percentage, its 90 % interval on hover or focus. */
export function Probability({ value, likelihood, locale }: ProbabilityProps) {
  const interval = `90 % interval ${percent(likelihood.lower, locale)} to ${percent(likelihood.upper, locale)}`;
  return (
    <Tooltip title={`${interval}, from ${likelihood.evidence} recorded ${likelihood.evidence === 1 ? 'outcome' : 'outcomes'} for this vehicle`}>
      <span tabIndex={0} aria-label={`${percent(value ?? likelihood.probability, locale)} (${interval})`} style={{ borderBottom: '1px dotted currentColor', cursor: 'help' }}>
        {percent(value ?? likelihood.probability, locale)}
      </span>
    </Tooltip>
  );
}
