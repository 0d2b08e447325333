import type { VehicleDto } from '@causeway/shared';
import { Select } from 'antd';
import { useEffect, useMemo, useState, type CSSProperties } from 'react';
import { useVehicleById } from '../api/get-vehicle';
import { useVehicleSearch } from '../api/search-vehicles';
import { vehicleLabel } from '../utils/labels';

type VehiclePickerProps = {
  id?: string;
  value?: string;
  onChange?: (id: string | undefined, vehicle: VehicleDto | undefined) => void;
  placeholder?: string;
  allowClear?: boolean;
  'aria-label'?: string;
  style?: CSSProperties;
};

export function vehicleOptionLabel(v: VehicleDto): string {
  return [v.plate, vehicleLabel(v), v.vin].filter(Boolean).join(' · ');
}

/** Picks one of the shop's vehicles, searched on the server by VIN, plate or owner. */
export function VehiclePicker({ id, value, onChange, placeholder = 'Search by plate, VIN or owner', allowClear, style, ...rest }: VehiclePickerProps) {
  const [typed, setTyped] = useState('');
  const [q, setQ] = useState('');
  // Ask the server once the typing pauses, not on every key.
  useEffect(() => {
    const timer = setTimeout(() => setQ(typed), 250);
    return () => clearTimeout(timer);
  }, [typed]);
  const results = useVehicleSearch(q);
  const selected = useVehicleById(value);
  const options = useMemo(() => {
    const list = [...(results.data?.items ?? [])];
    if (selected.data && !list.some((v) => v.id === selected.data.id)) list.unshift(selected.data);
    return list.map((v) => ({ value: v.id, label: vehicleOptionLabel(v), vehicle: v }));
  }, [results.data, selected.data]);

  return (
    <Select
      id={id}
      aria-label={rest['aria-label']}
      showSearch={{ filterOption: false, onSearch: setTyped }}
      value={value}
      placeholder={placeholder}
      allowClear={allowClear}
      loading={results.isFetching}
      notFoundContent={results.isFetching ? 'Searching…' : 'No vehicle found'}
      options={options}
      onChange={(next: string | undefined) => onChange?.(next, options.find((o) => o.value === next)?.vehicle)}
      style={{ minWidth: 280, ...style }}
    />
  );
}
