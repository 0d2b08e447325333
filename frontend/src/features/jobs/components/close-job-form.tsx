import type { CloseJobRequest, JobDto, JobResolution } from '@causeway/shared';
import { Alert, Button, Checkbox, Form, Input, Radio, Select, Space, Typography } from 'antd';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { useCloseJob } from '../api/close-job';
import { JOBS_QUERY_KEY } from '../api/get-jobs';
import { listNames } from '../utils/fix-path';

/** "A cause not listed": the fix was a part outside the code's possible causes. */
const UNLISTED = '__unlisted__';

interface CloseValues {
  resolution: JobResolution;
  verificationPassed?: boolean;
  /** Per code: the part keys that fixed it, UNLISTED, or nothing (the default). */
  fixedBy?: Record<string, string[] | undefined>;
  notes?: string;
}

type CloseJobFormProps = {
  job: JobDto;
  onClosed: (job: JobDto) => void;
  onCancel: () => void;
};

function partOptions(job: JobDto, code: string): Array<{ value: string; label: string }> {
  const seen = new Map<string, string>();
  for (const step of job.steps) if (step.code === code && step.kind === 'replace') for (const p of step.parts) seen.set(p.key, p.label);
  for (const c of job.codes.find((x) => x.code === code)?.fixPath?.causes ?? []) if (!seen.has(c.key)) seen.set(c.key, c.label);
  return [...seen].map(([value, label]) => ({ value, label }));
}

/**
 * Closes the job. Resolved needs the verification to have passed (the code stayed away after
 * the drive) and says what fixed each code — by default the replacement that cleared it; that
 * becomes an outcome the shared likelihoods learn from. Unresolved records no outcome.
 */
export function CloseJobForm({ job, onClosed, onCancel }: CloseJobFormProps) {
  const [form] = Form.useForm<CloseValues>();
  const [alert, setAlert] = useState<string | null>(null);
  const resolution = (Form.useWatch('resolution', form) as JobResolution | undefined) ?? 'resolved';
  const queryClient = useQueryClient();
  const close = useCloseJob({
    mutationConfig: {
      onSuccess: onClosed,
      onError: (error) => {
        if (isApiError(error) && error.status === 409) {
          setAlert(error.message);
          void queryClient.invalidateQueries({ queryKey: JOBS_QUERY_KEY });
          return;
        }
        setAlert(formAlertMessage(error, applyFieldErrors(form, error, { labels: { verificationPassed: 'Verification', notes: 'Notes' } })));
      },
    },
  });

  return (
    <Form<CloseValues>
      form={form}
      layout="vertical"
      requiredMark="optional"
      initialValues={{ resolution: 'resolved', verificationPassed: false }}
      onFinish={(values) => {
        setAlert(null);
        const data: CloseJobRequest = { resolution: values.resolution };
        if (values.resolution === 'resolved') {
          data.verificationPassed = values.verificationPassed === true;
          const fixedBy = Object.entries(values.fixedBy ?? {})
            .filter(([, parts]) => parts && parts.length > 0)
            .map(([code, parts]) => ({ code, parts: parts!.includes(UNLISTED) ? [] : parts! }));
          if (fixedBy.length) data.fixedBy = fixedBy;
        }
        if (values.notes?.trim()) data.notes = values.notes.trim();
        close.mutate({ jobId: job.id, data });
      }}
    >
      {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 16 }} />}
      <Form.Item name="resolution" label="How did it end?" rules={[{ required: true, message: 'Say how the job ended' }]}>
        <Radio.Group
          options={[
            { value: 'resolved', label: 'Resolved: the fault is fixed' },
            { value: 'unresolved', label: 'Unresolved: the fault remains or the customer stopped the work' },
          ]}
          style={{ display: 'flex', flexDirection: 'column', gap: 8 }}
        />
      </Form.Item>
      {resolution === 'resolved' && (
        <>
          <Form.Item
            name="verificationPassed"
            valuePropName="checked"
            rules={[{ validator: async (_r, v: boolean | undefined) => { if (v !== true) throw new Error('Close as resolved only once the verification passed'); } }]}
          >
            <Checkbox>The verification passed: the code was cleared and stayed away after the drive (the monitor completed)</Checkbox>
          </Form.Item>
          <Typography.Paragraph strong style={{ marginBottom: 8 }}>
            What fixed it
          </Typography.Paragraph>
          {job.codes.map((c) => {
            const fallback = c.clearedBy.length
              ? `the replacement that cleared it counts (${listNames(c.clearedBy.map((k) => partOptions(job, c.code).find((o) => o.value === k)?.label ?? k))})`
              : 'no outcome is recorded for this code';
            return (
              <Form.Item key={c.code} name={['fixedBy', c.code]} label={`${c.display}${c.title ? ` — ${c.title}` : ''}`} extra={`Left empty: ${fallback}.`}>
                <Select mode="multiple" allowClear placeholder="As recorded" options={[...partOptions(job, c.code), { value: UNLISTED, label: 'A cause not listed' }]} />
              </Form.Item>
            );
          })}
        </>
      )}
      <Form.Item name="notes" label="Notes" rules={[{ max: 4000 }]}>
        <Input.TextArea autoSize={{ minRows: 2, maxRows: 6 }} />
      </Form.Item>
      <Space>
        <Button type="primary" htmlType="submit" loading={close.isPending}>
          {resolution === 'resolved' ? 'Close as resolved' : 'Close as unresolved'}
        </Button>
        <Button onClick={onCancel}>Cancel</Button>
      </Space>
    </Form>
  );
}
