import { KNOWLEDGE_LIMITS, PART_SYSTEMS, type FieldReportDto, type NewCausePayload, type PartSystem, type ReviewReportDto } from '@causeway/shared';
import { Alert, Button, Card, Col, Form, Input, Row, Select } from 'antd';
import { useState } from 'react';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { SYSTEM_LABELS } from '@/utils/part-systems';
import { useApproveReport } from '../api/approve-report';
import { useRejectReport } from '../api/reject-report';

type DecisionPanelProps = {
  report: ReviewReportDto;
  onDecided: (report: FieldReportDto, decision: 'approved' | 'rejected') => void;
  /** Approving would be refused as things stand (the reasons are shown above); rejecting is still possible. */
  approveBlocked?: boolean;
};

interface ApproveValues {
  note?: string;
  partSystem?: PartSystem;
}

interface RejectValues {
  reason: string;
}

/** Approve (with an optional note) or reject (with a reason, e-mailed to the author). */
export function DecisionPanel({ report, onDecided, approveBlocked = false }: DecisionPanelProps) {
  const [approveForm] = Form.useForm<ApproveValues>();
  const [rejectForm] = Form.useForm<RejectValues>();
  const [approveAlert, setApproveAlert] = useState<string | null>(null);
  const [rejectAlert, setRejectAlert] = useState<string | null>(null);
  const approve = useApproveReport({
    mutationConfig: {
      onSuccess: (saved) => onDecided(saved, 'approved'),
      onError: (error) => setApproveAlert(formAlertMessage(error, applyFieldErrors(approveForm, error, { labels: { note: 'Note', partSystem: 'System' } }))),
    },
  });
  const reject = useRejectReport({
    mutationConfig: {
      onSuccess: (saved) => onDecided(saved, 'rejected'),
      onError: (error) => setRejectAlert(formAlertMessage(error, applyFieldErrors(rejectForm, error, { labels: { reason: 'Reason' } }))),
    },
  });
  const needsSystem = report.kind === 'new-cause' && !!(report.payload as NewCausePayload).partName && !(report.payload as NewCausePayload).system;
  const busy = approve.isPending || reject.isPending;

  return (
    <Row gutter={[24, 24]}>
      <Col xs={24} lg={12}>
        <Card title="Approve" style={{ height: '100%' }}>
          <Form<ApproveValues>
            form={approveForm}
            layout="vertical"
            requiredMark={false}
            onFinish={(values) => {
              setApproveAlert(null);
              const note = values.note?.trim();
              approve.mutate({ id: report.id, data: { ...(note ? { note } : {}), ...(values.partSystem ? { partSystem: values.partSystem } : {}) } });
            }}
          >
            {approveAlert && <Alert type="error" showIcon title={approveAlert} style={{ marginBottom: 16 }} />}
            {needsSystem && (
              <Form.Item name="partSystem" label="System of the new part" rules={[{ required: true, message: 'Choose the system: it decides the safety cautions' }]}>
                <Select options={PART_SYSTEMS.map((s) => ({ value: s, label: SYSTEM_LABELS[s] }))} />
              </Form.Item>
            )}
            <Form.Item name="note" label="Note to the contributor (optional)">
              <Input.TextArea rows={3} maxLength={KNOWLEDGE_LIMITS.reasonMax} />
            </Form.Item>
            <Button type="primary" htmlType="submit" size="large" loading={approve.isPending} disabled={approveBlocked || (busy && !approve.isPending)}>
              Approve report
            </Button>
          </Form>
        </Card>
      </Col>
      <Col xs={24} lg={12}>
        <Card title="Reject" style={{ height: '100%' }}>
          <Form<RejectValues>
            form={rejectForm}
            layout="vertical"
            requiredMark={false}
            onFinish={(values) => {
              setRejectAlert(null);
              reject.mutate({ id: report.id, data: { reason: values.reason.trim() } });
            }}
          >
            {rejectAlert && <Alert type="error" showIcon title={rejectAlert} style={{ marginBottom: 16 }} />}
            <Form.Item
              name="reason"
              label="Reason"
              extra="E-mailed to the contributor. Say what would make the report acceptable."
              rules={[
                { required: true, whitespace: true, message: 'Give the reason for rejecting the report' },
                { min: KNOWLEDGE_LIMITS.reasonMin, message: `The reason needs at least ${KNOWLEDGE_LIMITS.reasonMin} characters` },
              ]}
            >
              <Input.TextArea rows={3} maxLength={KNOWLEDGE_LIMITS.reasonMax} />
            </Form.Item>
            <Button danger htmlType="submit" size="large" loading={reject.isPending} disabled={busy && !reject.isPending}>
              Reject report
            </Button>
          </Form>
        </Card>
      </Col>
    </Row>
  );
}
