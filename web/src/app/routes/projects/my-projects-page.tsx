import { Card } from 'antd';
import { PageHeader } from '@/components/page-header';
import { useListSearchParams } from '@/hooks/use-list-search-params';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { ProjectsTable } from '@/features/projects/components/projects-table';
import { projectSortFields, projectStatuses, type ProjectStatus } from '@/features/projects/types';

export function MyProjectsPage() {
  const user = useSignedInUser();
  const [params, setParams] = useListSearchParams({ sortFields: projectSortFields, filters: ['status'] });
  const status = projectStatuses.find((s) => s === params.status) as ProjectStatus | undefined;
  return (
    <>
      <PageHeader
        eyebrow={user.shop.name}
        title="My projects"
        subtitle="Follow your swap: measurements, fit report, parts plan and quote as the shop gets to them."
      />
      <Card>
        <ProjectsTable
          query={{ page: params.page, pageSize: params.pageSize, sort: params.sort, order: params.order, search: params.search, status }}
          onQueryChange={setParams}
          showCustomer={false}
          emptyText={`${user.shop.name} has not opened a project for you yet. It will show here as soon as they do.`}
        />
      </Card>
    </>
  );
}
