import { PlusOutlined } from '@ant-design/icons';
import { Button, Modal } from 'antd';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { section } from '@/config/sections';
import { VehicleForm } from '@/features/vehicles/components/vehicle-form';
import { VehiclesTable } from '@/features/vehicles/components/vehicles-table';
import { parseVehicleListParams, toVehicleListSearch } from '@/features/vehicles/utils/list-params';
import { useSearchParamsState } from '@/hooks/use-search-params-state';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

export function Component() {
  const { shop } = useCurrentUser();
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);
  const [params, setParams] = useSearchParamsState(parseVehicleListParams, toVehicleListSearch);
  const page = section('vehicles');
  const locale = shop?.locale ?? browserLocale();
  return (
    <>
      <PageHeader
        title={page.label}
        description={page.purpose}
        extra={
          shop && (
            <Button type="primary" icon={<PlusOutlined aria-hidden />} onClick={() => setAdding(true)}>
              Add a vehicle
            </Button>
          )
        }
      />
      <VehiclesTable params={params} onParamsChange={setParams} locale={locale} vehicleHref={paths.vehicle} />
      <Modal title="Add a vehicle" open={adding} onCancel={() => setAdding(false)} footer={null} destroyOnHidden width={760}>
        {shop && (
          <VehicleForm
            distanceUnit={shop.distanceUnit}
            locale={locale}
            onCancel={() => setAdding(false)}
            onSaved={(vehicle) => {
              setAdding(false);
              navigate(paths.vehicle(vehicle.id));
            }}
          />
        )}
      </Modal>
    </>
  );
}
