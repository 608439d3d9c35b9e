import { Button, Flex, Grid, Popconfirm, Select, Table, Tag, Typography } from 'antd';
import type { ColumnsType } from 'antd/es/table';
import { EmailAddress } from '@/components/email-address';
import { EmptyState, QueryState } from '@/components/query-state';
import { formatDate } from '@/lib/dates';
import { ROLES as roles, type Role } from '@swapwright/shared';
import { useDeleteMembership } from '../api/delete-membership';
import { useMemberships } from '../api/get-memberships';
import { useUpdateMembership } from '../api/update-membership';
import { roleHints, roleLabels, type Membership } from '../types';

export type MembersTableProps = { currentUserId: string };

export function MembersTable({ currentUserId }: MembersTableProps) {
  const members = useMemberships();
  const updateRole = useUpdateMembership();
  const remove = useDeleteMembership();
  // Below antd's md (768 px) email and role sit under the name, so a phone shows who does what without scrolling.
  const narrow = Grid.useBreakpoint().md !== true;

  const roleCell = (m: Membership) =>
    m.userId === currentUserId || m.role === 'customer' ? (
      roleLabels[m.role]
    ) : (
      <Select<Role>
        size="small"
        value={m.role}
        style={{ minWidth: 150 }}
        aria-label={`Role of ${m.name}`}
        loading={updateRole.isPending && updateRole.variables?.id === m.id}
        onChange={(role) => updateRole.mutate({ id: m.id, role })}
        options={roles
          .filter((r) => r !== 'customer')
          .map((r) => ({ value: r, label: roleLabels[r], title: roleHints[r] }))}
      />
    );

  const columns: ColumnsType<Membership> = [
    {
      title: 'Name',
      dataIndex: 'name',
      key: 'name',
      // names break between words only, never inside one
      render: (name: string, m) => (
        <Flex vertical gap={4} align="flex-start">
          <span style={{ wordBreak: 'normal', overflowWrap: 'normal', whiteSpace: 'nowrap' }} data-testid="member-name">
            <Typography.Text strong>{name}</Typography.Text>
            {m.userId === currentUserId && <Tag style={{ marginInlineStart: 8 }}>you</Tag>}
          </span>
          {narrow && (
            <>
              <EmailAddress email={m.email} small />
              {roleCell(m)}
            </>
          )}
        </Flex>
      ),
    },
    { title: 'Email', dataIndex: 'email', key: 'email', responsive: ['md'], render: (email: string) => <EmailAddress email={email} /> },
    { title: 'Role', key: 'role', responsive: ['md'], render: (_, m) => roleCell(m) },
    { title: 'Joined', dataIndex: 'createdAt', key: 'createdAt', render: formatDate, responsive: ['md'] },
    {
      title: <span className="sr-only">Actions</span>,
      key: 'actions',
      align: 'right',
      // stays in view when a narrow screen scrolls the table sideways
      fixed: 'right',
      render: (_, m) =>
        m.userId === currentUserId ? null : (
          <Popconfirm
            title={`Remove ${m.name} from the shop?`}
            description="They lose access at once. Their past work stays on the projects."
            okText="Remove"
            okButtonProps={{ danger: true }}
            onConfirm={() => remove.mutateAsync(m.id)}
          >
            <Button size="small" type="text" danger aria-label={`Remove ${m.name}`}>
              Remove
            </Button>
          </Popconfirm>
        ),
    },
  ];

  return (
    <QueryState
      query={members}
      isEmpty={(list) => list.length === 0}
      empty={<EmptyState description="Only you so far. Invite the people who work with you." />}
    >
      {(list) => <Table<Membership> aria-label="Members" rowKey="id" columns={columns} dataSource={list} pagination={false} scroll={{ x: 'max-content' }} />}
    </QueryState>
  );
}
