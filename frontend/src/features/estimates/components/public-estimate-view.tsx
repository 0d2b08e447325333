import { CheckOutlined, CloseOutlined } from '@ant-design/icons';
import type { EstimateStageDto, PublicEstimateDto } from '@causeway/shared';
import { Alert, App, Button, Card, Form, Input, Result, Space, Spin, Typography } from 'antd';
import { useState } from 'react';
import { useDocumentTitle } from '@/hooks/use-document-title';
import { isApiError } from '@/lib/api-client';
import { useAnswerPublicEstimate } from '../api/answer-public-estimate';
import { usePublicEstimate } from '../api/get-public-estimate';
import { formatDay } from '../utils/format';
import { EstimateStages } from './estimate-stages';

type PublicEstimateViewProps = { token: string };

function vehicleText(e: PublicEstimateDto): string {
  const v = e.vehicle;
  return [v.year, v.make, v.model].filter((x) => x !== null && x !== '').join(' ') + (v.plate ? ` · ${v.plate}` : '');
}

function StageAnswer({ estimate, stage, token, name }: { estimate: PublicEstimateDto; stage: EstimateStageDto; token: string; name: string }) {
  const { message } = App.useApp();
  const answer = useAnswerPublicEstimate({
    mutationConfig: {
      onSuccess: (_saved, { data }) =>
        void message.success(`Stage ${data.stageIndex + 1} ${data.decision === 'approved' ? 'approved' : 'declined'}. ${estimate.shop.name} can see your answer.`),
      onError: (error) => void message.error(error.message),
    },
  });
  if (!estimate.acceptingAnswers) return null;
  const current = estimate.decisions[stage.index]?.decision ?? null;
  const send = (decision: 'approved' | 'declined') =>
    answer.mutate({ token, data: { stageIndex: stage.index, decision, ...(name.trim() ? { name: name.trim() } : {}) } });
  const busy = answer.isPending ? answer.variables?.data.decision : undefined;
  return (
    <Space wrap style={{ marginTop: 12 }}>
      <Button
        type={current === 'approved' ? 'default' : 'primary'}
        aria-pressed={current === 'approved'}
        icon={<CheckOutlined aria-hidden />}
        loading={busy === 'approved'}
        disabled={answer.isPending}
        onClick={() => send('approved')}
        aria-label={`Approve stage ${stage.index + 1}`}
      >
        Approve
      </Button>
      <Button
        aria-pressed={current === 'declined'}
        icon={<CloseOutlined aria-hidden />}
        loading={busy === 'declined'}
        disabled={answer.isPending}
        onClick={() => send('declined')}
        aria-label={`Decline stage ${stage.index + 1}`}
      >
        Decline
      </Button>
    </Space>
  );
}

/**
 * What the vehicle owner opens from the e-mail, without an account: the stages, what each costs
 * with tax and its chance of fixing the fault, and a yes or no for each. An expired link says so
 * plainly and tells them to ask the shop for a new one.
 */
export function PublicEstimateView({ token }: PublicEstimateViewProps) {
  const estimate = usePublicEstimate(token);
  const [name, setName] = useState('');
  useDocumentTitle(estimate.data ? `Estimate from ${estimate.data.shop.name}` : 'Your estimate');

  if (estimate.isPending) {
    return (
      <div style={{ padding: 48, textAlign: 'center' }}>
        <Spin size="large" description="Loading your estimate" />
      </div>
    );
  }
  if (estimate.isError) {
    const error = estimate.error;
    if (isApiError(error) && error.status === 410) {
      return (
        <Result
          status="info"
          title="This estimate link has expired"
          subTitle={
            <>
              <p style={{ margin: '0 0 4px' }}>{error.message}</p>
              <p style={{ margin: 0 }}>Please contact the garage: they can send you a new link. Nothing has been approved or charged through this one since it expired.</p>
            </>
          }
        />
      );
    }
    if (isApiError(error) && error.status === 404) {
      return <Result status="404" title="This estimate link is not known" subTitle={error.message} />;
    }
    return (
      <Result
        status="error"
        title="The estimate could not be loaded"
        subTitle={error.message}
        extra={
          <Button type="primary" onClick={() => void estimate.refetch()}>
            Try again
          </Button>
        }
      />
    );
  }

  const e = estimate.data;
  return (
    <article>
      <Typography.Text strong style={{ fontSize: 16 }}>
        {e.shop.name}
      </Typography.Text>
      <Typography.Title level={1} style={{ fontSize: 30, margin: '4px 0 8px' }}>
        Staged estimate for your {vehicleText(e)}
      </Typography.Title>
      <Typography.Paragraph style={{ fontSize: 17 }}>
        You told us: {e.complaint}
        <br />
        Fault code{e.codes.length === 1 ? '' : 's'} read: {e.codes.map((c) => `${c.code}${c.title ? ` (${c.title})` : ''}`).join('; ')}.
      </Typography.Paragraph>
      {e.message && (
        <Card size="small" style={{ marginBottom: 16 }}>
          <Typography.Paragraph style={{ marginBottom: 0, whiteSpace: 'pre-wrap' }}>{e.message}</Typography.Paragraph>
        </Card>
      )}
      <Typography.Paragraph>
        The work is done in stages. Each stage goes ahead only if the ones before it did not fix the fault, and only if you approve it. You can approve
        or decline each stage below until {formatDay(e.expiresAt, e.locale)}; your latest answer counts.
      </Typography.Paragraph>
      {e.acceptingAnswers ? (
        <Form layout="vertical" component="div" style={{ maxWidth: 420 }}>
          <Form.Item label="Your name (optional)" htmlFor="estimate-answer-name" extra="So the garage knows who answered.">
            <Input id="estimate-answer-name" value={name} maxLength={120} autoComplete="name" onChange={(ev) => setName(ev.target.value)} />
          </Form.Item>
        </Form>
      ) : (
        <Alert type="info" showIcon style={{ marginBottom: 16 }} title={`This job is closed, so ${e.shop.name} no longer takes answers here. Please contact them.`} />
      )}
      <EstimateStages
        stages={e.stages}
        totals={e.totals}
        currency={e.currency}
        locale={e.locale}
        taxRateBp={e.taxRateBp}
        decisions={e.decisions}
        renderStageActions={(stage) => <StageAnswer estimate={e} stage={stage} token={token} name={name} />}
      />
      <Typography.Paragraph type="secondary" style={{ fontSize: 14 }}>
        {e.rounding} {e.note}
      </Typography.Paragraph>
    </article>
  );
}
