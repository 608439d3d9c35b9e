import { Button, Flex, Grid, Input, Select, Table, Typography } from 'antd';
import type { ColumnsType, TableProps } from 'antd/es/table';
import { Link } from 'react-router-dom';
import { toProjectDetail } from '@/config/paths';
import { EmptyState, ErrorState } from '@/components/query-state';
import { formatDate, serverPagination, sorterToParams, sortOrderFor } from '@/lib/table';
import { useProjects } from '../api/get-projects';
import { statusLabels, useLabels } from '../project-labels';
import { projectSortFields, projectStatuses, type Project, type ProjectListQuery, type ProjectStatus } from '../types';
import { ProjectStatusTag } from './project-status-tag';

export type ProjectsTableProps = {
  query: ProjectListQuery;
  onQueryChange: (patch: Partial<ProjectListQuery>) => void;
  showCustomer?: boolean;
  onCreate?: () => void;
  /** Text for the empty state when nothing exists yet. */
  emptyText?: string;
};

/** The table's usual funnel, named for the screen reader (antd's own trigger reads only "filter"). */
function FunnelIcon({ label }: { label: string }) {
  return (
    <span role="img" aria-label={label} className="anticon">
      <svg viewBox="64 64 896 896" width="1em" height="1em" fill="currentColor" aria-hidden="true" focusable="false">
        <path d="M349 838c0 17.7 14.2 32 31.8 32h262.4c17.6 0 31.8-14.3 31.8-32V642H349v196zm531.1-684H143.9c-24.5 0-39.8 26.7-27.5 48l221.3 376h348.8l221.3-376c12.1-21.3-3.2-48-27.7-48z" />
      </svg>
    </span>
  );
}

export function ProjectsTable({ query, onQueryChange, showCustomer = true, onCreate, emptyText }: ProjectsTableProps) {
  const projects = useProjects(query);
  // Below antd's md (768 px) the customer rides under the title and the stage filter sits beside the search,
  // so a phone shows two readable columns instead of a title squeezed to one word a line.
  const narrow = Grid.useBreakpoint().md !== true;

  const columns: ColumnsType<Project> = [
    {
      title: 'Project',
      dataIndex: 'title',
      key: 'title',
      sorter: true,
      sortOrder: sortOrderFor('title', query.sort, query.order),
      render: (title: string, p) => (
        <Flex vertical>
          <Link to={toProjectDetail(p.id)} style={{ fontWeight: 600 }}>
            {title}
          </Link>
          {showCustomer && narrow && p.customer?.name && <Typography.Text style={{ fontSize: 13 }}>{p.customer.name}</Typography.Text>}
          <Typography.Paragraph type="secondary" style={{ fontSize: 13, margin: 0 }} ellipsis={narrow ? { rows: 2, tooltip: p.vehicleDescription } : false}>
            {p.vehicleDescription}
          </Typography.Paragraph>
        </Flex>
      ),
    },
    ...(showCustomer
      ? ([{ title: 'Customer', key: 'customer', responsive: ['md'], render: (_: unknown, p: Project) => p.customer?.name ?? '—' }] as ColumnsType<Project>)
      : []),
    {
      title: 'Use',
      key: 'use',
      responsive: ['lg'],
      render: (_, p) => (p.goals?.use ? useLabels[p.goals.use] : '—'),
    },
    {
      title: 'Stage',
      dataIndex: 'status',
      key: 'status',
      sorter: true,
      sortOrder: sortOrderFor('status', query.sort, query.order),
      filters: projectStatuses.map((s) => ({ text: statusLabels[s], value: s })),
      filterMultiple: false,
      filterIcon: () => <FunnelIcon label="Filter by stage" />,
      filteredValue: query.status ? [query.status] : null,
      render: (status: ProjectStatus) => <ProjectStatusTag status={status} />,
    },
    {
      title: 'Opened',
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

  const onChange: TableProps<Project>['onChange'] = (pagination, filters, sorter, extra) => {
    if (extra.action === 'sort') {
      onQueryChange({ ...sorterToParams(sorter, projectSortFields), page: 1 });
    } else if (extra.action === 'filter') {
      const status = filters.status?.[0] as ProjectStatus | undefined;
      onQueryChange({ status, page: 1 });
    } else if (extra.action === 'paginate') {
      const pageSize = pagination.pageSize ?? query.pageSize;
      onQueryChange({ page: pageSize !== query.pageSize ? 1 : (pagination.current ?? 1), pageSize });
    }
  };

  if (projects.isError && !projects.data) {
    return <ErrorState error={projects.error} onRetry={() => void projects.refetch()} />;
  }

  const page = projects.data;
  const filtered = Boolean(query.search || query.status || query.customerId);

  return (
    <Flex vertical gap={12}>
      <Flex gap={8} wrap>
        <Input.Search
          allowClear
          placeholder="Search by project or vehicle"
          aria-label="Search projects"
          enterButton={<Button aria-label="Search projects by title or vehicle">Search</Button>}
          defaultValue={query.search}
          onSearch={(value) => onQueryChange({ search: value.trim() || undefined, page: 1 })}
          style={{ maxWidth: 360, flex: '1 1 220px' }}
        />
        {narrow && (
          <Select<ProjectStatus>
            allowClear
            aria-label="Stage"
            placeholder="Any stage"
            value={query.status}
            onChange={(status) => onQueryChange({ status: status ?? undefined, page: 1 })}
            options={projectStatuses.map((s) => ({ value: s, label: statusLabels[s] }))}
            style={{ flex: '1 1 160px', maxWidth: 240 }}
          />
        )}
      </Flex>
      <Table<Project>
        aria-label="Projects"
        data-testid="projects-table"
        rowKey="id"
        columns={columns}
        dataSource={page?.items ?? []}
        loading={projects.isFetching}
        onChange={onChange}
        sortDirections={['ascend', 'descend', 'ascend']}
        pagination={serverPagination(query, page?.total)}
        locale={{
          emptyText: projects.isPending ? (
            ' '
          ) : filtered ? (
            <EmptyState
              description="No project matches these filters."
              action={
                <Button onClick={() => onQueryChange({ search: undefined, status: undefined, customerId: undefined, page: 1 })}>
                  Clear filters
                </Button>
              }
            />
          ) : (
            <EmptyState
              description={emptyText ?? 'No projects yet. Open one when a vehicle comes in for a swap.'}
              action={
                onCreate ? (
                  <Button type="primary" onClick={onCreate}>
                    Open a project
                  </Button>
                ) : undefined
              }
            />
          ),
        }}
      />
    </Flex>
  );
}
