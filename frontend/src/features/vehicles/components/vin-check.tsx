import { CheckCircleFilled, CloseCircleFilled, InfoCircleFilled } from '@ant-design/icons';
import { validateVin, type VinIssue, type VinResult } from '@causeway/shared';
import { Flex, Typography } from 'antd';
import { useMemo, type ReactNode } from 'react';
import { palette } from '@/config/theme';

type VinCheckProps = { value: string | undefined };

const CHECK_POSITION = 9;
const YEAR_POSITION = 10;

function Line({ tone, children }: { tone: 'ok' | 'error' | 'note'; children: ReactNode }) {
  const icon =
    tone === 'ok' ? (
      <CheckCircleFilled aria-hidden style={{ color: palette.green }} />
    ) : tone === 'error' ? (
      <CloseCircleFilled aria-hidden style={{ color: palette.red }} />
    ) : (
      <InfoCircleFilled aria-hidden style={{ color: palette.slate }} />
    );
  return (
    <li style={{ display: 'flex', gap: 8, alignItems: 'baseline' }}>
      {icon}
      <span>{children}</span>
    </li>
  );
}

/** The 17 characters as cells numbered by position; the positions at fault are marked. */
function VinCells({ result }: { result: VinResult }) {
  const chars = Array.from(result.vin).slice(0, 24);
  const byPosition = new Map<number, VinIssue['severity']>();
  for (const issue of result.issues) {
    if (issue.position !== null && byPosition.get(issue.position) !== 'error') byPosition.set(issue.position, issue.severity);
  }
  return (
    <div aria-hidden style={{ display: 'flex', flexWrap: 'wrap', gap: 3, margin: '4px 0 8px' }}>
      {chars.map((ch, i) => {
        const position = i + 1;
        const severity = byPosition.get(position);
        const special = position === CHECK_POSITION || position === YEAR_POSITION;
        return (
          <span
            key={position}
            style={{
              display: 'inline-flex',
              flexDirection: 'column',
              alignItems: 'center',
              minWidth: 26,
              padding: '2px 0',
              borderRadius: 4,
              border: `${severity === 'warning' ? '2px dashed' : severity === 'error' ? '2px solid' : '1px solid'} ${
                severity === 'error' ? palette.red : severity === 'warning' ? palette.slate : special ? palette.teal300 : palette.grey300
              }`,
              background: severity === 'error' ? '#fbeceb' : special ? palette.teal50 : palette.white,
              fontFamily: 'ui-monospace, SFMono-Regular, Menlo, monospace',
            }}
          >
            <span style={{ fontSize: 16, fontWeight: 600 }}>{ch}</span>
            <span style={{ fontSize: 11, color: palette.grey600 }}>{position}</span>
          </span>
        );
      })}
    </div>
  );
}

/**
 * The VIN checked as it is typed, with the shared rules the server applies: length and
 * characters, the check digit of position 9 (49 CFR 565.15) and the model year of position 10.
 * Errors stop the save; warnings do not.
 */
export function VinCheck({ value }: VinCheckProps) {
  const result = useMemo(() => validateVin(value ?? ''), [value]);
  if (!value || value.trim() === '') return null;
  const errors = result.issues.filter((i) => i.severity === 'error' && i.position !== CHECK_POSITION);
  const warnings = result.issues.filter((i) => i.severity === 'warning' && i.position !== CHECK_POSITION && i.position !== YEAR_POSITION);
  const checkIssue = result.issues.find((i) => i.position === CHECK_POSITION);
  const { checkDigit } = result;
  const yearCode = result.vin.length >= YEAR_POSITION ? result.vin[YEAR_POSITION - 1] : null;

  return (
    <div data-testid="vin-check" style={{ marginTop: -8, marginBottom: 16 }}>
      <VinCells result={result} />
      <ul aria-live="polite" style={{ listStyle: 'none', padding: 0, margin: 0, lineHeight: 1.6 }}>
        {result.valid ? (
          <Line tone="ok">{warnings.length || checkIssue ? 'A valid VIN, with notes below.' : 'A valid VIN.'}</Line>
        ) : (
          errors.map((issue, i) => (
            <Line key={`e${i}`} tone="error">
              {issue.message}
            </Line>
          ))
        )}
        {checkDigit && (
          <Line tone={checkIssue ? (checkIssue.severity === 'error' ? 'error' : 'note') : 'ok'}>
            {checkIssue
              ? `${checkIssue.severity === 'warning' ? 'Warning — ' : ''}${checkIssue.message}.`
              : `Check digit (position 9): '${checkDigit.actual}' matches the other characters.`}{' '}
            <Typography.Text type="secondary">
              {checkDigit.applies
                ? 'North-American (or Chinese) VIN: the check digit must match.'
                : 'Made for another market: a check digit is not required.'}
            </Typography.Text>
          </Line>
        )}
        {checkDigit && yearCode && (
          <Line tone={result.modelYear !== null ? 'ok' : 'note'}>
            {result.modelYear !== null
              ? `Model year from position 10 ('${yearCode}'): ${result.modelYear}.`
              : result.modelYearCandidates.length > 0
                ? `Position 10 ('${yearCode}') could mean ${result.modelYearCandidates.join(' or ')}.`
                : `Position 10 ('${yearCode}') is not a model-year code (U, Z and 0 are not used there).`}
          </Line>
        )}
        {warnings.map((issue, i) => (
          <Line key={`w${i}`} tone="note">
            Warning — {issue.message}
          </Line>
        ))}
      </ul>
      {result.vin.length > 0 && (
        <Flex gap={8}>
          <Typography.Text type="secondary" style={{ fontSize: 14 }}>
            {result.vin.length} of 17 characters
          </Typography.Text>
        </Flex>
      )}
    </div>
  );
}

/** The first error of a VIN, for the form rule; null when the VIN may be saved. */
export function vinError(value: string | undefined): string | null {
  const result = validateVin(value ?? '');
  return result.issues.find((i) => i.severity === 'error')?.message ?? null;
}
