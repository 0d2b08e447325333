import { KNOWLEDGE_LIMITS, PART_SYSTEMS } from '@causeway/shared';
import { Checkbox, Col, Form, Input, InputNumber, Row, Select, Switch } from 'antd';
import { VehicleScopeFields } from '@/components/vehicle-scope-fields';
import { COMMON_CURRENCIES } from '@/config/locales';
import { SYSTEM_LABELS } from '@/utils/part-systems';
import { describeScope } from '@/utils/vehicle-scope';
import { useCodeCauses } from '../api/get-code-causes';
import { useParts } from '../api/get-parts';
import { useTeardowns } from '../api/get-teardowns';
import { useParsedCode } from './code-field';
import { FormSection } from './form-section';

const required = (what: string) => ({ required: true, message: `Enter ${what}` });

export function NewCauseFields() {
  const code = useParsedCode(Form.useWatch<string | undefined>('code'));
  const newPart = Form.useWatch<boolean | undefined>('newPart');
  const withCheck = Form.useWatch<boolean | undefined>('withCheck');
  const parts = useParts();
  const causes = useCodeCauses(code);
  const teardowns = useTeardowns();
  const listed = new Set((causes.data ?? []).map((c) => c.partKey));
  return (
    <>
      <FormSection title="The part">
        <Form.Item name="newPart" label="The part is not in the list yet" valuePropName="checked">
          <Switch />
        </Form.Item>
        {newPart ? (
          <Row gutter={16}>
            <Col xs={24} md={12}>
              <Form.Item name="partName" label="Name of the new part" rules={[required('the name of the part')]}>
                <Input maxLength={160} />
              </Form.Item>
            </Col>
            <Col xs={24} md={6}>
              <Form.Item
                name="newPartKey"
                label="Key of the new part"
                extra="Lower case and dashes, e.g. turbo-diverter-valve"
                rules={[required('a key'), { pattern: /^[a-z0-9]+(?:-[a-z0-9]+)*$/, message: 'Use lower-case letters and digits joined by dashes' }]}
              >
                <Input maxLength={60} spellCheck={false} />
              </Form.Item>
            </Col>
            <Col xs={24} md={6}>
              <Form.Item name="system" label="System" extra="Decides the safety cautions that come with it.">
                <Select allowClear options={PART_SYSTEMS.map((s) => ({ value: s, label: SYSTEM_LABELS[s] }))} />
              </Form.Item>
            </Col>
          </Row>
        ) : (
          <Form.Item name="part" label="Part" rules={[required('the part')]} style={{ maxWidth: 640 }}>
            <Select
              showSearch={{ optionFilterProp: 'label' }}
              loading={parts.isLoading}
              placeholder="Choose a part"
              options={(parts.data ?? []).map((p) => ({ value: p.key, label: listed.has(p.key) ? `${p.name} (already a possible cause for some vehicles)` : p.name }))}
            />
          </Form.Item>
        )}
      </FormSection>
      <FormSection title="Which vehicles">
        <VehicleScopeFields hint="Leave everything empty for all vehicles." />
      </FormSection>
      <FormSection title="Likelihood and costs">
        <Row gutter={16}>
          <Col xs={24} md={12} lg={6}>
            <Form.Item
              name="prior"
              label="Proposed prior"
              extra="How often this part is the cause, before any outcomes: 0–100 %."
              rules={[required('the proposed prior'), { type: 'number', min: 0, max: 100, message: 'Enter a percentage between 0 and 100' }]}
            >
              <InputNumber min={0} max={100} step={1} suffix="%" style={{ width: '100%' }} />
            </Form.Item>
          </Col>
          <Col xs={24} md={12} lg={6}>
            <Form.Item
              name="partCost"
              label="Part cost"
              rules={[required('the part cost'), { pattern: /^\s*\d+(?:[.,]\d{0,3})?\s*$/, message: 'Enter an amount such as 68.00' }]}
            >
              <Input inputMode="decimal" autoComplete="off" />
            </Form.Item>
          </Col>
          <Col xs={24} md={12} lg={6}>
            <Form.Item name="currency" label="Currency" rules={[required('the currency')]}>
              <Select showSearch options={COMMON_CURRENCIES.map((c) => ({ value: c, label: c }))} />
            </Form.Item>
          </Col>
          <Col xs={24} md={12} lg={6}>
            <Form.Item name="replaceHours" label="Labour hours to replace" rules={[required('the labour hours')]} extra="Without the teardown.">
              <InputNumber min={0} max={KNOWLEDGE_LIMITS.hoursMax} step={0.1} suffix="h" style={{ width: '100%' }} />
            </Form.Item>
          </Col>
        </Row>
        <Form.Item name="teardown" label="Teardown (optional)" extra="What must be taken apart to reach the part." style={{ maxWidth: 640 }}>
          <Select
            allowClear
            showSearch={{ optionFilterProp: 'label' }}
            loading={teardowns.isLoading}
            options={(teardowns.data ?? []).map((t) => ({ value: t.key, label: `${t.name} — ${t.hours} h, ${describeScope(t)}` }))}
          />
        </Form.Item>
      </FormSection>
      <FormSection title="Check">
        <Form.Item name="withCheck" label="A quick check rules this part in or out" valuePropName="checked">
          <Switch />
        </Form.Item>
        {withCheck && (
          <Row gutter={16}>
            <Col xs={24} md={16}>
              <Form.Item name="checkDescription" label="What the check does" rules={[required('what the check does'), { min: 3, message: 'Describe the check in a few words' }]}>
                <Input maxLength={1000} />
              </Form.Item>
            </Col>
            <Col xs={24} md={8}>
              <Form.Item name="checkHours" label="Hours of the check" rules={[required('the hours of the check')]}>
                <InputNumber min={0} max={KNOWLEDGE_LIMITS.hoursMax} step={0.1} suffix="h" style={{ width: '100%' }} />
              </Form.Item>
            </Col>
            <Col xs={24}>
              <Form.Item name="checkMustPrecede" valuePropName="checked">
                <Checkbox>The check must find the fault before the part may be replaced (e.g. wiring)</Checkbox>
              </Form.Item>
            </Col>
          </Row>
        )}
        <Form.Item name="notes" label="Notes (optional)" style={{ maxWidth: 760 }}>
          <Input.TextArea rows={3} maxLength={KNOWLEDGE_LIMITS.notesMax} showCount />
        </Form.Item>
      </FormSection>
    </>
  );
}
