import { VEHICLE_SORTS, type VehicleDto, type VehicleSort } from '@causeway/shared';
import { Alert, Input, Table, Typography, type TableColumnsType, type TableProps } from 'antd';
import { Link } from 'react-router-dom';
import { formatDate } from '@/utils/format';
import { useVehicles } from '../api/get-vehicles';
import { formatDistance } from '../utils/odometer';
import { VEHICLE_PAGE_SIZES, type VehicleListParams } from '../utils/list-params';

type VehiclesTableProps = {
  params: VehicleListParams;
  onParamsChange: (params: VehicleListParams) => void;
  locale: string;
  /** Where a vehicle's own page is. */
  vehicleHref: (id: string) => string;
};

function sortOrderOf(params: VehicleListParams, field: VehicleSort): 'ascend' | 'descend' | null {
  if (params.sort !== field) return null;
  return params.order === 'desc' ? 'descend' : 'ascend';
}

const mono = { fontFamily: 'ui-monospace, SFMono-Regular, Menlo, monospace' } as const;

/** The shop's vehicles: searched, sorted and paged on the server, all of it kept in the address. */
export function VehiclesTable({ params, onParamsChange, locale, vehicleHref }: VehiclesTableProps) {
  const vehicles = useVehicles(params);
  const sortable = (field: VehicleSort) => ({ key: field, sorter: true, sortOrder: sortOrderOf(params, field) });

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

  const onChange: TableProps<VehicleDto>['onChange'] = (pagination, _filters, sorter, extra) => {
    const { columnKey, order } = (Array.isArray(sorter) ? sorter[0] : sorter) ?? {};
    const sortField = VEHICLE_SORTS.find((f) => f === columnKey);
    const pageSize = pagination.pageSize ?? params.pageSize;
    const page = extra.action === 'paginate' && pageSize === params.pageSize ? (pagination.current ?? 1) : 1;
    onParamsChange({
      ...params,
      page,
      pageSize,
      sort: order && sortField ? sortField : undefined,
      order: order && sortField ? (order === 'descend' ? 'desc' : 'asc') : undefined,
    });
  };

  return (
    <>
      <Input.Search
        key={params.q}
        defaultValue={params.q}
        placeholder="VIN, plate, owner's name or e-mail"
        aria-label="Search vehicles by VIN, plate or owner"
        allowClear
        enterButton="Search"
        onSearch={(q) => onParamsChange({ ...params, q: q.trim(), page: 1 })}
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
        pagination={{
          current: params.page,
          pageSize: params.pageSize,
          total: vehicles.data?.total ?? 0,
          showSizeChanger: true,
          pageSizeOptions: VEHICLE_PAGE_SIZES.map(String),
          showTotal: (total) => `${total} ${total === 1 ? 'vehicle' : 'vehicles'}`,
        }}
      />
    </>
  );
}
