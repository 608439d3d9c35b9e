import { Button, Col, Flex, Popconfirm, Row, Space, Card, Typography } from 'antd';
import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { paths, toProjectFit, toProjectMeasurements, toWorkOrder } from '@/config/paths';
import { PageHeader } from '@/components/page-header';
import { ErrorState, LoadingState } from '@/components/query-state';
import { useUnits } from '@/hooks/use-units';
import { formatDate } from '@/lib/dates';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { useDeleteProject } from '@/features/projects/api/delete-project';
import { useProject } from '@/features/projects/api/get-project';
import { ProjectGoalsCard, ProjectPlacementCard, ProjectSelectionsCard } from '@/features/projects/components/project-details';
import { ProjectFormDrawer } from '@/features/projects/components/project-form-drawer';
import { ProjectStageSteps } from '@/features/projects/components/project-stage-steps';
import { ProjectStatusTag } from '@/features/projects/components/project-status-tag';
import { projectStatuses } from '@/features/projects/types';
import { CustomerPartsPlanCard } from '@/features/parts-plans/components/customer-parts-plan-card';
import { PartsPlanCard } from '@/features/parts-plans/components/parts-plan-card';
import { ProjectQuotesCard } from '@/features/quotes/components/project-quotes-card';
import { ProjectWorkOrderCard } from '@/features/work-orders/components/project-work-order-card';
import { useShop } from '@/features/shop/api/get-shop';
import { canEditProjects, canRunFitCheck, canWorkOrders } from '../../navigation';
import { useCustomerOptions } from '../shared/use-customer-options';
import { useProjectPartNames } from './use-project-part-names';

export function ProjectDetailPage() {
  const { projectId = '' } = useParams();
  const user = useSignedInUser();
  const canEdit = canEditProjects(user.role);
  const navigate = useNavigate();
  const { system } = useUnits();
  const project = useProject(projectId);
  const isCustomer = user.role === 'customer';
  const partNames = useProjectPartNames(project.data, !isCustomer);
  const shop = useShop();
  const [editing, setEditing] = useState(false);
  const customers = useCustomerOptions({ enabled: editing });
  const remove = useDeleteProject({ onSuccess: () => navigate(paths.projects, { replace: true }) });
  const backTo = user.role === 'customer' ? paths.myProjects : paths.projects;

  if (project.isPending) return <LoadingState rows={10} />;
  if (project.isError) return <ErrorState error={project.error} onRetry={() => void project.refetch()} />;

  const p = project.data;
  const currency = shop.data?.currency;

  return (
    <>
      <Typography.Text>
        <Link to={backTo} className="back-link">← {user.role === 'customer' ? 'My projects' : 'Projects'}</Link>
      </Typography.Text>
      <PageHeader
        eyebrow={user.role === 'customer' ? user.shop.name : p.customer?.name}
        title={
          <Flex align="center" gap={12} wrap>
            <span>{p.title}</span>
            <ProjectStatusTag status={p.status} />
          </Flex>
        }
        subtitle={`${p.vehicleDescription} · opened ${formatDate(p.createdAt)} · last change ${formatDate(p.updatedAt)}`}
        extra={
          // wraps on a phone: four buttons do not fit 390 px in one row
          <Space wrap>
            <Button onClick={() => navigate(toProjectMeasurements(p.id))}>{isCustomer ? 'Measurements and photos' : 'Measurement sheet'}</Button>
            <Button onClick={() => navigate(toProjectFit(p.id))}>{isCustomer ? 'Fit report' : 'Fit check'}</Button>
            {canEdit && (
              <>
                <Button type="primary" onClick={() => setEditing(true)}>
                  Edit project
                </Button>
                <Popconfirm
                  title="Delete this project?"
                  description="Its measurements, reports and quotes go with it. This cannot be undone."
                  okText="Delete"
                  okButtonProps={{ danger: true, loading: remove.isPending }}
                  onConfirm={() => remove.mutateAsync(p.id)}
                >
                  <Button danger>Delete</Button>
                </Popconfirm>
              </>
            )}
          </Space>
        }
      />
      {/* where the job stands comes first; quotes follow once there is a plan to quote */}
      <Card style={{ marginBottom: 16 }} title="Stage">
        <ProjectStageSteps status={p.status} />
      </Card>
      {user.role !== 'fabricator' && user.role !== 'counter' && <ProjectQuotesCard projectId={p.id} canWrite={canEdit} canAnswer={user.role === 'customer'} forMyself={p.forMyself} />}
      {canWorkOrders(user.role) && <ProjectWorkOrderCard projectId={p.id} toWorkOrder={toWorkOrder} opened={projectStatuses.indexOf(p.status) >= projectStatuses.indexOf('deposit-paid')} />}
      <Row gutter={[16, 16]}>
        <Col xs={24} xl={12}>
          <ProjectGoalsCard project={p} currency={currency} />
        </Col>
        <Col xs={24} xl={12}>
          <ProjectSelectionsCard
            project={p}
            names={partNames.names}
            nameStates={partNames.states}
            unnamedLabel={isCustomer ? 'Chosen by the shop' : undefined}
            fitPath={toProjectFit(p.id)}
            fitLinkLabel={canRunFitCheck(user.role) || canEdit ? 'Choose parts on the fit page' : 'Open the fit report'}
          />
        </Col>
        <Col xs={24}>
          <ProjectPlacementCard project={p} />
        </Col>
        {!isCustomer && (
          <Col xs={24}>
            <PartsPlanCard projectId={p.id} canBuild={canEdit} currency={currency} />
          </Col>
        )}
      </Row>
      {/* the customer's read-only view of the plan; nothing while the project has none */}
      {isCustomer && <CustomerPartsPlanCard projectId={p.id} currency={currency} />}
      {canEdit && (
        <ProjectFormDrawer
          open={editing}
          project={p}
          onClose={() => setEditing(false)}
          customerOptions={customers.options}
          customersLoading={customers.loading}
          onCustomerSearch={customers.onSearch}
          unitSystem={system}
          currency={currency}
        />
      )}
    </>
  );
}
