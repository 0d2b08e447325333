import { parseDtc } from '@causeway/shared';
import { Button, Flex, Form, Input, Segmented, Select, Switch, Typography } from 'antd';
import { useState } from 'react';
import { useShopMembers } from '../api/get-shop-members';
import type { JobListParams } from '../utils/list-params';
import { VehiclePicker } from './vehicle-picker';

type JobFiltersProps = {
  params: JobListParams;
  onParamsChange: (params: JobListParams) => void;
  currentUserId: string;
  /** Shop owners pick any technician; everyone else may narrow the list to their own jobs. */
  shopOwner: boolean;
};

type StatusChoice = 'all' | 'open' | 'closed';

/** Filters of the job list; every change starts again at the first page. */
export function JobFilters({ params, onParamsChange, currentUserId, shopOwner }: JobFiltersProps) {
  const members = useShopMembers({ enabled: shopOwner });
  const [codeText, setCodeText] = useState(params.code ?? '');
  const [codeError, setCodeError] = useState<string | null>(null);
  const change = (patch: Partial<JobListParams>) => onParamsChange({ ...params, ...patch, page: 1 });

  const applyCode = (raw: string) => {
    const text = raw.trim();
    if (!text) {
      setCodeError(null);
      if (params.code) change({ code: undefined });
      return;
    }
    const parsed = parseDtc(text);
    if (!parsed.ok) {
      setCodeError(parsed.error.message);
      return;
    }
    setCodeError(null);
    setCodeText(parsed.value.code);
    if (parsed.value.code !== params.code) change({ code: parsed.value.code });
  };

  const anyFilter = Boolean(params.status || params.code || params.vehicleId || params.technicianId || params.from || params.to);

  return (
    <Form layout="vertical" component="div" style={{ marginBottom: 8 }}>
      <Flex wrap gap={16} align="flex-end">
        <Form.Item label="Status" style={{ marginBottom: 16 }}>
          <Segmented<StatusChoice>
            aria-label="Job status"
            value={params.status ?? 'all'}
            onChange={(value) => change({ status: value === 'all' ? undefined : value })}
            options={[
              { value: 'all', label: 'All' },
              { value: 'open', label: 'Open' },
              { value: 'closed', label: 'Closed' },
            ]}
          />
        </Form.Item>
        <Form.Item
          label="Fault code"
          htmlFor="job-filter-code"
          validateStatus={codeError ? 'error' : undefined}
          help={codeError ?? undefined}
          style={{ marginBottom: 16, width: 180 }}
        >
          <Input
            id="job-filter-code"
            value={codeText}
            placeholder="e.g. P0456"
            allowClear
            autoCapitalize="characters"
            spellCheck={false}
            onChange={(e) => {
              setCodeText(e.target.value);
              if (e.target.value === '') applyCode('');
            }}
            onPressEnter={() => applyCode(codeText)}
            onBlur={() => applyCode(codeText)}
          />
        </Form.Item>
        <Form.Item label="Vehicle" htmlFor="job-filter-vehicle" style={{ marginBottom: 16 }}>
          <VehiclePicker id="job-filter-vehicle" value={params.vehicleId} allowClear onChange={(vehicleId) => change({ vehicleId })} />
        </Form.Item>
        {shopOwner ? (
          <Form.Item label="Technician" htmlFor="job-filter-technician" style={{ marginBottom: 16 }}>
            <Select
              id="job-filter-technician"
              allowClear
              placeholder="Everyone"
              value={params.technicianId}
              loading={members.isPending}
              onChange={(technicianId: string | undefined) => change({ technicianId })}
              options={(members.data ?? []).map((m) => ({ value: m.id, label: m.displayName }))}
              style={{ minWidth: 200 }}
            />
          </Form.Item>
        ) : (
          <Form.Item label="Only my jobs" htmlFor="job-filter-mine" style={{ marginBottom: 16 }}>
            <Switch
              id="job-filter-mine"
              checked={params.technicianId === currentUserId}
              onChange={(mine) => change({ technicianId: mine ? currentUserId : undefined })}
            />
          </Form.Item>
        )}
        <Form.Item label="Opened from" htmlFor="job-filter-from" style={{ marginBottom: 16 }}>
          <Input id="job-filter-from" type="date" value={params.from ?? ''} max={params.to} onChange={(e) => change({ from: e.target.value || undefined })} />
        </Form.Item>
        <Form.Item label="Opened to" htmlFor="job-filter-to" style={{ marginBottom: 16 }}>
          <Input id="job-filter-to" type="date" value={params.to ?? ''} min={params.from} onChange={(e) => change({ to: e.target.value || undefined })} />
        </Form.Item>
        {anyFilter && (
          <Form.Item label={<Typography.Text type="secondary">&nbsp;</Typography.Text>} colon={false} style={{ marginBottom: 16 }}>
            <Button
              onClick={() => {
                setCodeText('');
                setCodeError(null);
                onParamsChange({ page: 1, pageSize: params.pageSize, sort: params.sort, order: params.order });
              }}
            >
              Clear filters
            </Button>
          </Form.Item>
        )}
      </Flex>
    </Form>
  );
}
