import { ToolOutlined } from '@ant-design/icons';
import type { CautionDto, FixPathDto } from '@causeway/shared';
import { Alert, Card, Col, Row, Tag, Typography } from 'antd';
import { useMemo } from 'react';
import { SafetyCaution } from '@/components/safety-caution';
import { palette } from '@/config/theme';
import { grossFromNet } from '@/utils/money';
import { useWhatIf } from '../hooks/use-what-if';
import { curveSeries } from '../utils/curve';
import { hours, money, percent } from '../utils/format';
import { listNumbers, planNames, stageCautionKeys } from '../utils/stages';
import { describeVehicle } from '../utils/vehicle';
import { CostCurve } from './cost-curve';
import { SteppingStones } from './stepping-stones';
import { WhatIfEditor } from './what-if-editor';

type FixPathPanelProps = {
  dto: FixPathDto;
  /** Caution keys already set out in full on the page (the code's own): named here by stage only. */
  cautionsShownInFull?: string[];
};

function ownPoints(caution: CautionDto): string[] {
  return caution.points.filter((p) => !p.startsWith("Follow the vehicle maker's procedure"));
}

/**
 * The fix path: its stages as stepping stones with the baselines beside them, what the order
 * saves, work worth doing while a teardown is open, the curve of chance fixed against spend,
 * the safety cautions of each stage, and what-if figures that re-plan it in the browser.
 */
export function FixPathPanel({ dto, cautionsShownInFull = [] }: FixPathPanelProps) {
  const whatIf = useWhatIf(dto);
  const { plan } = whatIf;
  const ctx = dto.money;
  const { locale } = ctx;
  const names = useMemo(() => planNames(dto), [dto]);
  const cautionsByKey = useMemo(() => new Map(dto.cautions.map((c) => [c.key, c])), [dto.cautions]);

  const stageCautions = plan.stages.map((stage) =>
    stageCautionKeys(dto, stage).flatMap((key) => {
      const caution = cautionsByKey.get(key);
      return caution ? [caution] : [];
    }),
  );
  // Each caution once, saying which stages it concerns; the code's own apply to the whole job.
  const cautionStages = new Map<string, number[]>();
  stageCautions.forEach((list, index) => list.forEach((c) => cautionStages.set(c.key, [...(cautionStages.get(c.key) ?? []), index + 1])));

  const cheapest = plan.baselines.cheapestFirst;
  const likeliest = plan.baselines.mostLikelyFirst;
  const saving = plan.savingVsCheapestFirst;
  const savingShare = cheapest.expectedCost > 0 ? saving / cheapest.expectedCost : 0;
  const expectedMinor = Math.round(plan.expectedCost);
  const addOnInfo = new Map(dto.addOns.map((a) => [a.key, a]));
  const addOnLabels = new Map((whatIf.input.addOns ?? []).map((a) => [a.key, { label: a.label ?? a.key, cost: a.cost }]));

  return (
    <section aria-labelledby="fix-path-title">
      <Typography.Title level={2} id="fix-path-title" style={{ fontSize: 22 }}>
        Fix path
      </Typography.Title>
      <Typography.Paragraph type="secondary" style={{ marginBottom: 8 }}>
        The order of checks and replacements that costs least on average for {describeVehicle(dto.vehicle)}, at{' '}
        {money(whatIf.labourRateMinor, ctx)} an hour before tax. Each stage is done only if the ones before did not fix the fault, and
        ends with a verification ({dto.verification.monitor}, {hours(dto.verification.hours, locale)}).
        {!plan.exact && ' This path comes from a heuristic: there are too many possible causes to prove it is the cheapest.'}
        {dto.indicative && ' Some part prices were converted from another currency and are indicative.'}
      </Typography.Paragraph>
      {dto.note && <Alert type="info" showIcon title={dto.note} style={{ marginBottom: 16 }} />}

      <div
        style={{
          background: `linear-gradient(180deg, ${palette.teal50} 0%, ${palette.white} 100%)`,
          border: `1px solid ${palette.teal100}`,
          borderRadius: 12,
          padding: '16px 20px',
        }}
      >
        <div style={{ display: 'flex', flexWrap: 'wrap', gap: '4px 24px', alignItems: 'baseline', marginBottom: 8 }}>
          <Typography.Text style={{ fontSize: 17 }}>
            Expected cost:{' '}
            <strong data-testid="expected-cost" style={{ fontSize: 24, color: palette.teal700 }}>
              {money(expectedMinor, ctx)}
            </strong>{' '}
            before tax ({money(grossFromNet(expectedMinor, ctx.taxRateBp), ctx)} with tax)
          </Typography.Text>
          {whatIf.edited && <Tag color={palette.teal600}>With your figures</Tag>}
          <Typography.Text type="secondary">
            Fixed by the listed causes: {percent(1 - plan.escalationProbability - plan.unresolvedProbability, locale)}
            {plan.escalationProbability > 0 && `; handed over: ${percent(plan.escalationProbability, locale)}`}
          </Typography.Text>
        </div>
        <SteppingStones stages={plan.stages} names={names} money={ctx} label="Stages of the fix path" cautions={stageCautions} />
        <div style={{ marginTop: 12, paddingTop: 8, borderTop: `1px dashed ${palette.grey300}` }}>
          <Typography.Text type="secondary" style={{ fontSize: 14 }}>
            For comparison, cheapest part first: {money(cheapest.expectedCost, ctx)} on average
          </Typography.Text>
          <SteppingStones stages={cheapest.stages} names={names} money={ctx} variant="faint" label="Stages of cheapest part first" />
          <Typography.Text type="secondary" style={{ fontSize: 14 }}>
            Most likely first: {money(likeliest.expectedCost, ctx)} on average
          </Typography.Text>
          <SteppingStones stages={likeliest.stages} names={names} money={ctx} variant="faint" label="Stages of most likely first" />
        </div>
      </div>

      <Row gutter={[24, 24]} style={{ marginTop: 24 }}>
        <Col xs={24} lg={12}>
          <Card style={{ height: '100%' }}>
            <section aria-labelledby="fix-path-saves">
              <Typography.Title level={3} id="fix-path-saves" style={{ fontSize: 18, marginTop: 0 }}>
                What this order saves
              </Typography.Title>
              <Typography.Paragraph style={{ fontSize: 17, marginBottom: 8 }} data-testid="fix-path-saving">
                {saving > 0.5 ? (
                  <>
                    <strong>{money(saving, ctx)}</strong> on average against replacing the cheapest part first ({percent(savingShare, locale)}{' '}
                    less), before tax.
                  </>
                ) : (
                  <>Here the cheapest part first is already as good as it gets: this order saves nothing against it.</>
                )}
              </Typography.Paragraph>
              <Typography.Paragraph type="secondary" style={{ marginBottom: 0 }}>
                {likeliest.expectedCost - plan.expectedCost > 0.5
                  ? `And ${money(likeliest.expectedCost - plan.expectedCost, ctx)} against the most likely first.`
                  : 'The most likely first costs the same on average here.'}
              </Typography.Paragraph>
            </section>
          </Card>
        </Col>
        <Col xs={24} lg={12}>
          <Card style={{ height: '100%' }}>
            <section aria-labelledby="fix-path-add-ons">
              <Typography.Title level={3} id="fix-path-add-ons" style={{ fontSize: 18, marginTop: 0 }}>
                <ToolOutlined aria-hidden /> While it is apart
              </Typography.Title>
              {plan.addOns.length === 0 ? (
                <Typography.Paragraph type="secondary" style={{ marginBottom: 0 }}>
                  No other work shares a teardown this fix path opens.
                </Typography.Paragraph>
              ) : (
                <ul style={{ margin: 0, paddingLeft: 20, lineHeight: 1.7 }}>
                  {plan.addOns.map((a) => {
                    const info = addOnInfo.get(a.key);
                    const own = addOnLabels.get(a.key);
                    return (
                      <li key={a.key}>
                        <strong>{own?.label ?? a.label ?? a.key}</strong> at stage {a.stageIndex + 1} (reached {percent(a.reachProbability, locale)}): costs{' '}
                        {money(own?.cost ?? info?.costMinor ?? 0, ctx)}, saves {money(a.savedCost, ctx)} of opening
                        {info ? ` (${hours(info.savedHours, locale)})` : ''} — {names.teardown(a.teardown)}.
                      </li>
                    );
                  })}
                </ul>
              )}
            </section>
          </Card>
        </Col>
      </Row>

      <Card style={{ marginTop: 24 }}>
        <WhatIfEditor dto={dto} whatIf={whatIf} />
      </Card>

      {cautionStages.size + dto.cautions.length > 0 && (
        <section aria-labelledby="fix-path-safety" style={{ marginTop: 24 }}>
          <Typography.Title level={3} id="fix-path-safety" style={{ fontSize: 18 }}>
            Safety on this fix path
          </Typography.Title>
          {dto.cautions.map((c) => {
            const stages = cautionStages.get(c.key);
            return (
              <SafetyCaution
                key={c.key}
                title={c.title}
                points={[
                  <strong key="where">{stages ? `${stages.length > 1 ? 'Stages' : 'Stage'} ${listNumbers(stages)}` : 'The whole job'}</strong>,
                  ...(cautionsShownInFull.includes(c.key) ? ["Set out in full with the code's safety cautions above."] : ownPoints(c)),
                ]}
              />
            );
          })}
        </section>
      )}

      <Card style={{ marginTop: 24 }}>
        <CostCurve series={curveSeries(plan)} money={ctx} />
      </Card>

    </section>
  );
}
