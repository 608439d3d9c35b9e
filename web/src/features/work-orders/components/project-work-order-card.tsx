import { Card, Typography } from 'antd';
import { Link } from 'react-router-dom';
import { useProjectWorkOrder } from '../api/get-project-work-order';
import { WorkOrderStateTag } from './work-order-state-tag';

export interface ProjectWorkOrderCardProps {
  projectId: string;
  toWorkOrder: (id: string) => string;
  /** Whether the project has reached the stage where its work order opens (the deposit paid); before that nothing is asked. */
  opened: boolean;
}

/** The project's work order at a glance, with the link the bay opens; nothing until the deposit is paid. */
export function ProjectWorkOrderCard({ projectId, toWorkOrder, opened }: ProjectWorkOrderCardProps) {
  const order = useProjectWorkOrder(projectId, opened);
  if (!order.data) return null;
  const { progress } = order.data;
  return (
    <Card title="Work order" style={{ marginBottom: 16 }} data-testid="project-work-order">
      <Typography.Text>
        <Link to={toWorkOrder(order.data.id)}>Open work order {order.data.label}</Link> <WorkOrderStateTag state={order.data.state} />
      </Typography.Text>
      <Typography.Paragraph type="secondary" style={{ margin: '4px 0 0' }}>
        {order.data.steps.length} operations in build order · {progress.passed} of {progress.total} checks passed
        {progress.failed ? ` · ${progress.failed} failed` : ''}
      </Typography.Paragraph>
    </Card>
  );
}
