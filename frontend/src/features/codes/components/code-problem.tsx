import { Alert, Card, Typography } from 'antd';
import { palette } from '@/config/theme';
import type { CodeLookupProblem } from '../utils/code-error';
import { CodeEntry } from './code-entry';
import { CodeStructure } from './code-structure';

type CodeProblemProps = {
  /** The code as it is in the address. */
  code: string;
  problem: CodeLookupProblem;
  /** The make asked about, when the catalogue may hold the code for another one. */
  make?: string;
};

/** A code page without a catalogue entry: a valid code not in the catalogue, something that is not a code, or a failed load. */
export function CodeProblem({ code, problem, make }: CodeProblemProps) {
  if (problem.kind === 'not-in-catalogue') {
    return (
      <Card>
        <section aria-labelledby="code-not-in-catalogue">
          <Typography.Title level={2} id="code-not-in-catalogue" style={{ fontSize: 22, marginTop: 0 }}>
            {problem.structure.code} is a valid code, but not in the catalogue{make ? ` for ${make}` : ''}
          </Typography.Title>
          <Typography.Paragraph style={{ fontSize: 17 }}>
            Causeway has no meaning, possible causes or fix path for it yet. Here is what its characters say; the maker&apos;s
            service information names the fault.
            {make ? ' Choosing "Any vehicle" above shows the meaning for every make, where there is one.' : ''}
          </Typography.Paragraph>
          <div style={{ maxWidth: 720 }}>
            <CodeStructure structure={problem.structure} />
          </div>
        </section>
      </Card>
    );
  }
  if (problem.kind === 'invalid') {
    const { reason } = problem;
    return (
      <Card>
        <section aria-labelledby="code-invalid">
          <Typography.Title level={2} id="code-invalid" style={{ fontSize: 22, marginTop: 0 }}>
            &quot;{code}&quot; is not a fault code
          </Typography.Title>
          <Typography.Paragraph style={{ fontSize: 17, color: palette.red }} data-testid="code-invalid-reason">
            {reason.message}
          </Typography.Paragraph>
          <Typography.Paragraph>
            A fault code is a letter (P, C, B or U) and four characters, such as P0456; a scan tool may show it as bytes, such as
            04 56. Try again:
          </Typography.Paragraph>
          <CodeEntry label="Fault code" initialValue={code} />
        </section>
      </Card>
    );
  }
  return <Alert type="error" showIcon title={problem.message} />;
}
