import { formatMoney, formatPercent, type CreateStepRequest, type JobDto, type StepKind, type StepResult } from '@causeway/shared';
import { Alert, App, Button, Col, Form, Input, InputNumber, Radio, Row, Select, Typography } from 'antd';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { currencyFractionDigits, fromMinorUnits, toMinorUnits } from '@/utils/money';
import { useCreateStep } from '../api/create-step';
import { JOBS_QUERY_KEY } from '../api/get-jobs';
import { creditShares, listNames, plannedStepCostMinor } from '../utils/fix-path';

interface StepValues {
  code: string;
  kind: StepKind;
  parts: string[] | string | undefined;
  result?: StepResult;
  cost?: string;
  notes?: string;
}

type StepFormProps = {
  job: JobDto;
  onRecorded?: (job: JobDto) => void;
  /** Told when the server says the job is closed (409), so the page can show it. */
  onClosedConflict?: (message: string) => void;
};

const RESULTS: Record<StepKind, Array<{ value: StepResult; label: string }>> = {
  check: [
    { value: 'not-at-fault', label: 'Not at fault' },
    { value: 'at-fault', label: 'At fault' },
  ],
  replace: [
    { value: 'came-back', label: 'Code came back' },
    { value: 'cleared', label: 'Code cleared' },
  ],
};

const LABELS = { code: 'Code', kind: 'What was done', parts: 'Part', result: 'Result', actualCostMinor: 'Actual cost', notes: 'Notes', at: 'Time' };

function partsOf(value: StepValues['parts']): string[] {
  if (value === undefined) return [];
  return Array.isArray(value) ? value : [value];
}

/**
 * Records what was done: a check of one part (at fault or not) or a replacement of one or
 * more parts together (the code cleared or came back), with what it actually cost.
 */
export function StepForm({ job, onRecorded, onClosedConflict }: StepFormProps) {
  const { message } = App.useApp();
  const [form] = Form.useForm<StepValues>();
  const [alert, setAlert] = useState<string | null>(null);
  const [costTouched, setCostTouched] = useState(false);
  const workable = job.codes.filter((c) => c.fixPath !== null);
  const firstCode = (workable[0] ?? job.codes[0])?.code ?? '';
  const code = (Form.useWatch('code', form) as string | undefined) ?? firstCode;
  const kind = (Form.useWatch('kind', form) as StepKind | undefined) ?? 'check';
  const parts = partsOf(Form.useWatch('parts', form) as StepValues['parts']);
  const result = Form.useWatch('result', form) as StepResult | undefined;
  const jobCode = job.codes.find((c) => c.code === code);
  const fixPath = jobCode?.fixPath ?? null;
  const digits = currencyFractionDigits(job.currency);
  const planned = plannedStepCostMinor(fixPath, kind, parts);
  const shares = kind === 'replace' ? creditShares(fixPath, parts) : null;

  const partOptions = (() => {
    const options = (fixPath?.causes ?? []).map((c) => ({
      value: c.key,
      label: `${c.label}${kind === 'check' && !c.check ? ' (no quick check known)' : ''}`,
    }));
    if (jobCode?.foundPart && !options.some((o) => o.value === jobCode.foundPart)) options.push({ value: jobCode.foundPart, label: jobCode.foundPart });
    return options;
  })();

  const queryClient = useQueryClient();
  const create = useCreateStep({
    mutationConfig: {
      onSuccess: (saved) => {
        form.resetFields();
        setCostTouched(false);
        void message.success('Step recorded; the fix path is updated');
        onRecorded?.(saved);
      },
      onError: (error) => {
        if (isApiError(error) && error.status === 409) {
          setAlert(error.message);
          onClosedConflict?.(error.message);
          // Someone closed it meanwhile: show the job as it now is.
          void queryClient.invalidateQueries({ queryKey: JOBS_QUERY_KEY });
          return;
        }
        setAlert(formAlertMessage(error, applyFieldErrors(form, error, { labels: LABELS, rename: { actualCostMinor: 'cost' } })));
      },
    },
  });

  const suggest = (next: Partial<StepValues>) => {
    if (costTouched) return;
    const values = { ...form.getFieldsValue(), ...next };
    const jc = job.codes.find((c) => c.code === (values.code ?? firstCode));
    const minor = plannedStepCostMinor(jc?.fixPath ?? null, values.kind ?? 'check', partsOf(values.parts));
    form.setFieldValue('cost', minor === null ? undefined : fromMinorUnits(minor, job.currency));
  };

  if (job.status === 'closed') return null;

  return (
    <Form<StepValues>
      form={form}
      layout="vertical"
      requiredMark="optional"
      initialValues={{ code: firstCode, kind: 'check', parts: undefined }}
      onValuesChange={(changed: Partial<StepValues>) => {
        if ('code' in changed || 'kind' in changed) {
          form.setFieldsValue({ parts: undefined, result: undefined });
          suggest({ ...changed, parts: undefined });
        } else if ('parts' in changed) {
          suggest(changed);
        }
        if ('cost' in changed) setCostTouched(true);
      }}
      onFinish={(values) => {
        setAlert(null);
        const data: CreateStepRequest = {
          code: values.code ?? firstCode,
          kind: values.kind,
          parts: partsOf(values.parts),
          result: values.result ?? (values.kind === 'check' ? 'not-at-fault' : 'came-back'),
          actualCostMinor: toMinorUnits(values.cost, job.currency) ?? 0,
          ...(values.notes?.trim() ? { notes: values.notes.trim() } : {}),
        };
        create.mutate({ jobId: job.id, data });
      }}
    >
      {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 16 }} />}
      <Row gutter={16}>
        {job.codes.length > 1 && (
          <Col xs={24} md={8}>
            <Form.Item name="code" label={LABELS.code} rules={[{ required: true }]}>
              <Select options={job.codes.map((c) => ({ value: c.code, label: `${c.display}${c.title ? ` — ${c.title}` : ''}`, disabled: c.fixPath === null }))} />
            </Form.Item>
          </Col>
        )}
        <Col xs={24} md={job.codes.length > 1 ? 16 : 24}>
          <Form.Item name="kind" label={LABELS.kind} rules={[{ required: true }]}>
            <Radio.Group
              optionType="button"
              buttonStyle="solid"
              options={[
                { value: 'check', label: 'Checked a part' },
                { value: 'replace', label: 'Replaced parts' },
              ]}
            />
          </Form.Item>
        </Col>
      </Row>
      {!fixPath ? (
        <Typography.Paragraph type="secondary">{jobCode?.fixPathNote ?? 'This code has no fix path to work along.'}</Typography.Paragraph>
      ) : (
        <>
          <Form.Item
            name="parts"
            label={kind === 'check' ? 'Part checked' : 'Parts replaced (together, in one go)'}
            rules={[{ required: true, message: kind === 'check' ? 'Pick the part you checked' : 'Pick the parts you replaced' }]}
          >
            <Select mode={kind === 'replace' ? 'multiple' : undefined} options={partOptions} placeholder="Pick from the possible causes" />
          </Form.Item>
          <Form.Item name="result" label={LABELS.result} rules={[{ required: true, message: 'Say how it turned out' }]}>
            <Radio.Group options={RESULTS[kind]} />
          </Form.Item>
          {shares && (
            <Alert
              type="info"
              showIcon
              style={{ marginBottom: 16 }}
              title="Several parts replaced together"
              description={`${result === 'cleared' ? 'If the code stays away' : 'Should the code clear'}, the fix is credited to ${listNames(
                shares.map((s) => `${s.label} (${formatPercent(s.share, job.locale)})`),
              )} in shares by their current likelihoods, since one replacement cannot tell which part it was.`}
            />
          )}
          <Row gutter={16}>
            <Col xs={24} md={8}>
              <Form.Item
                name="cost"
                label={`Actual cost before tax (${job.currency})`}
                extra={planned !== null ? `Planned: ${formatMoney(planned, job.currency, job.locale)}` : undefined}
                rules={[
                  { required: true, message: 'Give what it cost, or 0' },
                  { pattern: /^\s*\d+(?:[.,]\d*)?\s*$/, message: 'A number such as 19 or 19.50' },
                ]}
              >
                <InputNumber<string> stringMode min="0" precision={digits} style={{ width: '100%' }} />
              </Form.Item>
            </Col>
            <Col xs={24} md={16}>
              <Form.Item name="notes" label={LABELS.notes} rules={[{ max: 4000 }]}>
                <Input.TextArea autoSize={{ minRows: 1, maxRows: 5 }} placeholder="What you measured or saw" />
              </Form.Item>
            </Col>
          </Row>
          <Button type="primary" htmlType="submit" loading={create.isPending}>
            Record the step
          </Button>
        </>
      )}
    </Form>
  );
}
