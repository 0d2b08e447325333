import { CheckCircleFilled, CloseCircleFilled, EditOutlined } from '@ant-design/icons';
import { parseDtc, type DtcParseError, type DtcStructure } from '@causeway/shared';
import { Input, Typography } from 'antd';
import { useId, useMemo, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { palette } from '@/config/theme';
import { useCodeIndex } from '../api/get-code-index';
import { CodeStructure } from './code-structure';

type CodeEntryProps = {
  /** The visible label, which is also the field's accessible name. */
  label?: string;
  initialValue?: string;
  autoFocus?: boolean;
  /** Where Enter goes with a valid code; the code page by default. */
  onOpen?: (code: string, structure: DtcStructure) => void;
};

/** A rejection that only asks for more characters is shown calmly until the user presses Enter. */
function isIncomplete(error: DtcParseError): boolean {
  return error.position !== null && error.position > error.input.length;
}

/** The trimmed input with the character the rejection points at marked. */
function MarkedInput({ error }: { error: DtcParseError }) {
  const chars = Array.from(error.input);
  const at = error.position === null ? -1 : error.position - 1;
  return (
    <span aria-hidden style={{ fontFamily: 'ui-monospace, SFMono-Regular, Menlo, Consolas, monospace', fontSize: 18, letterSpacing: 1 }}>
      {chars.map((ch, i) => (
        <span
          key={i}
          style={
            i === at
              ? { color: palette.white, background: palette.red, borderRadius: 3, padding: '0 2px' }
              : { color: palette.grey900 }
          }
        >
          {ch === ' ' ? '\u00a0' : ch}
        </span>
      ))}
      {at >= chars.length && (
        <span style={{ borderBottom: `3px solid ${palette.grey600}`, marginLeft: 2 }}>{'\u00a0\u00a0'}</span>
      )}
    </span>
  );
}

/**
 * The field a technician types a fault code into, or copies from a scan tool: P0456, po456,
 * 04 56, 0456, P0456-13 or 04 56 13. It decodes as they type, in the browser, and says what it
 * corrected or why it cannot read the input. Enter opens the code page.
 */
export function CodeEntry({ label = 'Fault code', initialValue = '', autoFocus = false, onOpen }: CodeEntryProps) {
  const id = useId();
  const inputId = `${id}-input`;
  const hintId = `${id}-hint`;
  const resultId = `${id}-result`;
  const navigate = useNavigate();
  const [value, setValue] = useState(initialValue);
  const [attempted, setAttempted] = useState(false);
  const parsed = useMemo(() => (value.trim() ? parseDtc(value) : null), [value]);
  // Fetched only once a code reads, so a glance at the home page costs nothing.
  const index = useCodeIndex({ enabled: parsed?.ok === true });

  const known = parsed?.ok ? (index.data ?? []).filter((e) => e.code === parsed.value.code) : [];
  const showError = parsed !== null && !parsed.ok && (attempted || !isIncomplete(parsed.error));

  const open = () => {
    setAttempted(true);
    if (!parsed?.ok) return;
    const { value: structure } = parsed;
    if (onOpen) onOpen(structure.display, structure);
    else navigate(paths.code(structure.display));
  };

  return (
    <div>
      <label htmlFor={inputId} style={{ display: 'block', fontWeight: 600, fontSize: 17, marginBottom: 6 }}>
        {label}
      </label>
      <Input.Search
        id={inputId}
        value={value}
        onChange={(event) => {
          setValue(event.target.value);
          setAttempted(false);
        }}
        onSearch={open}
        placeholder="e.g. P0456, 04 56 or P0456-13"
        enterButton="Open"
        size="large"
        maxLength={40}
        autoFocus={autoFocus}
        autoComplete="off"
        autoCapitalize="characters"
        spellCheck={false}
        aria-invalid={showError || undefined}
        aria-describedby={`${hintId} ${resultId}`}
        style={{ maxWidth: 520 }}
      />
      <Typography.Paragraph id={hintId} type="secondary" style={{ margin: '6px 0 0' }}>
        Type it as your scan tool shows it; it is read as you type. Press Enter to open the code.
      </Typography.Paragraph>
      <div id={resultId} aria-live="polite" aria-atomic="true" style={{ marginTop: 12, minHeight: 32 }}>
        {parsed?.ok && (
          <div data-testid="code-entry-decoded">
            <div style={{ display: 'flex', alignItems: 'center', gap: 8, flexWrap: 'wrap', marginBottom: 4 }}>
              <CheckCircleFilled aria-hidden style={{ color: palette.green, fontSize: 18 }} />
              <Typography.Text strong style={{ fontSize: 20 }}>
                {parsed.value.display}
              </Typography.Text>
              <Typography.Text>
                {known.length > 0 ? known.map((e) => (e.make ? `${e.title} (${e.make})` : e.title)).join(' · ') : 'Not in the catalogue yet; the code is valid.'}
              </Typography.Text>
            </div>
            {parsed.value.corrections.map((c) => (
              <Typography.Paragraph key={c.position} style={{ margin: '0 0 4px', color: palette.teal700 }}>
                <EditOutlined aria-hidden /> Corrected: {c.message.replace(/^Position (\d+): (.*)$/, '$2 at position $1')} ({value.trim()} → {parsed.value.code})
              </Typography.Paragraph>
            ))}
            <CodeStructure structure={parsed.value} compact />
          </div>
        )}
        {parsed && !parsed.ok && (
          <div data-testid="code-entry-rejected" style={{ display: 'flex', gap: 8, alignItems: 'flex-start' }}>
            {showError ? (
              <CloseCircleFilled aria-hidden style={{ color: palette.red, fontSize: 18, marginTop: 4 }} />
            ) : (
              <EditOutlined aria-hidden style={{ color: palette.grey600, fontSize: 18, marginTop: 4 }} />
            )}
            <div>
              <MarkedInput error={parsed.error} />
              <Typography.Paragraph style={{ margin: '2px 0 0', color: showError ? palette.red : palette.grey700 }}>
                {showError ? 'Not a fault code: ' : 'Keep typing: '}
                {parsed.error.message}
              </Typography.Paragraph>
            </div>
          </div>
        )}
      </div>
    </div>
  );
}
