import { formatPercent, type LikelihoodDto } from '@causeway/shared';
import { Tooltip, Typography } from 'antd';

/** A probability as a whole percentage; its 90 % interval and evidence on hover and focus. */
export function LikelihoodValue({ value, locale }: { value: LikelihoodDto | null; locale: string }) {
  if (!value) return <Typography.Text type="secondary">Not listed</Typography.Text>;
  const interval = `90 % interval ${formatPercent(value.lower, locale)}–${formatPercent(value.upper, locale)}, from ${formatCount(value.evidence, locale)} outcomes here and ${formatCount(value.inheritedEvidence, locale)} inherited`;
  return (
    <Tooltip title={interval}>
      <span tabIndex={0} aria-label={`${formatPercent(value.probability, locale)} (${interval})`} style={{ borderBottom: '1px dotted currentColor', cursor: 'help' }}>
        {formatPercent(value.probability, locale)}
      </span>
    </Tooltip>
  );
}

export function formatCount(n: number, locale: string): string {
  return new Intl.NumberFormat(locale, { maximumFractionDigits: 2 }).format(n);
}
