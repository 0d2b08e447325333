import { parseDtc } from '@causeway/shared';
import { Form, Input, Typography } from 'antd';
import { useDecodedCode } from '../api/decode-code';

/** The code as the shared codec reads it, or null while it is not a valid code. */
export function useParsedCode(input: string | undefined): string | null {
  const parsed = parseDtc(input ?? '');
  return parsed.ok ? parsed.value.code : null;
}

function CodeReading({ input }: { input: string | undefined }) {
  const parsed = parseDtc(input ?? '');
  const code = parsed.ok ? parsed.value.code : null;
  const decoded = useDecodedCode(code);
  if (!parsed.ok) return null;
  const { value } = parsed;
  const corrected = value.corrections.length > 0 || value.inputForm !== 'text' || value.code !== (input ?? '').trim();
  return (
    <div aria-live="polite" data-testid="code-reading">
      {corrected && (
        <Typography.Text>
          Read as <Typography.Text strong>{value.display}</Typography.Text>
          {value.corrections.length > 0 && `: ${value.corrections.map((c) => c.message).join('; ')}`}
          {value.inputForm === 'hex2' || value.inputForm === 'hex3' ? ` (from the bytes ${value.bytes})` : ''}.{' '}
        </Typography.Text>
      )}
      {decoded.data?.known ? (
        <Typography.Text type="secondary">{decoded.data.known.title}</Typography.Text>
      ) : decoded.data ? (
        <Typography.Text type="secondary">{value.code} is a valid code that is not in the catalogue yet: you may propose its title below.</Typography.Text>
      ) : null}
    </div>
  );
}

/** The fault code, checked with the same codec the server uses; corrections are shown, never silent. */
export function CodeField() {
  const input = Form.useWatch<string | undefined>('code');
  const code = useParsedCode(input);
  const decoded = useDecodedCode(code);
  return (
    <>
      <Form.Item
        name="code"
        label="Fault code"
        extra={<CodeReading input={input} />}
        rules={[
          {
            validator: async (_rule, value: string | undefined) => {
              const parsed = parseDtc(value ?? '');
              if (!parsed.ok) throw new Error(parsed.error.message);
            },
          },
        ]}
        style={{ maxWidth: 420 }}
      >
        <Input placeholder="e.g. P0456, or its bytes 04 56" autoComplete="off" spellCheck={false} autoCapitalize="characters" />
      </Form.Item>
      {decoded.data && !decoded.data.known && (
        <Form.Item name="codeTitle" label="Proposed title of the code" extra="The moderator checks it before the code joins the catalogue." style={{ maxWidth: 640 }}>
          <Input maxLength={200} />
        </Form.Item>
      )}
    </>
  );
}
