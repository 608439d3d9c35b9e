import { Table, Tag } from 'antd';
import type { ColumnsType } from 'antd/es/table';
import { EmailAddress } from '@/components/email-address';
import { EmptyState, QueryState } from '@/components/query-state';
import { formatDate } from '@/lib/table';
import { useInvitations } from '../api/get-invitations';
import { roleLabels, type Invitation } from '../types';

function invitationState(inv: Invitation): { label: string; color: string } {
  if (inv.acceptedAt) return { label: 'Joined', color: 'success' };
  if (new Date(inv.expiresAt).getTime() < Date.now()) return { label: 'Expired', color: 'default' };
  return { label: 'Waiting', color: 'processing' };
}

export function InvitationsTable() {
  const invitations = useInvitations();
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
