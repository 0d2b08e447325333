import { InboxOutlined } from '@ant-design/icons';
import { IMPORT_LIMITS, type DistanceUnit, type FieldError, type ImportMapping, type ImportMissingColumnsDetails, type ImportReport } from '@causeway/shared';
import { useQueryClient } from '@tanstack/react-query';
import { Alert, Button, Card, Flex, Result, Steps, Typography, Upload } from 'antd';
import { useRef, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { isApiError } from '@/lib/api-client';
import { useImport } from '../api/get-import';
import { IMPORTS_QUERY_KEY } from '../api/get-imports';
import { runImport } from '../api/run-import';
import { emptyMapping, sameMapping, toInput } from '../utils/mapping';
import { newUuid } from '../utils/xhr-upload';
import { ImportProgress } from './import-progress';
import { MappingEditor } from './mapping-editor';
import { CorrectionsTable, DetectedPanel, PreviewTable, ProblemsTable, ReportSummary } from './report-panels';

type ImportWizardProps = {
  distanceUnit: DistanceUnit;
  locale: string;
  importPath: (id: string) => string;
};

type Phase = 'idle' | 'checking' | 'committing';

interface Failure {
  message: string;
  errors: FieldError[];
}

const MB = Math.round(IMPORT_LIMITS.maxBytes / (1024 * 1024));

function failureOf(error: unknown): Failure {
  if (isApiError(error)) return { message: error.message, errors: error.fieldErrors };
  return { message: error instanceof Error ? error.message : 'Something went wrong. Try again.', errors: [] };
}

function missingColumnsOf(error: unknown): ImportMissingColumnsDetails | null {
  if (!isApiError(error)) return null;
  const details = error.body.details as Partial<ImportMissingColumnsDetails> | undefined;
  return details && Array.isArray(details.headers) && Array.isArray(details.missing) ? { headers: details.headers, missing: details.missing } : null;
}

function FailureAlert({ failure }: { failure: Failure }) {
  const messages = failure.errors.length ? failure.errors.map((e) => `${e.field === 'file' ? 'The file' : e.field}: ${e.message}`) : [failure.message];
  return (
    <Alert
      type="error"
      showIcon
      role="alert"
      title="The file cannot be imported as it is"
      description={
        <ul style={{ margin: 0, paddingLeft: 20 }}>
          {messages.map((m, i) => (
            <li key={i}>{m}</li>
          ))}
        </ul>
      }
      style={{ marginBottom: 16 }}
    />
  );
}

/** Upload → detect → map → preview → commit, with a progress bar for the upload and the commit. */
export function ImportWizard({ distanceUnit, locale, importPath }: ImportWizardProps) {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const [file, setFile] = useState<File | null>(null);
  const [phase, setPhase] = useState<Phase>('idle');
  const [uploaded, setUploaded] = useState(0);
  const [failure, setFailure] = useState<Failure | null>(null);
  const [checked, setChecked] = useState<ImportReport | null>(null);
  /** The mapping sent with the last successful check; a commit uses it. */
  const [checkedMapping, setCheckedMapping] = useState<ImportMapping | null>(null);
  const [mapping, setMapping] = useState<ImportMapping | null>(null);
  /** When the file's required columns were not found: its headers, to map them by hand. */
  const [headersOnly, setHeadersOnly] = useState<string[] | null>(null);
  const [commitId, setCommitId] = useState<string | null>(null);
  const [result, setResult] = useState<ImportReport | null>(null);
  const controller = useRef<AbortController | null>(null);
  const polling = useImport(commitId ?? '', { enabled: phase === 'committing' && commitId !== null && uploaded >= 100, intervalMs: 500 });

  function reset(next: File | null) {
    controller.current?.abort();
    setFile(next);
    setPhase('idle');
    setUploaded(0);
    setFailure(null);
    setChecked(null);
    setCheckedMapping(null);
    setMapping(null);
    setHeadersOnly(null);
    setCommitId(null);
    setResult(null);
  }

  /** What to send: the whole editor after a check; after missing columns only what the user chose. */
  function mappingToSend() {
    if (!mapping) return undefined;
    if (headersOnly) {
      const input = toInput(mapping);
      const columns = Object.fromEntries(Object.entries(input.columns ?? {}).filter(([, h]) => h !== null));
      return { ...input, columns, freezeFrame: mapping.freezeFrame.length ? mapping.freezeFrame : undefined };
    }
    return toInput(mapping);
  }

  async function check() {
    if (!file) return;
    controller.current = new AbortController();
    setPhase('checking');
    setUploaded(0);
    setFailure(null);
    try {
      const report = await runImport({ file, dryRun: true, mapping: mappingToSend(), onProgress: (p) => setUploaded(p.total ? Math.round((p.loaded / p.total) * 100) : 0), signal: controller.current.signal });
      setChecked(report);
      setCheckedMapping(report.detected.mapping);
      setMapping(report.detected.mapping);
      setHeadersOnly(null);
    } catch (error) {
      if (error instanceof DOMException && error.name === 'AbortError') return;
      const missing = missingColumnsOf(error);
      if (missing) {
        setHeadersOnly(missing.headers);
        setMapping((m) => m ?? emptyMapping());
        setChecked(null);
      }
      setFailure(failureOf(error));
    } finally {
      setPhase('idle');
    }
  }

  async function commit(validOnly: boolean) {
    if (!file || !checkedMapping) return;
    const id = newUuid();
    controller.current = new AbortController();
    setCommitId(id);
    setPhase('committing');
    setUploaded(0);
    setFailure(null);
    try {
      const report = await runImport({
        file,
        dryRun: false,
        validOnly,
        id,
        mapping: toInput(checkedMapping),
        onProgress: (p) => setUploaded(p.total ? Math.round((p.loaded / p.total) * 100) : 0),
        signal: controller.current.signal,
      });
      setResult(report);
    } catch (error) {
      if (error instanceof DOMException && error.name === 'AbortError') return;
      setFailure(failureOf(error));
    } finally {
      setPhase('idle');
      void queryClient.invalidateQueries({ queryKey: IMPORTS_QUERY_KEY });
    }
  }

  const step = result ? 2 : checked ? 1 : 0;
  const dirty = !!(mapping && checked && !sameMapping(mapping, checked.detected.mapping));
  const headers = checked?.detected.headers ?? headersOnly;

  return (
    <Flex vertical gap={24}>
      <Steps
        current={step}
        items={[{ title: 'Choose the file' }, { title: 'Check the columns and rows' }, { title: 'Import' }]}
        style={{ maxWidth: 760 }}
      />

      {result ? (
        <Card>
          <Result
            status={result.committed ? 'success' : 'error'}
            title={
              result.committed
                ? `Imported ${result.fileName}: ${result.createdJobs} ${result.createdJobs === 1 ? 'job' : 'jobs'} and ${result.createdCodes} ${result.createdCodes === 1 ? 'code' : 'codes'}`
                : `${result.fileName} was not imported`
            }
            subTitle={
              result.committed
                ? `${result.createdVehicles} new ${result.createdVehicles === 1 ? 'vehicle' : 'vehicles'}, ${result.skippedDuplicates} ${result.skippedDuplicates === 1 ? 'row was' : 'rows were'} already imported${result.rejected ? `, ${result.rejected} rejected ${result.rejected === 1 ? 'row was' : 'rows were'} left out` : ''}.`
                : 'The file has rows with errors; nothing was written.'
            }
            extra={[
              result.importId ? (
                <Button key="report" type="primary" onClick={() => navigate(importPath(result.importId ?? ''))}>
                  Open the import report
                </Button>
              ) : null,
              <Button key="again" onClick={() => reset(null)}>
                Import another file
              </Button>,
            ]}
          />
          <ReportSummary report={result} locale={locale} />
        </Card>
      ) : (
        <Card title="Scan-tool export">
          <Typography.Paragraph type="secondary">
            A CSV file separated by commas, semicolons or tabs, in UTF-8 (with or without a byte-order mark), of at most {MB} MB and{' '}
            {new Intl.NumberFormat(locale).format(IMPORT_LIMITS.maxRows)} rows. It needs a VIN, a fault code and a scan date on every row. Nothing is written until you import it.
          </Typography.Paragraph>
          <Upload.Dragger
            accept=".csv,.txt,.tsv,text/csv,text/plain,text/tab-separated-values"
            multiple={false}
            maxCount={1}
            disabled={phase !== 'idle'}
            fileList={file ? [{ uid: 'csv', name: file.name, size: file.size, status: 'done' }] : []}
            beforeUpload={(chosen) => {
              reset(chosen);
              if (chosen.size > IMPORT_LIMITS.maxBytes) setFailure({ message: `The file is larger than ${MB} MB, the limit for one import; split it into smaller files.`, errors: [] });
              return false;
            }}
            onRemove={() => {
              reset(null);
              return true;
            }}
            style={{ maxWidth: 640 }}
          >
            <p className="ant-upload-drag-icon">
              <InboxOutlined aria-hidden />
            </p>
            <p className="ant-upload-text">Click or drop the CSV export here</p>
          </Upload.Dragger>
          <Flex gap={12} wrap style={{ marginTop: 16 }}>
            <Button type="primary" size="large" disabled={!file || phase !== 'idle' || (file?.size ?? 0) > IMPORT_LIMITS.maxBytes} loading={phase === 'checking'} onClick={() => void check()}>
              {checked || headersOnly ? 'Check again' : 'Check the file'}
            </Button>
            {phase !== 'idle' && (
              <Button size="large" onClick={() => controller.current?.abort()}>
                Cancel
              </Button>
            )}
          </Flex>
          {phase === 'checking' && (
            <div style={{ marginTop: 16 }}>
              <ImportProgress uploaded={uploaded} afterUpload="Checking every row and rehearsing the import…" locale={locale} />
            </div>
          )}
        </Card>
      )}

      {failure && <FailureAlert failure={failure} />}

      {!result && headers && mapping && (
        <Card title="Columns" extra={checked && <Typography.Text type="secondary">Detected from the header line</Typography.Text>}>
          {checked && <DetectedPanel detected={checked.detected} />}
          <MappingEditor headers={headers} mapping={mapping} onChange={setMapping} distanceUnit={distanceUnit} locale={locale} />
          {(dirty || headersOnly) && (
            <Flex gap={12} align="center" wrap style={{ marginTop: 16 }}>
              <Button type="primary" onClick={() => void check()} loading={phase === 'checking'} disabled={phase !== 'idle'}>
                Check again with these columns
              </Button>
              <Typography.Text type="secondary">The preview below is from the columns as they were.</Typography.Text>
            </Flex>
          )}
        </Card>
      )}

      {!result && checked && (
        <>
          <Card title="What importing would do">
            <ReportSummary report={checked} locale={locale} />
          </Card>
          <Card title={`Problems (${checked.problemsTotal})`}>
            {checked.problemsTotal === 0 ? <Typography.Text>No problems: every row can be imported.</Typography.Text> : <ProblemsTable problems={checked.problems} total={checked.problemsTotal} locale={locale} />}
          </Card>
          {checked.correctionsTotal > 0 && (
            <Card title={`Corrections (${checked.correctionsTotal})`}>
              <Typography.Paragraph type="secondary">Values written in another form the rules accept, and how they will be stored.</Typography.Paragraph>
              <CorrectionsTable corrections={checked.corrections} total={checked.correctionsTotal} locale={locale} />
            </Card>
          )}
          <Card title={`Preview: the first ${checked.preview.length} ${checked.preview.length === 1 ? 'row' : 'rows'}`}>
            <PreviewTable rows={checked.preview} locale={locale} distanceUnit={distanceUnit} />
          </Card>
          <Card title="Import">
            {checked.rejected > 0 && (
              <Alert
                type="error"
                showIcon
                title={`${checked.rejected} of ${checked.rows} ${checked.rows === 1 ? 'row has' : 'rows have'} errors`}
                description="Importing the whole file is refused while any row has an error. Fix the file and check it again, or import the valid rows only."
                style={{ marginBottom: 16 }}
              />
            )}
            {dirty && <Alert type="info" showIcon title="Check the file again with the changed columns before importing." style={{ marginBottom: 16 }} />}
            <Flex gap={12} wrap>
              {checked.rejected === 0 ? (
                <Button type="primary" size="large" disabled={dirty || phase !== 'idle'} loading={phase === 'committing'} onClick={() => void commit(false)}>
                  Import the file
                </Button>
              ) : (
                <Button type="primary" size="large" disabled={dirty || phase !== 'idle' || checked.accepted === 0} loading={phase === 'committing'} onClick={() => void commit(true)}>
                  Import the {checked.accepted} valid {checked.accepted === 1 ? 'row' : 'rows'} only
                </Button>
              )}
            </Flex>
            {phase === 'committing' && (
              <div style={{ marginTop: 16 }}>
                <ImportProgress uploaded={uploaded} server={polling.data?.progress ?? null} afterUpload="Importing…" locale={locale} />
              </div>
            )}
          </Card>
        </>
      )}
    </Flex>
  );
}
