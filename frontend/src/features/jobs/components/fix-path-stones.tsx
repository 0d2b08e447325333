import { WarningFilled } from '@ant-design/icons';
import { formatMoney, formatPercent, type FixPathDto, type PlanStage } from '@causeway/shared';
import { Collapse, Flex, Tag, Typography } from 'antd';
import { caution, palette } from '@/config/theme';
import { causeLabel, stageCautions, stageTitle, toMinor } from '../utils/fix-path';
import { intervalText, Probability } from './probability';

type FixPathStonesProps = {
  fixPath: FixPathDto;
  locale: string;
};

const KIND_LABELS: Record<PlanStage['kind'], string> = {
  check: 'Check',
  replace: 'Replace',
  escalate: 'Escalation',
};

function StageChanceDetail({ fixPath, stage, locale }: { fixPath: FixPathDto; stage: PlanStage; locale: string }) {
  const reached = formatPercent(stage.reachProbability, locale);
  return (
    <div>
      <div>Chance this stage is where the fault gets fixed, seen from the start (it is reached {reached} of the time).</div>
      {stage.causes.map((key) => {
        const cause = fixPath.causes.find((c) => c.key === key);
        if (!cause) return null;
        return (
          <div key={key}>
            {cause.label}: {formatPercent(cause.probability, locale)} now; 90 % interval {intervalText(cause.likelihood.lower, cause.likelihood.upper, locale)} before this job&apos;s steps,
            from {cause.likelihood.evidence + cause.likelihood.inheritedEvidence} recorded outcome{cause.likelihood.evidence + cause.likelihood.inheritedEvidence === 1 ? '' : 's'}.
          </div>
        );
      })}
    </div>
  );
}

/**
 * The fix path as a route of stepping stones: one stone a stage, each with what it costs if
 * reached (before tax), its chance of fixing the fault and the chance the fault is fixed by then.
 * The two simple orders are drawn faintly beside it, with what this path saves on average.
 */
export function FixPathStones({ fixPath, locale }: FixPathStonesProps) {
  const { plan, money } = fixPath;
  const amount = (minor: number) => formatMoney(toMinor(minor), money.currency, locale);
  const saving = toMinor(plan.savingVsCheapestFirst);

  if (plan.stages.length === 0) {
    return <Typography.Paragraph type="secondary">{fixPath.note ?? 'No stage is left on this fix path.'}</Typography.Paragraph>;
  }

  return (
    <section aria-label={`Fix path for ${fixPath.code}`} data-testid={`fix-path-${fixPath.code}`}>
      <Typography.Paragraph style={{ marginBottom: 8 }}>
        Expected cost <strong>{amount(plan.expectedCost)}</strong> before tax, on average over how it may turn out.
        {!plan.exact && ' Approximate: too many possible causes for the exact plan.'}
        {fixPath.indicative && ' Some part prices were converted from another currency and are indicative.'}
      </Typography.Paragraph>
      <ol style={{ listStyle: 'none', padding: 0, margin: '0 0 8px', display: 'flex', flexWrap: 'wrap', alignItems: 'stretch', gap: 0 }}>
        {plan.stages.map((stage, i) => {
          const cautions = stageCautions(fixPath, stage);
          const escalate = stage.kind === 'escalate';
          return (
            <li key={i} style={{ display: 'flex', alignItems: 'center' }} data-testid="fix-path-stage">
              {i > 0 && (
                <span aria-hidden style={{ width: 28, borderTop: `3px dotted ${palette.teal300}`, margin: '0 4px' }} />
              )}
              <div
                style={{
                  width: 250,
                  minHeight: 200,
                  padding: '20px 24px',
                  margin: '6px 0',
                  borderRadius: '34% 42% 38% 40% / 16% 14% 20% 18%',
                  border: `2px ${escalate ? 'dashed' : 'solid'} ${escalate ? palette.grey600 : palette.teal500}`,
                  background: escalate ? palette.grey100 : palette.teal50,
                  display: 'flex',
                  flexDirection: 'column',
                  gap: 2,
                  lineHeight: 1.45,
                }}
              >
                <Typography.Text strong style={{ color: palette.teal700, fontSize: 13, textTransform: 'uppercase', letterSpacing: 0.6 }}>
                  Stage {i + 1} · {KIND_LABELS[stage.kind]}
                </Typography.Text>
                <Typography.Text strong style={{ fontSize: 16 }}>
                  {escalate ? stageTitle(fixPath, stage) : stage.causes.map((k) => causeLabel(fixPath, k)).join(' + ')}
                </Typography.Text>
                {stage.teardowns.length > 0 && (
                  <Typography.Text type="secondary" style={{ fontSize: 14 }}>
                    Opens: {stage.teardowns.map((t) => fixPath.teardowns.find((x) => x.key === t)?.name ?? t).join('; ')}
                  </Typography.Text>
                )}
                <span>
                  Costs <strong>{amount(stage.cost)}</strong> if reached
                </span>
                <span>
                  {escalate ? 'Hands the fault over' : (
                    <>
                      Fixes it: <strong><Probability value={stage.fixProbability} locale={locale} detail={<StageChanceDetail fixPath={fixPath} stage={stage} locale={locale} />} /></strong>
                    </>
                  )}
                </span>
                <span>
                  Fixed by now:{' '}
                  <strong>
                    <Probability
                      value={stage.cumulativeFixProbability}
                      locale={locale}
                      detail="Chance the fault is fixed by the end of this stage, on this vehicle, from the recorded outcomes and the curated likelihoods."
                    />
                  </strong>
                </span>
                {cautions.length > 0 && (
                  <span style={{ fontSize: 14, color: caution.text }}>
                    <WarningFilled aria-hidden style={{ color: caution.accent }} /> Safety: {cautions.map((c) => c.title).join('; ')}
                  </span>
                )}
              </div>
            </li>
          );
        })}
      </ol>
      <Typography.Paragraph type="secondary" style={{ fontSize: 14, color: palette.grey600 }} data-testid="fix-path-baselines">
        Beside it, on average: cheapest part first {amount(plan.baselines.cheapestFirst.expectedCost)}; most likely first{' '}
        {amount(plan.baselines.mostLikelyFirst.expectedCost)}.{saving > 0 ? ` This path saves ${amount(saving)} against cheapest part first.` : ''}
      </Typography.Paragraph>
      {fixPath.addOns.length > 0 && (
        <Flex vertical gap={4} style={{ marginBottom: 8 }}>
          {fixPath.addOns.map((a) => (
            <Typography.Text key={a.key}>
              <Tag>While it is apart</Tag>
              In stage {a.stageIndex + 1}: {a.label} for {formatMoney(a.costMinor, money.currency, locale)}, saving {formatMoney(a.savedMinor, money.currency, locale)} of labour
              ({a.savedHours} h) against opening it again later.
            </Typography.Text>
          ))}
        </Flex>
      )}
      <Collapse
        size="small"
        items={[
          {
            key: 'verification',
            label: `Verification: ${fixPath.verification.monitor || 'clear, drive, confirm'} (${amount(fixPath.verification.costMinor)})`,
            children: <Typography.Paragraph style={{ marginBottom: 0 }}>{fixPath.verification.procedure}</Typography.Paragraph>,
          },
          ...(fixPath.escalation
            ? [
                {
                  key: 'escalation',
                  label: `Escalation: further diagnosis (${amount(fixPath.escalation.costMinor)})`,
                  children: <Typography.Paragraph style={{ marginBottom: 0 }}>{fixPath.escalation.description}</Typography.Paragraph>,
                },
              ]
            : []),
        ]}
      />
    </section>
  );
}
