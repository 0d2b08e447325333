import { formatPercent } from '@causeway/shared';
import { Tooltip } from 'antd';
import type { ReactNode } from 'react';

type ProbabilityProps = {
  value: number;
  locale: string;
  /** What the number means and its interval, shown on hover and on keyboard focus. */
  detail?: ReactNode;
};

/** A probability as a whole percentage; its meaning and interval on hover or focus. */
export function Probability({ value, locale, detail }: ProbabilityProps) {
  const text = formatPercent(value, locale);
  if (!detail) return <span>{text}</span>;
  return (
    <Tooltip title={detail} trigger={['hover', 'focus']}>
      <span tabIndex={0} style={{ borderBottom: '1px dotted currentColor', cursor: 'help' }}>
        {text}
      </span>
    </Tooltip>
  );
}

export function intervalText(lower: number, upper: number, locale: string): string {
  return `${formatPercent(lower, locale)}–${formatPercent(upper, locale)}`;
}
