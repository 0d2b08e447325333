import { formatMoney, type JobDto } from '@causeway/shared';
import { Descriptions, Flex, Typography } from 'antd';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { formatDateTime } from '@/utils/format';
import { vehicleLabel } from '../utils/labels';
import { formatDistance } from '../utils/odometer';
import { JobStatusTag } from './jobs-table';

type JobHeaderProps = {
  job: JobDto;
  vehicleHref: (id: string) => string;
  /** Buttons for the job: close, prepare an estimate … */
  actions?: ReactNode;
};

/** The vehicle, the complaint and where the job stands. */
export function JobHeader({ job, vehicleHref, actions }: JobHeaderProps) {
  const title = `${vehicleLabel(job.vehicle)}${job.vehicle.plate ? ` · ${job.vehicle.plate}` : ''}`;
  return (
    <header style={{ marginBottom: 24 }}>
      <Flex wrap gap={16} justify="space-between" align="flex-start">
        <div style={{ maxWidth: 820 }}>
          <Typography.Title level={1} style={{ fontSize: 30, marginBottom: 4 }}>
            {title} <JobStatusTag job={job} />
          </Typography.Title>
          <Typography.Paragraph style={{ fontSize: 18, marginBottom: 8 }}>
            <span style={{ color: '#454c54' }}>Complaint: </span>
            {job.complaint}
          </Typography.Paragraph>
        </div>
        {actions && (
          <Flex gap={8} wrap>
            {actions}
          </Flex>
        )}
      </Flex>
      <Descriptions
        size="small"
        column={{ xs: 1, sm: 2, lg: 4 }}
        items={[
          {
            key: 'vin',
            label: 'VIN',
            children: (
              <Link to={vehicleHref(job.vehicle.id)} style={{ fontFamily: 'ui-monospace, SFMono-Regular, Menlo, monospace' }}>
                {job.vehicle.vin}
              </Link>
            ),
          },
          { key: 'opened', label: 'Opened', children: formatDateTime(job.openedAt, job.locale) },
          { key: 'tech', label: 'Technician', children: job.technician?.displayName ?? '—' },
          { key: 'odo', label: 'Odometer', children: job.odometer === null ? '—' : formatDistance(job.odometer, job.distanceUnit, job.locale) },
          { key: 'spent', label: 'Spent so far', children: `${formatMoney(job.actualCostMinor, job.currency, job.locale)} before tax` },
          ...(job.closedAt ? [{ key: 'closed', label: 'Closed', children: formatDateTime(job.closedAt, job.locale) }] : []),
        ]}
      />
    </header>
  );
}
