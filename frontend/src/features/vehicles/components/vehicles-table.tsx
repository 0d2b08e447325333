import type { VehicleDto } from '@causeway/shared';
import { Alert, Input, Table, Typography, type TableColumnsType } from 'antd';
import { Link } from 'react-router-dom';
import { useTableParams } from '@/hooks/use-table-params';
import { formatDate } from '@/utils/format';
import { useVehicles } from '../api/get-vehicles';
import { formatDistance } from '../utils/odometer';
import { VEHICLE_TABLE, type VehicleListParams } from '../utils/list-params';

type VehiclesTableProps = {
  params: VehicleListParams;
  onParamsChange: (params: VehicleListParams) => void;
  locale: string;
  /** Where a vehicle's own page is. */
  vehicleHref: (id: string) => string;
};

const mono = { fontFamily: 'ui-monospace, SFMono-Regular, Menlo, monospace' } as const;

/** The shop's vehicles: searched, sorted and paged on the server, all of it kept in the address. */
export function VehiclesTable({ params, onParamsChange, locale, vehicleHref }: VehiclesTableProps) {
  const vehicles = useVehicles(params);
  const { sortable, onChange, refine, pagination } = useTableParams(params, onParamsChange, VEHICLE_TABLE);

  const columns: TableColumnsType<VehicleDto> = [
    {
      title: 'VIN',
      ...sortable('vin'),
      render: (_: unknown, v) => (
        <Link to={vehicleHref(v.id)} style={mono}>
          {v.vin}
        </Link>
      ),
    },
    { title: 'Plate', dataIndex: 'plate', ...sortable('plate'), render: (plate: string | null) => plate ?? '—' },
    { title: 'Make', dataIndex: 'make', ...sortable('make') },
    { title: 'Model', ...sortable('model'), render: (_: unknown, v) => [v.model, v.engine].filter(Boolean).join(' ') },
    { title: 'Year', dataIndex: 'year', ...sortable('year'), render: (year: number | null) => year ?? '—' },
    {
      title: 'Owner',
      ...sortable('ownerName'),
      render: (_: unknown, v) =>
        v.ownerName || v.ownerEmail ? (
          <>
            {v.ownerName ?? ''}
            {v.ownerEmail && (
              <Typography.Text type="secondary" style={{ display: 'block', fontSize: 14 }}>
                {v.ownerEmail}
              </Typography.Text>
            )}
          </>
        ) : (
          '—'
        ),
    },
    {
      title: 'Odometer',
      key: 'odometer',
      align: 'right',
      render: (_: unknown, v) => (v.odometer === null ? '—' : formatDistance(v.odometer, v.distanceUnit, locale)),
    },
    { title: 'Last changed', dataIndex: 'updatedAt', ...sortable('updatedAt'), render: (iso: string) => formatDate(iso, locale) },
  ];

  return (
    <>
      <Input.Search
        key={params.q}
        defaultValue={params.q}
        placeholder="VIN, plate, owner's name or e-mail"
        aria-label="Search vehicles by VIN, plate or owner"
        allowClear
        enterButton="Search"
        onSearch={(q) => refine({ q: q.trim() })}
        style={{ maxWidth: 520, marginBottom: 16 }}
      />
      {vehicles.isError && <Alert type="error" showIcon title={vehicles.error.message} style={{ marginBottom: 16 }} />}
      <Table<VehicleDto>
        rowKey="id"
        columns={columns}
        dataSource={vehicles.data?.items ?? []}
        loading={vehicles.isFetching}
        onChange={onChange}
        scroll={{ x: 'max-content' }}
        locale={{ emptyText: params.q ? `No vehicle matches "${params.q}"` : 'No vehicles yet: add the first one.' }}
        pagination={pagination(vehicles.data?.total ?? 0, (total) => `${total} ${total === 1 ? 'vehicle' : 'vehicles'}`)}
      />
    </>
  );
}
