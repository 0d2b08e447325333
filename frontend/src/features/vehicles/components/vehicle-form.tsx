import type { DistanceUnit, FieldError, VehicleDto, VehicleInput } from '@causeway/shared';
import { Alert, App, Button, Col, Form, Input, InputNumber, Row, Space } from 'antd';
import { useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { useCreateVehicle } from '../api/create-vehicle';
import { useUpdateVehicle } from '../api/update-vehicle';
import { formatDistance, odometerLowerDetails } from '../utils/odometer';
import { formValuesToVehicle, VEHICLE_FIELD_LABELS, vehicleToFormValues, type VehicleFormValues } from '../utils/vehicle-form';
import { VinCheck, vinError } from './vin-check';

type VehicleFormProps = {
  /** The vehicle being edited; a new one when absent. */
  vehicle?: VehicleDto;
  distanceUnit: DistanceUnit;
  locale: string;
  onSaved?: (vehicle: VehicleDto) => void;
  onCancel?: () => void;
};

const UNIT_LABEL: Record<DistanceUnit, string> = { km: 'km', mi: 'miles' };
const { vin: _vinLabel, ...OTHER_LABELS } = VEHICLE_FIELD_LABELS;

/**
 * Adds or edits a vehicle. The VIN is checked as it is typed with the same rules as the
 * server; an odometer reading lower than the last one is saved only once the user confirms it.
 */
export function VehicleForm({ vehicle, distanceUnit, locale, onSaved, onCancel }: VehicleFormProps) {
  const { modal, message } = App.useApp();
  const [form] = Form.useForm<VehicleFormValues>();
  const vin = Form.useWatch('vin', form);
  const [alert, setAlert] = useState<string | null>(null);
  const [warnings, setWarnings] = useState<FieldError[]>(vehicle?.warnings ?? []);
  const editing = vehicle !== undefined;

  const saved = (result: VehicleDto) => {
    setWarnings(result.warnings);
    form.setFieldsValue(vehicleToFormValues(result));
    void message.success(editing ? 'Vehicle saved' : `Vehicle ${result.vin} added`);
    onSaved?.(result);
  };

  const create = useCreateVehicle();
  const update = useUpdateVehicle();
  const pending = create.isPending || update.isPending;

  const submit = (data: VehicleInput) => {
    setAlert(null);
    const onError = (error: Error) => {
      const lower = odometerLowerDetails(error);
      if (lower) {
        modal.confirm({
          title: 'Lower than the last odometer reading',
          content: `${formatDistance(lower.given, lower.unit, locale)} is lower than the last reading of ${formatDistance(lower.lastReading, lower.unit, locale)}. Keep it only if it is right — say, the instrument cluster was replaced or the earlier reading was mistyped.`,
          okText: 'Keep the lower reading',
          cancelText: 'Correct it',
          onOk: () => submit({ ...data, confirmOdometerLower: true }),
          onCancel: () => form.setFields([{ name: 'odometer', errors: [`Lower than the last reading (${formatDistance(lower.lastReading, lower.unit, locale)})`] }]),
        });
        return;
      }
      // VIN messages from the server already name the position ("Position 9: …"); keep them whole.
      const vinErrors = isApiError(error) ? error.fieldErrors.filter((e) => e.field === 'vin') : [];
      if (vinErrors.length) form.setFields([{ name: 'vin', errors: vinErrors.map((e) => e.message.replace(/^./, (c) => c.toUpperCase())) }]);
      const unplaced = applyFieldErrors(form, error, { labels: OTHER_LABELS }).filter((e) => e.field !== 'vin');
      setAlert(vinErrors.length && unplaced.length === 0 ? null : formAlertMessage(error, unplaced));
    };
    if (vehicle) update.mutate({ id: vehicle.id, data }, { onSuccess: saved, onError });
    else create.mutate(data, { onSuccess: saved, onError });
  };

  return (
    <Form<VehicleFormValues>
      form={form}
      layout="vertical"
      requiredMark="optional"
      initialValues={vehicle ? vehicleToFormValues(vehicle) : { vin: '' }}
      onFinish={(values) => submit(formValuesToVehicle(values, { editing }))}
    >
      {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 24 }} />}
      <Form.Item
        name="vin"
        label={VEHICLE_FIELD_LABELS.vin}
        validateTrigger={['onBlur', 'onChange']}
        rules={[
          { required: true, whitespace: true, message: 'Give the VIN: 17 characters' },
          {
            validator: (_rule, value: string | undefined) => {
              const error = value ? vinError(value) : null;
              return error ? Promise.reject(new Error('This VIN cannot be saved: see the check below')) : Promise.resolve();
            },
          },
        ]}
        extra={<VinCheck value={vin} />}
      >
        <Input autoComplete="off" autoCapitalize="characters" spellCheck={false} maxLength={40} style={{ fontFamily: 'ui-monospace, SFMono-Regular, Menlo, monospace', letterSpacing: 1 }} />
      </Form.Item>
      <Row gutter={16}>
        <Col xs={24} md={8}>
          <Form.Item name="make" label={VEHICLE_FIELD_LABELS.make} rules={[{ required: true, whitespace: true, message: 'Give the make' }, { max: 40 }]}>
            <Input />
          </Form.Item>
        </Col>
        <Col xs={24} md={8}>
          <Form.Item name="model" label={VEHICLE_FIELD_LABELS.model} rules={[{ required: true, whitespace: true, message: 'Give the model' }, { max: 60 }]}>
            <Input />
          </Form.Item>
        </Col>
        <Col xs={24} md={8}>
          <Form.Item name="engine" label={VEHICLE_FIELD_LABELS.engine} rules={[{ max: 40 }]}>
            <Input placeholder="e.g. 1.6 T" />
          </Form.Item>
        </Col>
      </Row>
      <Row gutter={16}>
        <Col xs={24} md={8}>
          <Form.Item
            name="year"
            label={VEHICLE_FIELD_LABELS.year}
            extra={editing ? undefined : 'Leave empty to take it from the VIN.'}
            rules={[{ type: 'integer', min: 1950, max: 2100, message: 'A year from 1950 to 2100' }]}
          >
            <InputNumber<number> min={1950} max={2100} precision={0} style={{ width: '100%' }} />
          </Form.Item>
        </Col>
        <Col xs={24} md={8}>
          <Form.Item name="plate" label={VEHICLE_FIELD_LABELS.plate} rules={[{ max: 20 }]}>
            <Input autoCapitalize="characters" />
          </Form.Item>
        </Col>
        <Col xs={24} md={8}>
          <Form.Item
            name="odometer"
            label={`${VEHICLE_FIELD_LABELS.odometer} (${UNIT_LABEL[distanceUnit]})`}
            rules={[{ type: 'number', min: 0, max: 2_000_000, message: 'A reading from 0 to 2 000 000' }]}
          >
            <InputNumber<number> min={0} max={2_000_000} precision={0} suffix={distanceUnit} style={{ width: '100%' }} />
          </Form.Item>
        </Col>
      </Row>
      <Row gutter={16}>
        <Col xs={24} md={12}>
          <Form.Item name="ownerName" label={VEHICLE_FIELD_LABELS.ownerName} rules={[{ max: 120 }]}>
            <Input autoComplete="off" />
          </Form.Item>
        </Col>
        <Col xs={24} md={12}>
          <Form.Item
            name="ownerEmail"
            label={VEHICLE_FIELD_LABELS.ownerEmail}
            extra="Where staged estimates are sent."
            rules={[{ type: 'email', message: 'An e-mail address such as name@example.com' }, { max: 254 }]}
          >
            <Input type="email" autoComplete="off" />
          </Form.Item>
        </Col>
      </Row>
      {warnings.length > 0 && (
        <Alert
          type="info"
          showIcon
          style={{ marginBottom: 16 }}
          title="Worth a second look (saved anyway)"
          description={
            <ul style={{ margin: 0, paddingLeft: 20 }}>
              {warnings.map((w, i) => (
                <li key={i}>
                  {VEHICLE_FIELD_LABELS[w.field as keyof typeof VEHICLE_FIELD_LABELS] ?? w.field}: {w.message}
                </li>
              ))}
            </ul>
          }
        />
      )}
      <Space>
        <Button type="primary" htmlType="submit" loading={pending}>
          {editing ? 'Save vehicle' : 'Add vehicle'}
        </Button>
        {onCancel && <Button onClick={onCancel}>Cancel</Button>}
      </Space>
    </Form>
  );
}
