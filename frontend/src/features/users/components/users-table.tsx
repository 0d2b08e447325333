import { ROLES, type Role, type UserDto } from '@causeway/shared';
import { Alert, App, Input, Select, Space, Switch, Table, Tag, Typography, type TableColumnsType } from 'antd';
import { ROLE_LABELS } from '@/config/roles';
import { useTableParams } from '@/hooks/use-table-params';
import { formatDate } from '@/utils/format';
import { useUpdateUser } from '../api/update-user';
import { useUsers } from '../api/get-users';
import { USER_TABLE, type UserListParams } from '../utils/list-params';

type UsersTableProps = {
  params: UserListParams;
  onParamsChange: (params: UserListParams) => void;
  /** The admin using the page: they cannot take away their own role or disable themselves. */
  currentUserId: string;
  locale: string;
};

export function UsersTable({ params, onParamsChange, currentUserId, locale }: UsersTableProps) {
  const { message } = App.useApp();
  const users = useUsers(params);
  const table = useTableParams(params, onParamsChange, { ...USER_TABLE, filtersOf: (filters) => ({ role: ROLES.find((r) => r === filters.role?.[0]) }) });
  const update = useUpdateUser({
    mutationConfig: {
      onSuccess: (user, { data }) => {
        void message.success(
          data.role ? `${user.displayName} is now ${ROLE_LABELS[user.role].toLowerCase()}` : `${user.displayName}'s account is ${user.disabled ? 'disabled' : 'enabled'}`,
        );
      },
      onError: (error) => void message.error(error.message),
    },
  });
  const busyId = update.isPending ? update.variables?.id : undefined;

  const columns: TableColumnsType<UserDto> = [
    { title: 'Name', dataIndex: 'displayName', ...table.sortable('displayName') },
    { title: 'E-mail', dataIndex: 'email', ...table.sortable('email') },
    { title: 'Shop', key: 'shop', render: (_: unknown, user) => user.shop?.name ?? <Typography.Text type="secondary">None</Typography.Text> },
    {
      title: 'Role',
      ...table.sortable('role'),
      filters: ROLES.map((r) => ({ text: ROLE_LABELS[r], value: r })),
      filterMultiple: false,
      filteredValue: params.role ? [params.role] : null,
      render: (_: unknown, user) => (
        <Space size={4} wrap>
          <Select<Role>
            aria-label={`Role of ${user.email}`}
            value={user.role}
            disabled={user.id === currentUserId || busyId === user.id}
            onChange={(role) => update.mutate({ id: user.id, data: { role } })}
            options={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))}
            style={{ minWidth: 150 }}
          />
          {user.shopOwner && <Tag>Shop owner</Tag>}
        </Space>
      ),
    },
    { title: 'Joined', dataIndex: 'createdAt', ...table.sortable('createdAt'), render: (iso: string) => formatDate(iso, locale) },
    {
      title: 'Active',
      key: 'disabled',
      render: (_: unknown, user) => (
        <Switch
          aria-label={`Account of ${user.email} enabled`}
          checked={!user.disabled}
          checkedChildren="On"
          unCheckedChildren="Off"
          disabled={user.id === currentUserId}
          loading={busyId === user.id}
          onChange={(enabled) => update.mutate({ id: user.id, data: { disabled: !enabled } })}
        />
      ),
    },
  ];

  return (
    <>
      <Input.Search
        key={params.q}
        defaultValue={params.q}
        placeholder="Search by name or e-mail"
        aria-label="Search users by name or e-mail"
        allowClear
        enterButton="Search"
        onSearch={(q) => table.refine({ q: q.trim() })}
        style={{ maxWidth: 480, marginBottom: 16 }}
      />
      {users.isError && <Alert type="error" showIcon title={users.error.message} style={{ marginBottom: 16 }} />}
      <Table<UserDto>
        rowKey="id"
        columns={columns}
        dataSource={users.data?.items ?? []}
        loading={users.isFetching}
        onChange={table.onChange}
        scroll={{ x: 'max-content' }}
        locale={{ emptyText: params.q ? `No users match "${params.q}"` : 'No users' }}
        pagination={table.pagination(users.data?.total ?? 0, (total) => `${total} ${total === 1 ? 'user' : 'users'}`)}
      />
    </>
  );
}
