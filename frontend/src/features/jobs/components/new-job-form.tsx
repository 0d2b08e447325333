import { DeleteOutlined, PlusOutlined } from '@ant-design/icons';
import { CODE_STATUSES, type CreateJobRequest, type DistanceUnit, type JobDto } from '@causeway/shared';
import { Alert, App, Button, Card, Col, Collapse, Form, Input, InputNumber, Modal, Row, Select, Space } from 'antd';
import { useState, type ReactNode } from 'react';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { useCreateJob } from '../api/create-job';
import { toJobCodeInput, type CodeRow } from '../utils/code-input';
import { CODE_STATUS_HELP, CODE_STATUS_LABELS } from '../utils/labels';
import { formatDistance, odometerLowerDetails } from '../utils/odometer';
import { CodeFeedback, codeError } from './code-feedback';
import { VehiclePicker } from './vehicle-picker';

interface NewJobValues {
  vehicleId?: string;
  complaint?: string;
  odometer?: number | null;
  codes: CodeRow[];
}

type NewJobFormProps = {
  distanceUnit: DistanceUnit;
  locale: string;
  /** The vehicle the job is for, when it is already known (a vehicle's own page). */
  vehicleId?: string;
  onCreated: (job: JobDto) => void;
  onCancel?: () => void;
  /**
   * Room for adding a vehicle that is not on file yet; given the callback to call with the new
   * vehicle's id, which the form then picks.
   */
  renderNewVehicle?: (onCreated: (vehicleId: string) => void) => ReactNode;
};

const UNIT_LABEL: Record<DistanceUnit, string> = { km: 'km', mi: 'miles' };

function fieldLabels(codes: unknown[]): Record<string, string> {
  const labels: Record<string, string> = { vehicleId: 'Vehicle', complaint: 'Complaint', odometer: 'Odometer', codes: 'Fault codes', technicianId: 'Technician', openedAt: 'Opened' };
  codes.forEach((_, i) => {
    labels[`codes.${i}.code`] = `Code ${i + 1}`;
    labels[`codes.${i}.status`] = `Status of code ${i + 1}`;
  });
  return labels;
}

/** Opens a job: the vehicle, what the customer reported, and the codes as the scan tool read them. */
export function NewJobForm({ distanceUnit, locale, vehicleId, onCreated, onCancel, renderNewVehicle }: NewJobFormProps) {
  const { modal } = App.useApp();
  const [form] = Form.useForm<NewJobValues>();
  const [alert, setAlert] = useState<string | null>(null);
  const [addingVehicle, setAddingVehicle] = useState(false);
  const codes = (Form.useWatch('codes', form) as CodeRow[] | undefined) ?? [];
  const create = useCreateJob();

  const submit = (data: CreateJobRequest) => {
    setAlert(null);
    create.mutate(data, {
      onSuccess: onCreated,
      onError: (error) => {
        const lower = odometerLowerDetails(error);
        if (lower) {
          modal.confirm({
            title: 'Lower than the last odometer reading',
            content: `${formatDistance(lower.given, lower.unit, locale)} is lower than the vehicle's last reading of ${formatDistance(lower.lastReading, lower.unit, locale)}. Keep it only if it is right — say, the instrument cluster was replaced.`,
            okText: 'Keep the lower reading',
            cancelText: 'Correct it',
            onOk: () => submit({ ...data, confirmOdometerLower: true }),
          });
          return;
        }
        setAlert(formAlertMessage(error, applyFieldErrors(form, error, { labels: fieldLabels(data.codes) })));
      },
    });
  };

  return (
    <Form<NewJobValues>
      form={form}
      layout="vertical"
      requiredMark="optional"
      initialValues={{ vehicleId, codes: [{ code: '', status: 'stored', freezeFrame: [] }] }}
      onFinish={(values) => {
        const odometer = values.odometer ?? undefined;
        submit({
          vehicleId: values.vehicleId ?? '',
          complaint: values.complaint?.trim() ?? '',
          codes: values.codes.map(toJobCodeInput),
          ...(odometer !== undefined ? { odometer } : {}),
        });
      }}
    >
      {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 24 }} />}
      <Form.Item name="vehicleId" label="Vehicle" rules={[{ required: true, message: 'Pick the vehicle, or add it' }]} style={{ marginBottom: renderNewVehicle ? 8 : undefined }}>
        <VehiclePicker style={{ width: '100%' }} />
      </Form.Item>
      {renderNewVehicle && (
        <Button icon={<PlusOutlined aria-hidden />} onClick={() => setAddingVehicle(true)} style={{ marginBottom: 16 }}>
          Add a vehicle not on file
        </Button>
      )}
      <Form.Item
        name="complaint"
        label="Complaint"
        extra="What the customer reported, in their words."
        rules={[
          { required: true, whitespace: true, message: 'Say what the customer reported' },
          { max: 2000 },
        ]}
        style={{ marginTop: 16 }}
      >
        <Input.TextArea autoSize={{ minRows: 2, maxRows: 6 }} />
      </Form.Item>
      <Form.Item
        name="odometer"
        label={`Odometer (${UNIT_LABEL[distanceUnit]})`}
        extra="Updates the vehicle's reading."
        rules={[{ type: 'number', min: 0, max: 2_000_000, message: 'A reading from 0 to 2 000 000' }]}
      >
        <InputNumber<number> min={0} max={2_000_000} precision={0} suffix={distanceUnit} style={{ width: 220 }} />
      </Form.Item>

      <Form.List
        name="codes"
        rules={[
          {
            validator: async (_rule, value: CodeRow[] | undefined) => {
              if (!value || value.length === 0) throw new Error('Give at least one fault code');
            },
          },
        ]}
      >
        {(fields, { add, remove }, { errors }) => (
          <fieldset style={{ border: 0, padding: 0, margin: '0 0 16px' }}>
            <legend style={{ fontSize: 18, fontWeight: 600, marginBottom: 8 }}>Fault codes</legend>
            {fields.map((field, index) => (
              <Card key={field.key} size="small" style={{ marginBottom: 12 }}>
                <Row gutter={12} align="top">
                  <Col xs={24} md={10}>
                    <Form.Item
                      name={[field.name, 'code']}
                      label={`Code ${index + 1}`}
                      extra={<CodeFeedback value={codes[index]?.code} />}
                      rules={[
                        { required: true, whitespace: true, message: 'Type the code as read, e.g. P0456 or 04 56' },
                        {
                          validator: async (_rule, value: string | undefined) => {
                            const error = codeError(value);
                            if (error) throw new Error(error);
                          },
                        },
                      ]}
                    >
                      <Input placeholder="P0456, po456, 04 56 or P0456-13" autoCapitalize="characters" spellCheck={false} autoComplete="off" />
                    </Form.Item>
                  </Col>
                  <Col xs={18} md={10}>
                    <Form.Item name={[field.name, 'status']} label={`Status of code ${index + 1}`} extra={CODE_STATUS_HELP[codes[index]?.status ?? 'stored']}>
                      <Select options={CODE_STATUSES.map((s) => ({ value: s, label: CODE_STATUS_LABELS[s] }))} />
                    </Form.Item>
                  </Col>
                  <Col xs={6} md={4} style={{ paddingTop: 38 }}>
                    {fields.length > 1 && (
                      <Button icon={<DeleteOutlined aria-hidden />} aria-label={`Remove code ${index + 1}`} onClick={() => remove(field.name)} />
                    )}
                  </Col>
                </Row>
                <Collapse
                  ghost
                  size="small"
                  items={[
                    {
                      key: 'ff',
                      label: `Freeze frame of code ${index + 1} (optional)`,
                      children: (
                        <Form.List name={[field.name, 'freezeFrame']}>
                          {(rows, ff) => (
                            <>
                              {rows.map((row, k) => (
                                <Space key={row.key} align="baseline" wrap style={{ display: 'flex' }}>
                                  <Form.Item name={[row.name, 'name']} aria-label="Value name" rules={[{ required: true, whitespace: true, message: 'Name it, e.g. RPM' }, { max: 60 }]}>
                                    <Input placeholder="Name with unit, e.g. ECT °C" aria-label={`Freeze-frame name ${k + 1}`} />
                                  </Form.Item>
                                  <Form.Item name={[row.name, 'value']} rules={[{ required: true, whitespace: true, message: 'Give the value' }, { max: 100 }]}>
                                    <Input placeholder="Value, e.g. 89" aria-label={`Freeze-frame value ${k + 1}`} />
                                  </Form.Item>
                                  <Button icon={<DeleteOutlined aria-hidden />} aria-label={`Remove freeze-frame value ${k + 1}`} onClick={() => ff.remove(row.name)} />
                                </Space>
                              ))}
                              <Button type="dashed" icon={<PlusOutlined aria-hidden />} onClick={() => ff.add({ name: '', value: '' })}>
                                Add a freeze-frame value
                              </Button>
                            </>
                          )}
                        </Form.List>
                      ),
                    },
                  ]}
                />
              </Card>
            ))}
            <Button type="dashed" icon={<PlusOutlined aria-hidden />} onClick={() => add({ code: '', status: 'stored', freezeFrame: [] })} disabled={fields.length >= 20}>
              Add another code
            </Button>
            <Form.ErrorList errors={errors} />
          </fieldset>
        )}
      </Form.List>

      <Space>
        <Button type="primary" htmlType="submit" loading={create.isPending}>
          Open the job
        </Button>
        {onCancel && <Button onClick={onCancel}>Cancel</Button>}
      </Space>
      {renderNewVehicle && (
        // A dialog of its own (a portal), so its form is not nested inside this one.
        <Modal title="Add a vehicle" open={addingVehicle} onCancel={() => setAddingVehicle(false)} footer={null} destroyOnHidden width={760}>
          {renderNewVehicle((id) => {
            form.setFieldValue('vehicleId', id);
            void form.validateFields(['vehicleId']);
            setAddingVehicle(false);
          })}
        </Modal>
      )}
    </Form>
  );
}
