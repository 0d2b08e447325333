import { WarningFilled } from '@ant-design/icons';
import { useId, type ReactNode } from 'react';
import { caution } from '@/config/theme';

export const SAFETY_FOOTNOTE = "Follow the vehicle maker's procedure, local regulations and licensed practice.";

type SafetyCautionProps = {
  /** What the danger is, e.g. "Fuel vapour" or "High-voltage system". */
  title: string;
  /** What to do or watch out for, one point each. */
  points: ReactNode[];
};

/**
 * A safety caution for a code, possible cause or plan. Amber belongs to these alone; the
 * closing sentence is always there and cannot be left out.
 */
export function SafetyCaution({ title, points }: SafetyCautionProps) {
  const titleId = useId();
  return (
    <section
      role="note"
      aria-labelledby={titleId}
      style={{
        display: 'flex',
        gap: 12,
        padding: '12px 16px',
        margin: '0 0 16px',
        background: caution.background,
        border: `1px solid ${caution.border}`,
        borderLeft: `6px solid ${caution.accent}`,
        borderRadius: 6,
        lineHeight: 1.6,
      }}
    >
      <WarningFilled aria-hidden style={{ color: caution.accent, fontSize: 24, marginTop: 2 }} />
      <div>
        <h3 id={titleId} style={{ margin: 0, fontSize: 17, fontWeight: 700, color: caution.text }}>
          Safety: {title}
        </h3>
        {points.length > 0 && (
          <ul style={{ margin: '4px 0 0', paddingLeft: 20 }}>
            {points.map((point, index) => (
              <li key={index}>{point}</li>
            ))}
          </ul>
        )}
        <p style={{ margin: '4px 0 0', fontWeight: 600 }}>{SAFETY_FOOTNOTE}</p>
      </div>
    </section>
  );
}
