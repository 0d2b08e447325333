import type { UserDto } from '@causeway/shared';
import { Alert, Space, Table, Tag, Typography, type TableColumnsType } from 'antd';
import { ROLE_LABELS } from '@/config/roles';
import { formatDate } from '@/utils/format';
import { useMembers } from '../api/get-members';

type MembersTableProps = { locale: string };

export function MembersTable({ locale }: MembersTableProps) {
  const members = useMembers();
  const columns: TableColumnsType<UserDto> = [
    { title: 'Name', dataIndex: 'displayName' },
    { title: 'E-mail', dataIndex: 'email' },
    {
      title: 'Role',
      key: 'role',
      render: (_: unknown, member) => (
        <Space size={4} wrap>
          <Tag>{ROLE_LABELS[member.role]}</Tag>
          {member.shopOwner && <Tag>Shop owner</Tag>}
        </Space>
      ),
    },
    { title: 'Joined', dataIndex: 'createdAt', render: (iso: string) => formatDate(iso, locale) },
    {
      title: 'Account',
      dataIndex: 'disabled',
      render: (disabled: boolean) => (disabled ? <Tag color="error">Disabled</Tag> : 'Active'),
    },
  ];

  return (
    <section aria-labelledby="members-heading">
      <Typography.Title level={2} id="members-heading" style={{ fontSize: 22 }}>
        Members
      </Typography.Title>
      {members.isError ? (
        <Alert type="error" showIcon title={members.error.message} />
      ) : (
        <Table<UserDto>
          rowKey="id"
          size="middle"
          columns={columns}
          dataSource={members.data ?? []}
          loading={members.isPending}
          pagination={{ pageSize: 20, hideOnSinglePage: true }}
          locale={{ emptyText: 'Nobody has joined yet' }}
        />
      )}
    </section>
  );
}
