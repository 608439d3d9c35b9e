import { Button, Flex, Input, Popconfirm, Space, Table, Typography } from 'antd';
import type { ColumnsType } from 'antd/es/table';
import type { ReactNode } from 'react';
import { ErrorState } from '@/components/query-state';
import { useUnits } from '@/hooks/use-units';
import { formatDate, serverPagination } from '@/lib/table';
import { useDeleteCatalogItem } from '../api/delete-catalog-item';
import { useCatalogItems } from '../api/get-catalog-items';
import { kindDefinitions } from '../lib/catalog-kinds';
import type { CatalogItem, CatalogKind, CatalogListQuery } from '../types';

export type CatalogTableProps = {
  kind: CatalogKind;
  query: CatalogListQuery;
  onQueryChange: (patch: Partial<CatalogListQuery>) => void;
  canEdit?: boolean;
  onEdit?: (item: CatalogItem) => void;
  onCreate?: () => void;
  /** Shown above the table while this kind has no entries at all (no search): the way to fill an empty catalog. */
  emptyOffer?: ReactNode;
};

/** One kind of the catalog: paginated and searched on the server. */
export function CatalogTable({ kind, query, onQueryChange, canEdit = false, onEdit, onCreate, emptyOffer }: CatalogTableProps) {
  const def = kindDefinitions[kind];
  const items = useCatalogItems(kind, query);
  const remove = useDeleteCatalogItem();
  const units = useUnits();

  const show = (field: string, value: unknown): string => {
    const f = def.fields.find((x) => x.name === field);
    if (value === undefined || value === null || value === '') return '—';
    if (f?.type === 'length' && typeof value === 'number') return units.formatLength(value);
    if (typeof value === 'boolean') return value ? 'Yes' : 'No';
    const label = (v: unknown) => f?.options?.find((o) => o.value === v)?.label ?? String(v);
    if (Array.isArray(value)) return value.map(label).join(', ') || '—';
    if (f?.options) return label(value);
    return `${String(value)}${f?.suffix ? ` ${f.suffix}` : ''}`;
  };

  const columns: ColumnsType<CatalogItem> = [
    {
      title: 'Name',
      dataIndex: 'name',
      key: 'name',
      render: (name: string, item) =>
        canEdit && onEdit ? (
          <Typography.Link strong onClick={() => onEdit(item)}>
            {name}
          </Typography.Link>
        ) : (
          <Typography.Text strong>{name}</Typography.Text>
        ),
    },
    ...def.columns.map((c) => ({
      title: def.fields.find((f) => f.name === c)?.label ?? def.columnLabels?.[c] ?? c,
      key: c,
      render: (_: unknown, item: CatalogItem) => show(c, (item.spec as Record<string, unknown> | undefined)?.[c]),
      responsive: ['md' as const],
    })),
    { title: 'Last change', key: 'updatedAt', render: (_, item) => formatDate(item.updatedAt), responsive: ['lg'] },
  ];
  if (canEdit)
    columns.push({
      title: <span className="sr-only">Actions</span>,
      key: 'actions',
      align: 'right',
      render: (_, item) => (
        <Space size={4}>
          <Button size="small" type="text" onClick={() => onEdit?.(item)} aria-label={`Edit ${item.name}`}>
            Edit
          </Button>
          <Popconfirm
            title={`Delete ${item.name}?`}
            description="Projects that picked it keep their stored reports."
            okText="Delete"
            okButtonProps={{ danger: true }}
            onConfirm={() => remove.mutateAsync({ kind, id: item.id })}
          >
            <Button size="small" type="text" danger aria-label={`Delete ${item.name}`}>
              Delete
            </Button>
          </Popconfirm>
        </Space>
      ),
    });

  if (items.isError) return <ErrorState error={items.error} onRetry={() => void items.refetch()} />;

  const empty = items.data?.total === 0 && !query.search;
  return (
    <Flex vertical gap={12}>
      {empty && emptyOffer}
      <Flex justify="space-between" gap={12} wrap>
        <Input.Search
          allowClear
          placeholder={`Search ${def.label.toLowerCase()}`}
          aria-label={`Search ${def.label.toLowerCase()}`}
          defaultValue={query.search}
          onSearch={(search) => onQueryChange({ search: search || undefined, page: 1 })}
          style={{ maxWidth: 360 }}
        />
        {canEdit && onCreate && (
          <Button type="primary" onClick={onCreate}>
            Add {def.singular}
          </Button>
        )}
      </Flex>
      <Table<CatalogItem>
        rowKey="id"
        aria-label={def.label}
        loading={items.isFetching}
        columns={columns}
        dataSource={items.data?.items ?? []}
        locale={{ emptyText: `No ${def.label.toLowerCase()} in the catalog yet.` }}
        pagination={serverPagination(query, items.data?.total)}
        onChange={(p) => onQueryChange({ page: p.current ?? 1, pageSize: p.pageSize ?? query.pageSize })}
      />
    </Flex>
  );
}
