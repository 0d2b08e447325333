import type { DtcStructure } from '@causeway/shared';
import { Descriptions, Typography } from 'antd';

const INPUT_FORMS: Record<DtcStructure['inputForm'], string> = {
  text: 'the five-character code',
  'text-ftb': 'the code with a failure-type byte',
  hex2: 'two bytes in hexadecimal, as a scan tool reads them',
  hex3: 'three bytes in hexadecimal, the third the failure type',
};

type CodeStructureProps = {
  structure: DtcStructure;
  /** The code's own subsystem from the catalogue, which wins over the range's default group. */
  subsystem?: string;
  /** Fewer rows, for the preview under the code entry. */
  compact?: boolean;
};

/** What the characters of a code say: system, who controls the range, group, bytes, failure type. */
export function CodeStructure({ structure, subsystem, compact = false }: CodeStructureProps) {
  const { failureType } = structure;
  const items = [
    { key: 'system', label: 'System', children: `${structure.systemName} (${structure.system})` },
    {
      key: 'control',
      label: 'Who controls it',
      children: (
        <>
          {structure.controlLabel}
          {structure.controlNote && (
            <Typography.Text type="secondary" style={{ display: 'block' }}>
              {structure.controlNote}
            </Typography.Text>
          )}
        </>
      ),
    },
    {
      key: 'group',
      label: subsystem ? 'Subsystem' : 'Group',
      children:
        subsystem && subsystem !== structure.group ? (
          <>
            {subsystem}
            <Typography.Text type="secondary" style={{ display: 'block' }}>
              The range&apos;s default group: {structure.group}
            </Typography.Text>
          </>
        ) : (
          structure.group
        ),
    },
    { key: 'bytes', label: 'Bytes (hex)', children: <Typography.Text code>{structure.bytes}</Typography.Text> },
  ];
  if (failureType) {
    items.push({
      key: 'failure-type',
      label: 'Failure type',
      children: (
        <>
          <Typography.Text code>{failureType.hex}</Typography.Text> {failureType.category}
          {failureType.description && failureType.description !== failureType.category ? `: ${failureType.description}` : ''}
        </>
      ),
    });
  }
  if (!compact) {
    items.push({ key: 'read-as', label: 'Read as', children: INPUT_FORMS[structure.inputForm] });
  }
  return <Descriptions size="small" column={1} bordered={!compact} items={items} styles={{ label: { width: compact ? 150 : 200 } }} />;
}
