import { Button, Input, Space, Table } from 'antd';
import { useState } from 'react';
import { serverPagination } from '@/lib/table';
import { type Supplier, type SupplierListQuery, useSuppliers } from '../api/get-suppliers';
import { SupplierFormDrawer } from './supplier-form-drawer';

/** The shop's suppliers: server-side paging and search by name; add and edit in a drawer. */
export function SuppliersTable({ canEdit }: { canEdit: boolean }) {
  const [query, setQuery] = useState<SupplierListQuery>({ page: 1, pageSize: 20 });
  const suppliers = useSuppliers(query);
  const [editing, setEditing] = useState<Supplier | null | undefined>(undefined);
  return (
    <Space direction="vertical" style={{ width: '100%' }}>
      <Space wrap>
        <Input.Search
          aria-label="Search suppliers"
          placeholder="Supplier name"
          allowClear
          style={{ width: 260, maxWidth: '100%' }}
          onSearch={(search) => setQuery((q) => ({ ...q, page: 1, search: search || undefined }))}
        />
        {canEdit && (
          <Button type="primary" onClick={() => setEditing(null)}>
            New supplier
          </Button>
        )}
      </Space>
      <Table<Supplier>
        size="small"
        rowKey="id"
        loading={suppliers.isFetching}
        dataSource={suppliers.data?.items ?? []}
        pagination={serverPagination(query, suppliers.data?.total)}
        onChange={(pagination) => setQuery((q) => ({ ...q, page: pagination.current ?? 1, pageSize: pagination.pageSize ?? 20 }))}
        columns={[
          { title: 'Name', dataIndex: 'name' },
          { title: 'Contact', dataIndex: 'contact', render: (v: string | null) => v ?? '—', responsive: ['md'] },
          { title: 'Email', dataIndex: 'email', render: (v: string | null) => v ?? '—', responsive: ['md'] },
          { title: 'Phone', dataIndex: 'phone', render: (v: string | null) => v ?? '—' },
          ...(canEdit
            ? [{ title: '', key: 'edit', width: 70, render: (_: unknown, s: Supplier) => <Button size="small" onClick={() => setEditing(s)}>Edit</Button> }]
            : []),
        ]}
      />
      <SupplierFormDrawer open={editing !== undefined} supplier={editing} onClose={() => setEditing(undefined)} />
    </Space>
  );
}
