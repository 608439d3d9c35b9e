import { Card, Col, Row } from 'antd';
import { PageHeader } from '@/components/page-header';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { InvitationsTable } from '@/features/members/components/invitations-table';
import { InviteForm } from '@/features/members/components/invite-form';
import { MembersTable } from '@/features/members/components/members-table';
import { useCustomerOptions } from '../shared/use-customer-options';

export function MembersPage() {
  const user = useSignedInUser();
  // one's own record is not a customer to invite
  const customers = useCustomerOptions({ withoutOwnRecord: true });
  return (
    <>
      <PageHeader title="Members" subtitle="Who works in the shop, in which role, and who can follow their own projects." />
      {/* the members table takes the full width on a desktop, so none of its columns is cut off */}
      <Card title="People in the shop" style={{ marginBottom: 16 }}>
        <MembersTable currentUserId={user.id} />
      </Card>
      <Row gutter={[16, 16]}>
        <Col xs={24} xl={14}>
          <Card title="Invitations">
            <InvitationsTable />
          </Card>
        </Col>
        <Col xs={24} xl={10}>
          <Card title="Invite someone">
            <InviteForm customerOptions={customers.options} customersLoading={customers.loading} onCustomerSearch={customers.onSearch} />
          </Card>
        </Col>
      </Row>
    </>
  );
}
