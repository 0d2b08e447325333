import { WarningFilled } from '@ant-design/icons';
import type { CautionDto, MoneyContext, PlanStage } from '@causeway/shared';
import type { CSSProperties } from 'react';
import { caution as cautionColours, palette } from '@/config/theme';
import { money, percent } from '../utils/format';
import { STAGE_KIND_LABELS, type PlanNames } from '../utils/stages';

type SteppingStonesProps = {
  stages: PlanStage[];
  names: PlanNames;
  money: Pick<MoneyContext, 'currency' | 'locale'>;
  /** The fix path itself is drawn boldly; the baselines beside it faintly. */
  variant?: 'path' | 'faint';
  /** Accessible name of the list. */
  label: string;
  /** Per stage, the safety cautions of its system. */
  cautions?: CautionDto[][];
};

/** Irregular radii give each stage the look of a stone laid across water. */
const STONE_SHAPES = [
  '56px 44px 60px 40px / 44px 52px 40px 56px',
  '42px 58px 46px 54px / 54px 40px 58px 44px',
  '60px 40px 52px 48px / 40px 56px 46px 52px',
  '48px 52px 40px 60px / 52px 46px 56px 40px',
];

function stoneStyle(stage: PlanStage, index: number, faint: boolean): CSSProperties {
  const base: CSSProperties = {
    borderRadius: STONE_SHAPES[index % STONE_SHAPES.length],
    padding: faint ? '6px 16px' : '18px 26px',
    width: faint ? undefined : 264,
    maxWidth: faint ? 200 : undefined,
    height: faint ? undefined : '100%',
    boxSizing: 'border-box',
    display: 'flex',
    flexDirection: 'column',
    justifyContent: 'center',
    textAlign: 'center',
    lineHeight: 1.45,
  };
  if (faint) return { ...base, background: palette.grey50, border: `1px dashed ${palette.grey300}`, color: palette.grey700 };
  if (stage.kind === 'escalate') return { ...base, background: palette.grey100, border: `2px solid ${palette.grey600}`, color: palette.grey900 };
  if (stage.kind === 'check') return { ...base, background: palette.white, border: `3px solid ${palette.teal600}`, color: palette.grey900 };
  return { ...base, background: palette.teal50, border: `3px solid ${palette.teal600}`, color: palette.grey900, boxShadow: `0 3px 0 ${palette.teal200}` };
}

/** A short stretch of path between two stones. */
function Connector({ faint }: { faint: boolean }) {
  return (
    <svg width={faint ? 24 : 44} height="24" viewBox="0 0 44 24" aria-hidden style={{ flex: 'none', alignSelf: 'center' }}>
      <path d="M2 12 C 12 2, 22 22, 42 12" fill="none" stroke={faint ? palette.grey300 : palette.teal300} strokeWidth={faint ? 2 : 4} strokeDasharray={faint ? '3 4' : '6 5'} strokeLinecap="round" />
    </svg>
  );
}

function stageWork(stage: PlanStage, names: PlanNames): string {
  const causes = stage.causes.map(names.cause);
  if (stage.kind === 'escalate') return 'Hand over for further diagnosis';
  if (stage.kind === 'check') {
    return causes.length === 1
      ? `Check ${causes[0]}; replace it if at fault`
      : `Check in turn: ${causes.join(', then ')}; replace the first found at fault`;
  }
  return causes.length === 1 ? `Replace ${causes[0]}` : `Replace together: ${causes.join(' and ')}`;
}

function shortWork(stage: PlanStage, names: PlanNames): string {
  if (stage.kind === 'escalate') return 'Hand over';
  return `${STAGE_KIND_LABELS[stage.kind]} ${stage.causes.map(names.cause).join(', ')}`;
}

/** A check stage's cost depends on how many checks it takes: it is an average. */
function costText(stage: PlanStage, ctx: SteppingStonesProps['money']): string {
  const cost = money(stage.cost, ctx);
  return stage.kind === 'check' ? `about ${cost}` : cost;
}

/**
 * A fix path drawn as a route of stepping stones, one stone a stage, each with what it does,
 * its cost, its chance of fixing the fault and the chance it is fixed by then.
 */
export function SteppingStones({ stages, names, money: ctx, variant = 'path', label, cautions }: SteppingStonesProps) {
  const faint = variant === 'faint';
  const { locale } = ctx;
  return (
    <ol aria-label={label} style={{ listStyle: 'none', margin: 0, padding: faint ? '4px 0' : '8px 0', display: 'flex', flexWrap: 'wrap', alignItems: 'stretch', rowGap: faint ? 8 : 16 }}>
      {stages.map((stage, index) => (
        <li key={`${stage.kind}-${index}`} style={{ display: 'flex', alignItems: faint ? 'center' : 'stretch' }} data-testid={faint ? undefined : 'fix-path-stage'}>
          {index > 0 && <Connector faint={faint} />}
          <div style={stoneStyle(stage, index, faint)}>
            {faint ? (
              <div style={{ fontSize: 13 }}>
                <strong>{index + 1}.</strong> {shortWork(stage, names)}
              </div>
            ) : (
              <>
                <div style={{ fontSize: 14, fontWeight: 700, letterSpacing: 0.4, textTransform: 'uppercase', color: palette.teal700 }}>
                  Stage {index + 1} · {STAGE_KIND_LABELS[stage.kind]}
                </div>
                <div style={{ fontSize: 16, fontWeight: 600, margin: '2px 0 4px' }}>{stageWork(stage, names)}</div>
              </>
            )}
            {!faint && stage.teardowns.length > 0 && (
              <div style={{ fontSize: 14, color: palette.grey700 }}>Opens: {stage.teardowns.map(names.teardown).join('; ')}</div>
            )}
            {faint ? (
              <div style={{ fontSize: 13 }}>
                {money(stage.cost, ctx)} · {stage.kind === 'escalate' ? 'handed over' : `fixes ${percent(stage.fixProbability, locale)}`}
              </div>
            ) : (
              <dl style={{ margin: '6px auto 0', display: 'grid', gridTemplateColumns: 'auto auto', columnGap: 8, rowGap: 0, fontSize: 14, textAlign: 'left' }}>
                <dt style={{ color: palette.grey700 }}>Cost if reached</dt>
                <dd style={{ margin: 0, fontWeight: 600 }}>{costText(stage, ctx)}</dd>
                <dt style={{ color: palette.grey700 }}>Fixes it</dt>
                <dd style={{ margin: 0, fontWeight: 600 }}>
                  {stage.kind === 'escalate' ? 'handed over' : `${percent(stage.fixProbability, locale)} chance`}
                </dd>
                <dt style={{ color: palette.grey700 }}>Fixed so far</dt>
                <dd style={{ margin: 0, fontWeight: 600 }}>{percent(stage.cumulativeFixProbability, locale)}</dd>
              </dl>
            )}
            {!faint && cautions?.[index] && cautions[index].length > 0 && (
              <div style={{ marginTop: 6, fontSize: 13, color: cautionColours.text, fontWeight: 600 }}>
                <WarningFilled aria-hidden style={{ color: cautionColours.accent }} /> Safety: {cautions[index].map((c) => c.title).join('; ')}
              </div>
            )}
          </div>
        </li>
      ))}
    </ol>
  );
}
