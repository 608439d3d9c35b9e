import { Button, Flex, Grid, Input, Popconfirm, Space, Table, Tag, Typography } from 'antd';
import type { ColumnsType, TableProps } from 'antd/es/table';
import { EmailAddress } from '@/components/email-address';
import { ErrorState, EmptyState } from '@/components/query-state';
import { formatDate, serverPagination, sorterToParams, sortOrderFor } from '@/lib/table';
import { useCustomers } from '../api/get-customers';
import { useDeleteCustomer } from '../api/delete-customer';
import { ownRecordWords } from '../own-record';
import { customerSortFields, type Customer, type CustomerListQuery } from '../types';

export type CustomersTableProps = {
  query: CustomerListQuery;
  onQueryChange: (patch: Partial<CustomerListQuery>) => void;
  canEdit?: boolean;
  onEdit?: (customer: Customer) => void;
  onCreate?: () => void;
};

export function CustomersTable({ query, onQueryChange, canEdit = false, onEdit, onCreate }: CustomersTableProps) {
  const customers = useCustomers(query);
  const remove = useDeleteCustomer();
  // Below antd's md (768 px) email and phone ride under the name, so the name is not broken mid-word.
  const narrow = Grid.useBreakpoint().md !== true;

  const columns: ColumnsType<Customer> = [
    {
      title: 'Name',
      dataIndex: 'name',
      key: 'name',
      sorter: true,
      sortOrder: sortOrderFor('name', query.sort, query.order),
      render: (name: string, c) => (
        <Flex vertical>
          <Flex wrap gap={6} align="center">
            {canEdit && onEdit ? (
              <Typography.Link onClick={() => onEdit(c)} strong>
                {name}
              </Typography.Link>
            ) : (
              <Typography.Text strong>{name}</Typography.Text>
            )}
            {c.ownRecord && (
              <Tag color="blue" style={{ marginInlineEnd: 0 }} data-testid="own-record-tag">
                {ownRecordWords.tag}
              </Tag>
            )}
          </Flex>
          {c.ownRecord && (
            <Typography.Text type="secondary" style={{ fontSize: 13 }}>
              {ownRecordWords.note}
            </Typography.Text>
          )}
          {narrow && c.email && <EmailAddress email={c.email} small />}
          {narrow && c.phone && <a href={`tel:${c.phone.replace(/[^\d+]/g, '')}`} style={{ fontSize: 13 }}>{c.phone}</a>}
        </Flex>
      ),
    },
    {
      title: 'Email',
      dataIndex: 'email',
      key: 'email',
      sorter: true,
      sortOrder: sortOrderFor('email', query.sort, query.order),
      render: (email: string | null) => (email ? <EmailAddress email={email} /> : '—'),
      responsive: ['md'],
    },
    { title: 'Phone', dataIndex: 'phone', key: 'phone', render: (p: string | null) => p || '—', responsive: ['md'] },
    {
      title: 'Portal',
      key: 'portal',
      render: (_, c) =>
        c.ownRecord ? (
          <Typography.Text type="secondary">{ownRecordWords.portal}</Typography.Text>
        ) : c.userId ? (
          <Typography.Text type="success">Signed up</Typography.Text>
        ) : (
          <Typography.Text type="secondary">Not invited</Typography.Text>
        ),
      responsive: ['lg'],
    },
    {
      title: 'Added',
      dataIndex: 'createdAt',
      key: 'createdAt',
      sorter: true,
      sortOrder: sortOrderFor('createdAt', query.sort, query.order),
      render: formatDate,
      responsive: ['md'],
    },
    {
      title: 'Last change',
      dataIndex: 'updatedAt',
      key: 'updatedAt',
      sorter: true,
      sortOrder: sortOrderFor('updatedAt', query.sort, query.order),
      render: formatDate,
      responsive: ['sm'],
    },
  ];

  if (canEdit) {
    columns.push({
      title: <span className="sr-only">Actions</span>,
      key: 'actions',
      align: 'right',
      render: (_, c) => (
        <Space size={4}>
          <Button size="small" type="text" onClick={() => onEdit?.(c)} aria-label={`Edit ${c.name}`}>
            Edit
          </Button>
          {/* one's own record holds one's own-truck projects and comes back at the next one: nothing to remove */}
          {!c.ownRecord && (
            <Popconfirm
              title={`Remove ${c.name}?`}
              description="Their projects stay; the customer record goes."
              okText="Remove"
              okButtonProps={{ danger: true }}
              onConfirm={() => remove.mutateAsync(c.id)}
            >
              <Button size="small" type="text" danger aria-label={`Remove ${c.name}`}>
                Remove
              </Button>
            </Popconfirm>
          )}
        </Space>
      ),
    });
  }

  const onChange: TableProps<Customer>['onChange'] = (pagination, _filters, sorter, extra) => {
    if (extra.action === 'sort') {
      onQueryChange({ ...sorterToParams(sorter, customerSortFields), page: 1 });
    } else if (extra.action === 'paginate') {
      const pageSize = pagination.pageSize ?? query.pageSize;
      onQueryChange({ page: pageSize !== query.pageSize ? 1 : (pagination.current ?? 1), pageSize });
    }
  };

  if (customers.isError && !customers.data) {
    return <ErrorState error={customers.error} onRetry={() => void customers.refetch()} />;
  }

  const page = customers.data;
  const noneAtAll = page && page.total === 0 && !query.search;

  return (
    <Flex vertical gap={12}>
      <Input.Search
        allowClear
        placeholder="Search by name, email or phone"
        aria-label="Search customers"
        defaultValue={query.search}
        onSearch={(value) => onQueryChange({ search: value.trim() || undefined, page: 1 })}
        style={{ maxWidth: 360 }}
      />
      <Table<Customer>
        aria-label="Customers"
        data-testid="customers-table"
        rowKey="id"
        columns={columns}
        dataSource={page?.items ?? []}
        loading={customers.isFetching}
        onChange={onChange}
        sortDirections={['ascend', 'descend', 'ascend']}
        pagination={serverPagination(query, page?.total)}
        locale={{
          emptyText: customers.isPending ? (
            ' '
          ) : noneAtAll ? (
            <EmptyState
              description="No customers yet. Add the first one to open projects for them."
              action={
                canEdit && onCreate ? (
                  <Button type="primary" onClick={onCreate}>
                    Add a customer
                  </Button>
                ) : undefined
              }
            />
          ) : (
            <EmptyState
              description={`No customer matches “${query.search ?? ''}”.`}
              action={<Button onClick={() => onQueryChange({ search: undefined, page: 1 })}>Clear search</Button>}
            />
          ),
        }}
      />
    </Flex>
  );
}
