import { CheckCircleFilled, CloseCircleFilled, WarningFilled } from '@ant-design/icons';
import { formatMoney, type CautionDto, type EstimateAnswerDto, type EstimateStageDto, type EstimateTotals, type TaxedMoney } from '@causeway/shared';
import { Tooltip, Typography } from 'antd';
import type { ReactNode } from 'react';
import { SafetyCaution } from '@/components/safety-caution';
import { caution, palette } from '@/config/theme';
import { DEFER_PREFIX, formatWhen, percent, taxRateLabel } from '../utils/format';

type EstimateStagesProps = {
  stages: EstimateStageDto[];
  totals: EstimateTotals;
  currency: string;
  locale: string;
  taxRateBp: number;
  /** The latest answer per stage, where there is one. */
  decisions?: Array<EstimateAnswerDto | null>;
  /** Buttons under each stage (the owner's approve / decline). */
  renderStageActions?: (stage: EstimateStageDto) => ReactNode;
  /** Print: no tooltips, nothing to hover. */
  plain?: boolean;
};

const KIND_LABELS: Record<EstimateStageDto['kind'], string> = {
  check: 'Check, then repair',
  replace: 'Replace',
  escalate: 'Further diagnosis',
};

function Chance({ value, detail, locale, plain }: { value: number; detail: string; locale: string; plain?: boolean }) {
  const text = percent(value, locale);
  if (plain) return <strong>{text}</strong>;
  return (
    <Tooltip title={detail} trigger={['hover', 'focus']}>
      <strong tabIndex={0} style={{ borderBottom: '1px dotted currentColor', cursor: 'help' }}>
        {text}
      </strong>
    </Tooltip>
  );
}

function PriceTable({ price, upTo, currency, locale, taxRateBp, caption }: { price: TaxedMoney; upTo: TaxedMoney | null; currency: string; locale: string; taxRateBp: number; caption: string }) {
  const money = (minor: number) => formatMoney(minor, currency, locale);
  const cell = { padding: '2px 0 2px 16px', textAlign: 'right' as const, fontVariantNumeric: 'tabular-nums' as const };
  const head = { padding: '2px 0', textAlign: 'left' as const, fontWeight: 400, color: palette.grey700 };
  return (
    <table style={{ borderCollapse: 'collapse', minWidth: 220 }}>
      <caption style={{ textAlign: 'left', fontWeight: 600, paddingBottom: 2 }}>{caption}</caption>
      <tbody>
        <tr>
          <th scope="row" style={head}>Before tax</th>
          <td style={cell} data-testid="price-net">{money(price.net)}</td>
        </tr>
        <tr>
          <th scope="row" style={head}>Tax ({taxRateLabel(taxRateBp, locale)})</th>
          <td style={cell} data-testid="price-tax">{money(price.tax)}</td>
        </tr>
        <tr style={{ borderTop: `1px solid ${palette.grey300}` }}>
          <th scope="row" style={{ ...head, fontWeight: 700, color: palette.grey900 }}>With tax</th>
          <td style={{ ...cell, fontWeight: 700 }} data-testid="price-gross">{money(price.gross)}</td>
        </tr>
        {upTo && (
          <tr>
            <th scope="row" style={head}>At most, with tax</th>
            <td style={cell}>{money(upTo.gross)}</td>
          </tr>
        )}
      </tbody>
    </table>
  );
}

function Decision({ answer, locale }: { answer: EstimateAnswerDto; locale: string }) {
  const approved = answer.decision === 'approved';
  return (
    <p style={{ margin: '8px 0 0', fontWeight: 600, color: approved ? palette.green : palette.grey700 }} data-testid="stage-decision">
      {approved ? <CheckCircleFilled aria-hidden /> : <CloseCircleFilled aria-hidden />} {approved ? 'Approved' : 'Declined'}
      {answer.name ? ` by ${answer.name}` : ''} on {formatWhen(answer.answeredAt, locale)}
    </p>
  );
}

/** Every caution of the estimate, each once, in the order the stages meet them. */
export function estimateCautions(stages: EstimateStageDto[]): CautionDto[] {
  const byKey = new Map<string, CautionDto>();
  for (const s of stages) for (const c of s.cautions) if (!byKey.has(c.key)) byKey.set(c.key, c);
  return [...byKey.values()];
}

/**
 * A staged estimate: each stage priced before tax, the tax and the total with tax, its chance of
 * fixing the fault, the chance it is fixed by then, what happens if it is not, and the safety
 * notes of the work. Totals at the end: the expected cost and every stage carried out.
 */
export function EstimateStages({ stages, totals, currency, locale, taxRateBp, decisions, renderStageActions, plain }: EstimateStagesProps) {
  const cautions = estimateCautions(stages);
  const codes = new Set(stages.map((s) => s.code));
  return (
    <div className="estimate-stages">
      <ol style={{ listStyle: 'none', padding: 0, margin: 0 }}>
        {stages.map((stage) => {
          const answer = decisions?.[stage.index] ?? null;
          return (
            <li
              key={stage.index}
              className="estimate-stage"
              data-testid="estimate-stage"
              aria-label={`Stage ${stage.index + 1}: ${stage.title}`}
              style={{
                display: 'flex',
                flexWrap: 'wrap',
                gap: 16,
                padding: '16px 0',
                borderTop: `1px solid ${palette.grey200}`,
                breakInside: 'avoid',
              }}
            >
              <div
                aria-hidden
                style={{
                  flex: '0 0 44px',
                  height: 44,
                  borderRadius: '50%',
                  border: `2px solid ${stage.kind === 'escalate' ? palette.grey600 : palette.teal600}`,
                  display: 'flex',
                  alignItems: 'center',
                  justifyContent: 'center',
                  fontWeight: 700,
                  fontSize: 18,
                }}
              >
                {stage.index + 1}
              </div>
              <div style={{ flex: '1 1 320px', minWidth: 0 }}>
                <Typography.Text type="secondary" style={{ fontSize: 14 }}>
                  Stage {stage.index + 1} · {KIND_LABELS[stage.kind]}
                  {codes.size > 1 ? ` · for ${stage.code}` : ''}
                </Typography.Text>
                <h3 style={{ fontSize: 18, margin: '0 0 4px' }}>{stage.title}</h3>
                <p style={{ margin: '0 0 6px' }}>{stage.description}</p>
                <p style={{ margin: '0 0 6px' }}>
                  {stage.kind === 'escalate' ? (
                    'Hands the fault to a specialist; their findings decide what comes next.'
                  ) : (
                    <>
                      Chance this stage fixes the fault:{' '}
                      <Chance
                        value={stage.fixProbability}
                        locale={locale}
                        plain={plain}
                        detail={`Seen from the start. If the stages before it have not fixed it, this stage does ${percent(stage.fixProbabilityIfReached, locale)} of the time.`}
                      />
                      . Fixed by the end of it:{' '}
                      <Chance value={stage.cumulativeFixProbability} locale={locale} plain={plain} detail="The chance that the fault is fixed by the end of this stage, counting the stages before it." />.
                    </>
                  )}
                </p>
                <p style={{ margin: '0 0 6px' }}>
                  <strong>If it does not fix it: </strong>
                  {stage.ifNotFixed}
                </p>
                {stage.cautions.length > 0 && (
                  <p style={{ margin: 0, color: caution.text }}>
                    <WarningFilled aria-hidden style={{ color: caution.accent }} /> Safety: {stage.cautions.map((c) => c.title).join('; ')} (see the safety notes below)
                  </p>
                )}
                {answer && <Decision answer={answer} locale={locale} />}
                {renderStageActions?.(stage)}
              </div>
              <div style={{ flex: '0 0 auto' }}>
                <PriceTable
                  price={stage.price}
                  upTo={stage.priceUpTo}
                  currency={currency}
                  locale={locale}
                  taxRateBp={taxRateBp}
                  caption={stage.kind === 'check' ? 'Expected price of this stage' : 'Price of this stage'}
                />
              </div>
            </li>
          );
        })}
      </ol>
      <section
        aria-label="Totals"
        style={{ display: 'flex', flexWrap: 'wrap', gap: 32, padding: '16px 0', borderTop: `2px solid ${palette.grey700}`, breakInside: 'avoid' }}
      >
        <PriceTable price={totals.expected} upTo={null} currency={currency} locale={locale} taxRateBp={taxRateBp} caption="Expected cost (each stage weighted by the chance it is needed)" />
        <PriceTable price={totals.allStages} upTo={null} currency={currency} locale={locale} taxRateBp={taxRateBp} caption="If every stage is carried out" />
      </section>
      {cautions.length > 0 && (
        <section aria-label="Safety notes" style={{ breakInside: 'avoid' }}>
          <h3 style={{ fontSize: 18 }}>Safety notes for this work</h3>
          {cautions.map((c) => (
            <SafetyCaution key={c.key} title={c.title} points={c.points.filter((p) => !p.startsWith(DEFER_PREFIX))} />
          ))}
        </section>
      )}
    </div>
  );
}
