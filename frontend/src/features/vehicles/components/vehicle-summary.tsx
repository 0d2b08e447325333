import type { VehicleDto } from '@causeway/shared';
import { Descriptions } from 'antd';
import { formatDateTime } from '@/utils/format';
import { formatDistance } from '../utils/odometer';

type VehicleSummaryProps = { vehicle: VehicleDto; locale: string };

/** What the shop knows about a vehicle, at a glance. */
export function VehicleSummary({ vehicle, locale }: VehicleSummaryProps) {
  return (
    <Descriptions
      column={{ xs: 1, sm: 2, lg: 3 }}
      items={[
        { key: 'vin', label: 'VIN', children: <span style={{ fontFamily: 'ui-monospace, SFMono-Regular, Menlo, monospace' }}>{vehicle.vin}</span> },
        { key: 'plate', label: 'Registration plate', children: vehicle.plate ?? '—' },
        { key: 'vehicle', label: 'Vehicle', children: [vehicle.make, vehicle.model, vehicle.engine].filter(Boolean).join(' ') },
        { key: 'year', label: 'Model year', children: vehicle.year ?? '—' },
        {
          key: 'odometer',
          label: 'Last odometer reading',
          children: vehicle.odometer === null ? '—' : formatDistance(vehicle.odometer, vehicle.distanceUnit, locale),
        },
        { key: 'owner', label: 'Owner', children: [vehicle.ownerName, vehicle.ownerEmail].filter(Boolean).join(' · ') || '—' },
        { key: 'updated', label: 'Last changed', children: formatDateTime(vehicle.updatedAt, locale) },
      ]}
    />
  );
}
