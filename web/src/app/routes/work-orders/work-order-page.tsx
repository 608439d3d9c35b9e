import { Typography } from 'antd';
import { Link, useParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '@/components/query-state';
import { paths, toProjectDetail } from '@/config/paths';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { useWorkOrder } from '@/features/work-orders/api/get-work-order';
import { WorkOrderSheet } from '@/features/work-orders/components/work-order-sheet';
import { canWorkOrders } from '../../navigation';

export function WorkOrderPage() {
  const { workOrderId = '' } = useParams();
  const user = useSignedInUser();
  const order = useWorkOrder(workOrderId);
  if (order.isPending) return <LoadingState rows={10} />;
  if (order.isError) return <ErrorState error={order.error} onRetry={() => void order.refetch()} />;
  return (
    <>
      <Typography.Text className="no-print">
        <Link to={paths.workOrders} className="back-link">← Work orders</Link>
      </Typography.Text>
      <WorkOrderSheet order={order.data} canWork={canWorkOrders(user.role)} projectPath={toProjectDetail(order.data.projectId)} />
    </>
  );
}
