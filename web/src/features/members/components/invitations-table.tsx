import { Button, Popconfirm, Space, Table, Tag } from 'antd';
import type { ColumnsType } from 'antd/es/table';
import { EmailAddress } from '@/components/email-address';
import { EmptyState, QueryState } from '@/components/query-state';
import { formatDate } from '@/lib/table';
import { notifySuccess } from '@/lib/notifier';
import { useResendInvitation, useWithdrawInvitation } from '../api/invitation-actions';
import { useInvitations } from '../api/get-invitations';
import { roleLabels, type Invitation } from '../types';

function invitationState(inv: Invitation): { label: string; color: string } {
  if (inv.acceptedAt) return { label: 'Joined', color: 'success' };
  if (new Date(inv.expiresAt).getTime() < Date.now()) return { label: 'Expired', color: 'default' };
  return { label: 'Waiting', color: 'processing' };
}

export function InvitationsTable() {
  const invitations = useInvitations();
  const resend = useResendInvitation({
    onSuccess: (inv) => notifySuccess({ title: 'Invitation sent again', description: `${inv.email} gets a new link, valid to ${formatDate(inv.expiresAt)}; the old one no longer works.` }),
  });
  const withdraw = useWithdrawInvitation({ onSuccess: () => notifySuccess({ title: 'Invitation withdrawn', description: 'Its link no longer works.' }) });
  const columns: ColumnsType<Invitation> = [
    { title: 'Email', dataIndex: 'email', key: 'email', render: (email: string) => <EmailAddress email={email} /> },
    { title: 'Role', dataIndex: 'role', key: 'role', render: (r: Invitation['role']) => roleLabels[r] },
    {
      title: 'State',
      key: 'state',
      render: (_, inv) => {
        const s = invitationState(inv);
        return <Tag color={s.color}>{s.label}</Tag>;
      },
    },
    { title: 'Link expires', dataIndex: 'expiresAt', key: 'expiresAt', render: formatDate },
    {
      title: '',
      key: 'actions',
      align: 'right',
      render: (_, inv) =>
        !inv.acceptedAt && (
          <Space size={4} wrap>
            <Button size="small" onClick={() => resend.mutate(inv.id)} loading={resend.isPending && resend.variables === inv.id} aria-label={`Send again to ${inv.email}`}>
              Send again
            </Button>
            <Popconfirm
              title={`Withdraw the invitation of ${inv.email}?`}
              description="Its link stops working. You can invite the address again later."
              okText="Withdraw"
              okButtonProps={{ danger: true }}
              onConfirm={() => withdraw.mutate(inv.id)}
            >
              <Button size="small" danger type="text" aria-label={`Withdraw the invitation of ${inv.email}`}>
                Withdraw
              </Button>
            </Popconfirm>
          </Space>
        ),
    },
  ];
  return (
    <QueryState
      query={invitations}
      loadingRows={2}
      isEmpty={(list) => list.length === 0}
      empty={<EmptyState description="No invitations sent yet." />}
    >
      {(list) => (
        <Table<Invitation> aria-label="Invitations" rowKey="id" size="small" columns={columns} dataSource={list} pagination={{ pageSize: 10, hideOnSinglePage: true }} />
      )}
    </QueryState>
  );
}
