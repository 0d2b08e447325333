import { CheckCircleFilled, InfoCircleFilled } from '@ant-design/icons';
import { parseDtc } from '@causeway/shared';
import { Typography } from 'antd';
import { palette } from '@/config/theme';

type CodeFeedbackProps = { value: string | undefined };

const FORM_NOTES: Record<string, string> = {
  hex2: 'read as the two bytes a scan tool reports',
  hex3: 'read as two bytes and a failure-type byte',
  'text-ftb': 'with a failure-type byte',
};

/**
 * What the shared codec made of a typed code: its normal form, and every correction it made
 * (letter O for digit 0, hexadecimal bytes) said out loud rather than done silently.
 */
export function CodeFeedback({ value }: CodeFeedbackProps) {
  const text = value?.trim() ?? '';
  if (!text) return null;
  const parsed = parseDtc(text);
  if (!parsed.ok) return null;
  const { display, corrections, inputForm, failureType } = parsed.value;
  const changed = display !== text.toUpperCase() || corrections.length > 0;
  return (
    <div aria-live="polite" style={{ lineHeight: 1.5 }}>
      <Typography.Text>
        {changed ? <InfoCircleFilled aria-hidden style={{ color: palette.teal600 }} /> : <CheckCircleFilled aria-hidden style={{ color: palette.green }} />}{' '}
        Saved as <strong style={{ fontFamily: 'ui-monospace, SFMono-Regular, Menlo, monospace' }}>{display}</strong>
        {FORM_NOTES[inputForm] ? ` (${FORM_NOTES[inputForm]})` : ''}
        {failureType ? ` — ${failureType.description ?? failureType.category}` : ''}
      </Typography.Text>
      {corrections.length > 0 && (
        <ul style={{ margin: '2px 0 0', paddingLeft: 22 }}>
          {corrections.map((c) => (
            <li key={c.position}>Corrected: {c.message}</li>
          ))}
        </ul>
      )}
    </div>
  );
}

/** The codec's reason a code cannot be read, for the form rule; null when it can. */
export function codeError(value: string | undefined): string | null {
  const text = value?.trim() ?? '';
  if (!text) return null;
  const parsed = parseDtc(text);
  return parsed.ok ? null : parsed.error.message;
}
