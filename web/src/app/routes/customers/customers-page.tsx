import { Button, Card } from 'antd';
import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { useListSearchParams } from '@/hooks/use-list-search-params';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { CustomerFormDrawer } from '@/features/customers/components/customer-form-drawer';
import { CustomersTable } from '@/features/customers/components/customers-table';
import { customerSortFields, type Customer, type CustomerListQuery } from '@/features/customers/types';
import { canEditCustomers } from '../../navigation';

export function CustomersPage() {
  const user = useSignedInUser();
  const canEdit = canEditCustomers(user.role);
  const [params, setParams] = useListSearchParams({ sortFields: customerSortFields });
  const [searchParams, setSearchParams] = useSearchParams();
  const [editing, setEditing] = useState<Customer | null>(null);
  const creating = searchParams.get('new') === '1';

  const openCreate = () =>
    setSearchParams((prev) => {
      const next = new URLSearchParams(prev);
      next.set('new', '1');
      return next;
    });
  const close = () => {
    setEditing(null);
    if (creating)
      setSearchParams((prev) => {
        const next = new URLSearchParams(prev);
        next.delete('new');
        return next;
      });
  };

  const query: CustomerListQuery = {
    page: params.page,
    pageSize: params.pageSize,
    sort: params.sort,
    order: params.order,
    search: params.search,
  };

  return (
    <>
      <PageHeader
        title="Customers"
        subtitle="The people whose vehicles you plan, quote and build."
        extra={
          canEdit && (
            <Button type="primary" onClick={openCreate}>
              New customer
            </Button>
          )
        }
      />
      <Card>
        <CustomersTable query={query} onQueryChange={setParams} canEdit={canEdit} onEdit={setEditing} onCreate={openCreate} />
      </Card>
      {canEdit && <CustomerFormDrawer open={creating || Boolean(editing)} customer={editing} onClose={close} />}
    </>
  );
}
