import { Button, Input, Select, Space, Switch, Table, Typography } from 'antd';
import { PART_CATEGORIES, PART_CATEGORY_LABELS, type CatalogPartCategory } from '@swapwright/shared';
import { Fragment, useState } from 'react';
import { BinCode } from '@/components/bin-code';
import { serverPagination } from '@/lib/table';
import { formatMoneyCents } from '@/lib/units';
import { downloadPartsCsv } from '../api/download-parts-csv';
import { type Part, type PartListQuery, useParts } from '../api/get-parts';
import { useSuppliers } from '../api/get-suppliers';
import { PartFormDrawer } from './part-form-drawer';

/** The shop's parts with stock and bins: server-side paging, search and filters; add and edit parts in a drawer. */
/** `currency`: the shop's, for the prices. */
export function PartsTable({ canEdit = false, currency }: { canEdit?: boolean; currency?: string }) {
  const [query, setQuery] = useState<PartListQuery>({ page: 1, pageSize: 20 });
  const parts = useParts(query);
  const suppliers = useSuppliers({ page: 1, pageSize: 100 });
  const [editing, setEditing] = useState<Part | null | undefined>(undefined);
  return (
    <Space direction="vertical" style={{ width: '100%' }}>
      <Space wrap>
        <Input.Search
          aria-label="Search parts"
          placeholder="SKU, description or supplier SKU"
          allowClear
          style={{ width: 280, maxWidth: '100%' }}
          onSearch={(search) => setQuery((q) => ({ ...q, page: 1, search: search || undefined }))}
        />
        <Select<CatalogPartCategory>
          aria-label="Category"
          allowClear
          placeholder="Every category"
          style={{ width: 220, maxWidth: '100%' }}
          options={PART_CATEGORIES.map((value) => ({ value, label: PART_CATEGORY_LABELS[value] }))}
          onChange={(category) => setQuery((q) => ({ ...q, page: 1, category }))}
        />
        <Select<string>
          aria-label="Supplier"
          allowClear
          placeholder="Every supplier"
          style={{ width: 200, maxWidth: '100%' }}
          options={(suppliers.data?.items ?? []).map((s) => ({ value: s.id, label: s.name }))}
          onChange={(supplierId) => setQuery((q) => ({ ...q, page: 1, supplierId }))}
        />
        <Space>
          <Switch aria-label="In stock only" onChange={(inStock) => setQuery((q) => ({ ...q, page: 1, inStock: inStock || undefined }))} />
          <Typography.Text>In stock only</Typography.Text>
        </Space>
        <Button onClick={() => void downloadPartsCsv()}>Export CSV</Button>
        {canEdit && (
          <Button type="primary" onClick={() => setEditing(null)}>
            New part
          </Button>
        )}
      </Space>
      <Table<Part>
        size="small"
        rowKey="id"
        loading={parts.isFetching}
        dataSource={parts.data?.items ?? []}
        pagination={serverPagination(query, parts.data?.total)}
        onChange={(pagination) => setQuery((q) => ({ ...q, page: pagination.current ?? 1, pageSize: pagination.pageSize ?? 20 }))}
        scroll={{ x: true }}
        columns={[
          { title: 'SKU', dataIndex: 'sku', onCell: () => ({ style: { whiteSpace: 'nowrap' } }) },
          { title: 'Description', dataIndex: 'description' },
          { title: 'Category', dataIndex: 'category', responsive: ['md'], render: (c: CatalogPartCategory) => PART_CATEGORY_LABELS[c] ?? c },
          { title: 'Price', dataIndex: 'priceCents', align: 'right', render: (v: number) => formatMoneyCents(v, currency) },
          { title: 'Supplier', dataIndex: 'supplierName', responsive: ['md'], render: (v: string | null, p) => (v ? `${v}${p.supplierSku ? ` · ${p.supplierSku}` : ''}` : '—') },
          { title: 'On hand', dataIndex: 'onHand', align: 'right', responsive: ['md'] },
          { title: 'Free', dataIndex: 'available', align: 'right' },
          {
            title: 'Bins',
            key: 'bins',
            // Each place wraps between the store and its bin, never inside the bin code.
            render: (_, p) =>
              p.stock.length === 0
                ? '—'
                : p.stock.map((s, i) => (
                    <Fragment key={s.id}>
                      {i > 0 && ', '}
                      {s.location}
                      {s.bin && (
                        <>
                          {' '}
                          <BinCode code={s.bin} />
                        </>
                      )}
                    </Fragment>
                  )),
          },
          ...(canEdit
            ? [{ title: '', key: 'edit', width: 70, render: (_: unknown, p: Part) => <Button size="small" aria-label={`Edit ${p.sku}`} onClick={() => setEditing(p)}>Edit</Button> }]
            : []),
        ]}
      />
      <PartFormDrawer open={editing !== undefined} part={editing} onClose={() => setEditing(undefined)} />
    </Space>
  );
}
