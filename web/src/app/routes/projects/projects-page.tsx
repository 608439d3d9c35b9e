import { Button, Card, Tag } from 'antd';
import { useState } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { toProjectDetail } from '@/config/paths';
import { PageHeader } from '@/components/page-header';
import { useListSearchParams } from '@/hooks/use-list-search-params';
import { useUnits } from '@/hooks/use-units';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { useCustomer } from '@/features/customers/api/get-customer';
import { CustomerFormDrawer } from '@/features/customers/components/customer-form-drawer';
import { ProjectFormDrawer, type CustomerOption } from '@/features/projects/components/project-form-drawer';
import { ProjectsTable } from '@/features/projects/components/projects-table';
import { projectSortFields, projectStatuses, type ProjectListQuery, type ProjectStatus } from '@/features/projects/types';
import { useShop } from '@/features/shop/api/get-shop';
import { canEditProjects } from '../../navigation';
import { useCustomerOptions } from '../shared/use-customer-options';

export function ProjectsPage() {
  const user = useSignedInUser();
  const canEdit = canEditProjects(user.role);
  const navigate = useNavigate();
  const { system } = useUnits();
  const shop = useShop();
  const [params, setParams] = useListSearchParams({ sortFields: projectSortFields, filters: ['status', 'customerId'] });
  const [searchParams, setSearchParams] = useSearchParams();
  const creating = canEdit && searchParams.get('new') === '1';
  const [addingCustomer, setAddingCustomer] = useState(false);
  const [addedCustomer, setAddedCustomer] = useState<CustomerOption | null>(null);
  const customers = useCustomerOptions({ enabled: creating, ownUserId: user.id });
  const filterCustomer = useCustomer(params.customerId as string | undefined);

  const status = projectStatuses.find((s) => s === params.status) as ProjectStatus | undefined;
  const query: ProjectListQuery = {
    page: params.page,
    pageSize: params.pageSize,
    sort: params.sort,
    order: params.order,
    search: params.search,
    status,
    customerId: params.customerId as string | undefined,
  };

  const setNew = (on: boolean) => {
    setAddedCustomer(null);
    setSearchParams((prev) => {
      const next = new URLSearchParams(prev);
      if (on) next.set('new', '1');
      else next.delete('new');
      return next;
    });
  };

  return (
    <>
      <PageHeader
        title="Projects"
        subtitle={user.role === 'fabricator' ? 'Swaps in the shop; filter by stage to find chassis to measure.' : 'Every swap in the shop, from intake to done.'}
        extra={
          canEdit && (
            <Button type="primary" onClick={() => setNew(true)}>
              New project
            </Button>
          )
        }
      />
      {query.customerId && (
        <Tag closable onClose={() => setParams({ customerId: undefined, page: 1 })} style={{ marginBottom: 12 }}>
          Customer: {filterCustomer.data?.name ?? '…'}
        </Tag>
      )}
      <Card>
        <ProjectsTable query={query} onQueryChange={setParams} onCreate={canEdit ? () => setNew(true) : undefined} />
      </Card>
      {canEdit && (
        <>
          <ProjectFormDrawer
            open={creating}
            onClose={() => setNew(false)}
            onSaved={(p) => navigate(toProjectDetail(p.id))}
            customerOptions={customers.options}
            customersLoading={customers.loading}
            onCustomerSearch={customers.onSearch}
            onAddCustomer={() => setAddingCustomer(true)}
            addedCustomer={addedCustomer}
            unitSystem={system}
            currency={shop.data?.currency}
            defaultCustomerId={query.customerId}
            noOtherCustomers={customers.noOtherCustomers}
          />
          <CustomerFormDrawer
            open={addingCustomer}
            onClose={() => setAddingCustomer(false)}
            onSaved={(customer) => setAddedCustomer({ value: customer.id, label: customer.name })}
          />
        </>
      )}
    </>
  );
}
