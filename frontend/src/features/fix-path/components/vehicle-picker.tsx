import { CarOutlined } from '@ant-design/icons';
import type { VehicleScopeQuery } from '@causeway/shared';
import { Button, Select, Typography } from 'antd';
import { useId, useMemo, type ReactNode } from 'react';
import { palette } from '@/config/theme';
import { useVehicleOptions } from '../api/get-vehicle-options';

type VehiclePickerProps = {
  value: VehicleScopeQuery;
  onChange: (vehicle: VehicleScopeQuery) => void;
};

const FIRST_OBD_YEAR = 1996;

function withCurrent(options: string[], current: string | undefined): string[] {
  return current && !options.includes(current) ? [...options, current] : options;
}

/**
 * The vehicle in the bay: make, model, engine and model year, each optional ("any vehicle").
 * Likelihoods learnt for this vehicle and its make-specific meanings follow the choice.
 */
export function VehiclePicker({ value, onChange }: VehiclePickerProps) {
  const id = useId();
  const options = useVehicleOptions();
  const makes = options.data ?? [];
  const make = makes.find((m) => m.make === value.make);
  const model = make?.models.find((m) => m.model === value.model);

  const years = useMemo(() => {
    const last = new Date().getFullYear() + 1;
    const from = model?.yearFrom ?? FIRST_OBD_YEAR;
    const to = Math.min(model?.yearTo ?? last, last);
    const list: number[] = [];
    for (let y = to; y >= from; y--) list.push(y);
    if (value.year && !list.includes(value.year)) list.push(value.year);
    return list;
  }, [model, value.year]);

  const field = (key: string, label: string, control: ReactNode) => (
    <div style={{ display: 'flex', flexDirection: 'column', gap: 4, minWidth: 170 }}>
      <label htmlFor={`${id}-${key}`} style={{ fontWeight: 600 }}>
        {label}
      </label>
      {control}
    </div>
  );

  const makeOptions = withCurrent(
    makes.map((m) => m.make),
    value.make,
  );
  const modelOptions = withCurrent(make?.models.map((m) => m.model) ?? [], value.model);
  const engineOptions = withCurrent(model?.engines ?? [], value.engine);
  const anySelected = Boolean(value.make || value.year);

  return (
    <section
      aria-labelledby={`${id}-title`}
      style={{ background: palette.white, border: `1px solid ${palette.grey200}`, borderRadius: 8, padding: '16px 20px', marginBottom: 24 }}
    >
      <Typography.Title level={2} id={`${id}-title`} style={{ fontSize: 20, marginTop: 0, marginBottom: 12 }}>
        <CarOutlined aria-hidden style={{ color: palette.teal600 }} /> The vehicle in the bay
      </Typography.Title>
      <div style={{ display: 'flex', flexWrap: 'wrap', gap: 16, alignItems: 'flex-end' }}>
        {field(
          'make',
          'Make',
          <Select<string>
            id={`${id}-make`}
            value={value.make ?? ''}
            loading={options.isPending}
            onChange={(next) => onChange({ ...(next ? { make: next } : {}), ...(value.year ? { year: value.year } : {}) })}
            options={[{ value: '', label: 'Any vehicle' }, ...makeOptions.map((m) => ({ value: m, label: m }))]}
          />,
        )}
        {field(
          'model',
          'Model',
          <Select<string>
            id={`${id}-model`}
            value={value.model ?? ''}
            disabled={!value.make}
            onChange={(next) => onChange({ make: value.make, ...(next ? { model: next } : {}), ...(value.year ? { year: value.year } : {}) })}
            options={[{ value: '', label: 'Any model' }, ...modelOptions.map((m) => ({ value: m, label: m }))]}
          />,
        )}
        {field(
          'engine',
          'Engine',
          <Select<string>
            id={`${id}-engine`}
            value={value.engine ?? ''}
            disabled={!value.model}
            onChange={(next) => onChange({ ...value, engine: next || undefined })}
            options={[{ value: '', label: 'Any engine' }, ...engineOptions.map((e) => ({ value: e, label: e }))]}
          />,
        )}
        {field(
          'year',
          'Model year',
          <Select<number | ''>
            id={`${id}-year`}
            value={value.year ?? ''}
            showSearch={{ optionFilterProp: 'label' }}
            onChange={(next) => onChange({ ...value, year: next === '' ? undefined : next })}
            options={[{ value: '', label: 'Any year' }, ...years.map((y) => ({ value: y, label: String(y) }))]}
          />,
        )}
        {anySelected && (
          <Button onClick={() => onChange({})} aria-label="Any vehicle: clear the vehicle">
            Any vehicle
          </Button>
        )}
      </div>
      {options.isError && (
        <Typography.Paragraph type="secondary" style={{ margin: '8px 0 0' }}>
          The list of vehicles could not be loaded; the fix path is for any vehicle.
        </Typography.Paragraph>
      )}
    </section>
  );
}
