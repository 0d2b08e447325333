import { SendOutlined } from '@ant-design/icons';
import type { CreateEstimateRequest, CreateEstimateResponse, JobDto } from '@causeway/shared';
import { Alert, Button, Col, Empty, Form, Input, InputNumber, Row, Typography } from 'antd';
import { useMemo, useState } from 'react';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { useCreateEstimate } from '../api/create-estimate';
import { buildStages, type CodeFixPath } from '@causeway/shared';
import { formatWhen } from '../utils/format';
import { EstimateStages } from './estimate-stages';

interface SendValues {
  recipientEmail?: string;
  message?: string;
  expiresInDays?: number | null;
}

type PrepareEstimateProps = {
  job: JobDto;
  /** The vehicle owner's address on file, where the estimate goes unless another is given. */
  ownerEmail?: string | null;
  /** Where the printable page of the current estimate is. */
  printHref?: string;
};

/** The codes of the job that have a fix path with stages left: what an estimate can price. */
export function estimablePaths(job: JobDto): CodeFixPath[] {
  return job.codes.flatMap((c) => (c.fixPath && c.fixPath.plan.stages.length > 0 ? [{ code: c.code, title: c.title, fixPath: c.fixPath }] : []));
}

function SendResult({ result, locale }: { result: CreateEstimateResponse; locale: string }) {
  const link = (
    <Typography.Paragraph copyable={{ text: result.link, tooltips: ['Copy the link', 'Copied'] }} style={{ marginBottom: 0 }}>
      Owner&apos;s link (shown only now):{' '}
      <a href={result.link} target="_blank" rel="noreferrer" data-testid="estimate-link">
        {result.link}
      </a>
    </Typography.Paragraph>
  );
  if (result.emailed) {
    return (
      <Alert
        type="success"
        showIcon
        role="status"
        title={`E-mailed to ${result.estimate.recipientEmail ?? 'the owner'}`}
        description={
          <>
            <p style={{ margin: '0 0 4px' }}>The link works until {formatWhen(result.estimate.expiresAt, locale)}. Their answers show on this job.</p>
            {link}
          </>
        }
      />
    );
  }
  return (
    <Alert
      type="error"
      showIcon
      role="alert"
      title="The estimate is saved, but it was not e-mailed"
      description={
        <>
          <p style={{ margin: '0 0 4px' }}>{result.emailError}</p>
          {link}
        </>
      }
    />
  );
}

/**
 * "Prepare estimate": the staged estimate from the job's current fix paths, priced with the
 * shop's tax, as the owner will see it; then "Send to owner" saves it and e-mails the link.
 */
export function PrepareEstimate({ job, ownerEmail, printHref }: PrepareEstimateProps) {
  const [form] = Form.useForm<SendValues>();
  const [alert, setAlert] = useState<string | null>(null);
  const [result, setResult] = useState<CreateEstimateResponse | null>(null);
  const paths = useMemo(() => estimablePaths(job), [job]);
  const preview = useMemo(() => buildStages(paths, job.taxRateBp), [paths, job.taxRateBp]);
  const create = useCreateEstimate({
    mutationConfig: {
      onSuccess: (answer) => setResult(answer),
      onError: (error) => setAlert(formAlertMessage(error, applyFieldErrors(form, error, { labels: { recipientEmail: 'E-mail', message: 'Message', expiresInDays: 'Link open for' } }))),
    },
  });

  if (preview.stages.length === 0) {
    return <Empty description="No code of this job has a fix path with stages left to estimate (cleared, or no possible cause is known)." />;
  }

  return (
    <>
      <Typography.Paragraph type="secondary">
        Worked out from the current fix path{paths.length > 1 ? 's' : ''} of {paths.map((p) => p.code).join(', ')} at your labour rate and tax. Each stage is done
        only if the ones before it did not fix the fault.
      </Typography.Paragraph>
      <EstimateStages stages={preview.stages} totals={preview.totals} currency={job.currency} locale={job.locale} taxRateBp={job.taxRateBp} />
      {printHref && (
        <Typography.Paragraph>
          <a href={printHref} target="_blank" rel="noreferrer">
            Open the printable page
          </a>
        </Typography.Paragraph>
      )}
      <section aria-label="Send to owner" style={{ marginTop: 16 }}>
        <h3 style={{ fontSize: 18 }}>Send to the owner</h3>
        {result ? (
          <SendResult result={result} locale={job.locale} />
        ) : (
          <Form<SendValues>
            form={form}
            layout="vertical"
            requiredMark="optional"
            onFinish={(values) => {
              setAlert(null);
              const data: CreateEstimateRequest = {};
              if (values.recipientEmail?.trim()) data.recipientEmail = values.recipientEmail.trim();
              if (values.message?.trim()) data.message = values.message.trim();
              if (values.expiresInDays) data.expiresInDays = values.expiresInDays;
              create.mutate({ jobId: job.id, data });
            }}
          >
            {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 16 }} />}
            <Row gutter={16}>
              <Col xs={24} md={16}>
                <Form.Item
                  name="recipientEmail"
                  label="E-mail"
                  extra={ownerEmail ? `Leave empty to send it to the owner's address on file, ${ownerEmail}.` : 'The vehicle has no owner e-mail on file: give one, or hand over the link afterwards.'}
                  rules={[{ type: 'email', message: 'An e-mail address such as name@example.com' }]}
                >
                  <Input type="email" placeholder={ownerEmail ?? 'owner@example.com'} autoComplete="off" />
                </Form.Item>
              </Col>
              <Col xs={24} md={8}>
                <Form.Item name="expiresInDays" label="Link open for (days)" extra="14 unless you say otherwise." rules={[{ type: 'integer', min: 1, max: 90, message: '1 to 90 days' }]}>
                  <InputNumber<number> min={1} max={90} precision={0} style={{ width: '100%' }} />
                </Form.Item>
              </Col>
            </Row>
            <Form.Item name="message" label="A few words to the owner" rules={[{ max: 2000 }]}>
              <Input.TextArea autoSize={{ minRows: 2, maxRows: 6 }} />
            </Form.Item>
            <Button type="primary" htmlType="submit" icon={<SendOutlined aria-hidden />} loading={create.isPending}>
              Send to owner
            </Button>
          </Form>
        )}
      </section>
    </>
  );
}
