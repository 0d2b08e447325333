import { fromKm, type DistanceUnit, type ImportCorrection, type ImportDetected, type ImportPreviewRow, type ImportReport, type ImportRowProblem } from '@causeway/shared';
import { Descriptions, Table, Tag, Typography, type TableColumnsType } from 'antd';
import { formatDateTime } from '@/utils/format';
import { DELIMITER_LABELS, ENCODING_LABELS, LINE_ENDING_LABELS } from '../utils/mapping';

const n = (value: number, locale: string) => new Intl.NumberFormat(locale).format(value);

/** Separator, encoding, line endings and headers as the server read them. */
export function DetectedPanel({ detected }: { detected: ImportDetected }) {
  return (
    <Descriptions
      column={{ xs: 1, md: 3 }}
      items={[
        { key: 'delimiter', label: 'Separator', children: DELIMITER_LABELS[detected.delimiter] ?? detected.delimiter },
        { key: 'encoding', label: 'Encoding', children: ENCODING_LABELS[detected.encoding] ?? detected.encoding },
        { key: 'lines', label: 'Line endings', children: LINE_ENDING_LABELS[detected.lineEnding] ?? detected.lineEnding },
        {
          key: 'headers',
          label: `Columns (${detected.headers.length})`,
          span: 'filled',
          children: (
            <span>
              {detected.headers.map((h, i) => (
                <Tag key={`${h}-${i}`}>{h || '(no header)'}</Tag>
              ))}
            </span>
          ),
        },
      ]}
    />
  );
}

/** The counts of a dry run or a commit. */
export function ReportSummary({ report, locale }: { report: ImportReport; locale: string }) {
  const verb = report.committed ? 'Created' : 'Would create';
  return (
    <Descriptions
      bordered
      size="small"
      column={{ xs: 1, sm: 2, lg: 4 }}
      items={[
        { key: 'rows', label: 'Rows', children: n(report.rows, locale) },
        { key: 'accepted', label: 'Without errors', children: n(report.accepted, locale) },
        { key: 'rejected', label: 'With errors', children: <span data-testid="rejected-count">{n(report.rejected, locale)}</span> },
        { key: 'duplicates', label: 'Already imported', children: n(report.skippedDuplicates, locale) },
        { key: 'vehicles', label: `${verb}: vehicles`, children: n(report.createdVehicles, locale) },
        { key: 'updated', label: 'Odometer updated', children: n(report.updatedVehicles, locale) },
        { key: 'jobs', label: `${verb}: jobs`, children: n(report.createdJobs, locale) },
        { key: 'codes', label: `${verb}: codes`, children: n(report.createdCodes, locale) },
      ]}
    />
  );
}

function capped(shown: number, total: number, what: string, locale: string): string | null {
  return total > shown ? `Showing the first ${n(shown, locale)} of ${n(total, locale)} ${what}.` : null;
}

/** Every problem, named by line and column. */
export function ProblemsTable({ problems, total, locale }: { problems: ImportRowProblem[]; total: number; locale: string }) {
  const columns: TableColumnsType<ImportRowProblem> = [
    { title: 'Line', key: 'line', width: 90, render: (_: unknown, p) => n(p.line, locale) },
    { title: 'Column', key: 'column', render: (_: unknown, p) => <Typography.Text strong>{p.column}</Typography.Text> },
    { title: 'Problem', key: 'message', render: (_: unknown, p) => p.message },
    {
      title: 'Effect',
      key: 'severity',
      render: (_: unknown, p) => (p.severity === 'error' ? <Tag color="error">Row rejected</Tag> : <Tag>Warning only</Tag>),
    },
  ];
  const note = capped(problems.length, total, 'problems', locale);
  return (
    <>
      {note && <Typography.Paragraph type="secondary">{note}</Typography.Paragraph>}
      <Table<ImportRowProblem>
        rowKey={(p) => `${p.line}|${p.column}|${p.message}`}
        size="small"
        columns={columns}
        dataSource={[...problems].sort((a, b) => a.line - b.line)}
        pagination={problems.length > 50 ? { pageSize: 50, showSizeChanger: false } : false}
        scroll={{ x: 'max-content' }}
        locale={{ emptyText: 'No problems' }}
      />
    </>
  );
}

/** Values read in a form the codec or VIN rules accept, and what they were read as. */
export function CorrectionsTable({ corrections, total, locale }: { corrections: ImportCorrection[]; total: number; locale: string }) {
  const columns: TableColumnsType<ImportCorrection> = [
    { title: 'Line', key: 'line', width: 90, render: (_: unknown, c) => n(c.line, locale) },
    { title: 'Column', key: 'column', render: (_: unknown, c) => c.column },
    { title: 'Written', key: 'from', render: (_: unknown, c) => <Typography.Text code>{c.from}</Typography.Text> },
    { title: 'Read as', key: 'to', render: (_: unknown, c) => <Typography.Text code strong>{c.to}</Typography.Text> },
  ];
  const note = capped(corrections.length, total, 'corrections', locale);
  return (
    <>
      {note && <Typography.Paragraph type="secondary">{note}</Typography.Paragraph>}
      <Table<ImportCorrection>
        rowKey={(c) => `${c.line}|${c.column}|${c.from}`}
        size="small"
        columns={columns}
        dataSource={[...corrections].sort((a, b) => a.line - b.line)}
        pagination={corrections.length > 50 ? { pageSize: 50, showSizeChanger: false } : false}
        scroll={{ x: 'max-content' }}
      />
    </>
  );
}

/** The first rows as they would be stored. */
export function PreviewTable({ rows, locale, distanceUnit }: { rows: ImportPreviewRow[]; locale: string; distanceUnit: DistanceUnit }) {
  const columns: TableColumnsType<ImportPreviewRow> = [
    { title: 'Line', key: 'line', render: (_: unknown, r) => n(r.line, locale) },
    {
      title: 'State',
      key: 'state',
      render: (_: unknown, r) => (!r.valid ? <Tag color="error">Rejected</Tag> : r.duplicate ? <Tag>Already imported</Tag> : <Tag color="success">Ready</Tag>),
    },
    { title: 'VIN', key: 'vin', render: (_: unknown, r) => (r.vin ? <Typography.Text code>{r.vin}</Typography.Text> : '—') },
    { title: 'Vehicle', key: 'vehicle', render: (_: unknown, r) => [r.make, r.model].filter(Boolean).join(' ') || '—' },
    { title: 'Scanned', key: 'scannedAt', render: (_: unknown, r) => (r.scannedAt ? formatDateTime(r.scannedAt, locale) : '—') },
    {
      title: `Odometer (${distanceUnit})`,
      key: 'odometer',
      align: 'right',
      render: (_: unknown, r) => (r.odometerKm === null ? '—' : n(Math.round(fromKm(r.odometerKm, distanceUnit)), locale)),
    },
    { title: 'Module', key: 'module', render: (_: unknown, r) => r.module ?? '—' },
    { title: 'Code', key: 'code', render: (_: unknown, r) => (r.code ? <Typography.Text code strong>{r.code}</Typography.Text> : '—') },
    { title: 'Status', key: 'status', render: (_: unknown, r) => r.status ?? '—' },
    { title: 'Description', key: 'description', render: (_: unknown, r) => r.description ?? '' },
    {
      title: 'Freeze frame',
      key: 'ff',
      render: (_: unknown, r) =>
        Object.keys(r.freezeFrame).length === 0
          ? ''
          : Object.entries(r.freezeFrame)
              .map(([k, v]) => `${k}: ${typeof v === 'number' ? n(v, locale) : v}`)
              .join('; '),
    },
  ];
  return <Table<ImportPreviewRow> rowKey="line" size="small" columns={columns} dataSource={rows} pagination={false} scroll={{ x: 'max-content' }} />;
}
