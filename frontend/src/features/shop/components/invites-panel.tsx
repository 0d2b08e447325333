import type { InviteDto } from '@causeway/shared';
import { Alert, Button, Flex, Form, Select, Table, Tag, Typography, type TableColumnsType } from 'antd';
import { useState } from 'react';
import { INVITABLE_ROLES, ROLE_LABELS, type InvitableRole } from '@/config/roles';
import { formatDateTime } from '@/utils/format';
import { useCreateInvite } from '../api/create-invite';
import { useInvites } from '../api/get-invites';

function inviteStatus(invite: InviteDto, now: number): { label: string; open: boolean } {
  if (invite.usedAt) return { label: 'Used', open: false };
  if (Date.parse(invite.expiresAt) < now) return { label: 'Expired', open: false };
  return { label: 'Open', open: true };
}

type InvitesPanelProps = { locale: string };

export function InvitesPanel({ locale }: InvitesPanelProps) {
  const [role, setRole] = useState<InvitableRole>('technician');
  const [created, setCreated] = useState<InviteDto | null>(null);
  const invites = useInvites();
  const create = useCreateInvite({ mutationConfig: { onSuccess: (invite) => setCreated(invite) } });
  const now = Date.now();

  const columns: TableColumnsType<InviteDto> = [
    {
      title: 'Code',
      dataIndex: 'code',
      render: (code: string) => (
        <Typography.Text code copyable={{ tooltips: ['Copy the code', 'Copied'] }}>
          {code}
        </Typography.Text>
      ),
    },
    { title: 'Role', dataIndex: 'role', render: (r: InvitableRole) => ROLE_LABELS[r] },
    { title: 'Expires', dataIndex: 'expiresAt', render: (iso: string) => formatDateTime(iso, locale) },
    {
      title: 'Status',
      key: 'status',
      render: (_: unknown, invite) => {
        const status = inviteStatus(invite, now);
        return <Tag color={status.open ? 'success' : undefined}>{status.label}</Tag>;
      },
    },
  ];

  return (
    <section aria-labelledby="invites-heading">
      <Typography.Title level={2} id="invites-heading" style={{ fontSize: 22 }}>
        Invite codes
      </Typography.Title>
      <Typography.Paragraph type="secondary">
        Give a code to someone who should join your shop; they enter it when they create their account. Each code works once.
      </Typography.Paragraph>
      <Form layout="inline" onFinish={() => create.mutate({ role })} style={{ marginBottom: 16, rowGap: 8 }}>
        <Form.Item label="Role" htmlFor="invite-role">
          <Select<InvitableRole>
            id="invite-role"
            value={role}
            onChange={setRole}
            style={{ minWidth: 180 }}
            options={INVITABLE_ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))}
          />
        </Form.Item>
        <Button type="primary" htmlType="submit" loading={create.isPending}>
          Create invite code
        </Button>
      </Form>
      {create.isError && <Alert type="error" showIcon title={create.error.message} style={{ marginBottom: 16 }} />}
      {created && (
        <Alert
          type="success"
          showIcon
          style={{ marginBottom: 16 }}
          title={
            <Flex gap={8} wrap align="center">
              <span>New code for a {ROLE_LABELS[created.role].toLowerCase()}:</span>
              <Typography.Text code strong copyable style={{ fontSize: 18 }}>
                {created.code}
              </Typography.Text>
              <span>valid until {formatDateTime(created.expiresAt, locale)}.</span>
            </Flex>
          }
        />
      )}
      {invites.isError ? (
        <Alert type="error" showIcon title={invites.error.message} />
      ) : (
        <Table<InviteDto>
          rowKey="code"
          size="middle"
          columns={columns}
          dataSource={invites.data ?? []}
          loading={invites.isPending}
          pagination={{ pageSize: 10, hideOnSinglePage: true }}
          locale={{ emptyText: 'No invite codes yet' }}
        />
      )}
    </section>
  );
}
