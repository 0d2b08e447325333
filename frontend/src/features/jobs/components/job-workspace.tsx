import { CheckOutlined } from '@ant-design/icons';
import type { JobDto } from '@causeway/shared';
import { Alert, App, Button, Card, Col, Modal, Row, Typography } from 'antd';
import { useState, type ReactNode } from 'react';
import { SafetyCaution } from '@/components/safety-caution';
import { useDocumentTitle } from '@/hooks/use-document-title';
import { cautionPoints } from '../utils/fix-path';
import { vehicleLabel } from '../utils/labels';
import { CloseJobForm } from './close-job-form';
import { JobCodeCard, jobCautions } from './job-code-card';
import { JobHeader } from './job-header';
import { StepForm } from './step-form';
import { StepTimeline } from './step-timeline';

type JobWorkspaceProps = {
  job: JobDto;
  vehicleHref: (id: string) => string;
  /** More buttons beside "Close the job", e.g. preparing a staged estimate. */
  actions?: ReactNode;
  /** What follows the timeline, e.g. the staged estimates. */
  children?: ReactNode;
};

/**
 * A job at work: its codes with the current fix path of each, the safety cautions, recording
 * a step (after which the path is recomputed), the timeline, and closing the job.
 */
export function JobWorkspace({ job, vehicleHref, actions, children }: JobWorkspaceProps) {
  const { message } = App.useApp();
  const [closing, setClosing] = useState(false);
  const [conflict, setConflict] = useState<string | null>(null);
  useDocumentTitle(`Job · ${vehicleLabel(job.vehicle)}`);
  const cautions = jobCautions(job);
  const closed = job.status === 'closed';

  return (
    <>
      <JobHeader
        job={job}
        vehicleHref={vehicleHref}
        actions={
          <>
            {actions}
            {!closed && (
              <Button type="primary" icon={<CheckOutlined aria-hidden />} onClick={() => setClosing(true)}>
                Close the job
              </Button>
            )}
          </>
        }
      />
      {(conflict || closed) && (
        <Alert
          type={conflict ? 'error' : 'info'}
          showIcon
          role={conflict ? 'alert' : undefined}
          style={{ marginBottom: 24 }}
          title={conflict ? 'This job is closed' : `This job is closed${job.resolution ? ` as ${job.resolution}` : ''}`}
          description={conflict ?? 'A closed job takes no more steps or estimates; its timeline and outcome stay as recorded.'}
        />
      )}
      <Typography.Title level={2} style={{ fontSize: 22 }}>
        {job.codes.length === 1 ? 'Fault code and its fix path' : 'Fault codes and their fix paths'}
      </Typography.Title>
      {job.codes.map((code) => (
        <JobCodeCard key={code.code} job={job} code={code} />
      ))}
      {cautions.length > 0 && (
        <section aria-label="Safety for this job" style={{ marginBottom: 24 }}>
          {cautions.map((c) => (
            <SafetyCaution key={c.key} title={c.title} points={cautionPoints(c)} />
          ))}
        </section>
      )}
      <Row gutter={[24, 24]}>
        {!closed && (
          <Col xs={24} xl={14}>
            <Card title={<h2 style={{ fontSize: 20, margin: 0 }}>Record a step</h2>}>
              <StepForm
                job={job}
                onClosedConflict={(text) => setConflict(text)}
              />
            </Card>
          </Col>
        )}
        <Col xs={24} xl={closed ? 24 : 10}>
          <Card title={<h2 style={{ fontSize: 20, margin: 0 }}>Timeline</h2>}>
            <StepTimeline job={job} />
          </Card>
        </Col>
      </Row>
      {children}
      <Modal title="Close the job" open={closing} onCancel={() => setClosing(false)} footer={null} destroyOnHidden width={640}>
        <CloseJobForm
          job={job}
          onCancel={() => setClosing(false)}
          onClosed={(saved) => {
            setClosing(false);
            void message.success(saved.resolution === 'resolved' ? 'Job closed as resolved; the outcome is recorded' : 'Job closed as unresolved');
          }}
        />
      </Modal>
    </>
  );
}
