import { Empty, Table, Typography } from 'antd';
import { Link } from 'react-router-dom';
import { formatDate } from '@/lib/dates';
import { useWorkOrders } from '../api/get-work-orders';
import type { WorkOrderState, WorkOrderSummary } from '../types';
import { WorkOrderStateTag } from './work-order-state-tag';

export interface WorkOrdersTableProps {
  state?: WorkOrderState;
  toWorkOrder: (id: string) => string;
}

/** The shop's work orders, newest first, with their checks' progress. */
export function WorkOrdersTable({ state, toWorkOrder }: WorkOrdersTableProps) {
  const orders = useWorkOrders(state ? { state } : {});
  if (orders.data && orders.data.length === 0) {
    // Outside the table: on a phone the table scrolls sideways and would cut the sentence off.
    return <Empty image={Empty.PRESENTED_IMAGE_SIMPLE} description="No work order yet: one opens when a customer has approved a quote and paid the deposit." />;
  }
  return (
    <Table<WorkOrderSummary>
      aria-label="Work orders"
      rowKey="id"
      loading={orders.isLoading}
      dataSource={orders.data ?? []}
      pagination={false}
      columns={[
        { title: 'Work order', render: (_, order) => <Link to={toWorkOrder(order.id)}>{order.label}</Link> },
        {
          title: 'Project',
          render: (_, order) => (
            <>
              {order.projectTitle}
              {order.customerName && <Typography.Text type="secondary"> · {order.customerName}</Typography.Text>}
            </>
          ),
        },
        { title: 'State', render: (_, order) => <WorkOrderStateTag state={order.state} /> },
        { title: 'Checks passed', align: 'right', render: (_, order) => `${order.progress.passed} of ${order.progress.total}${order.progress.failed ? ` (${order.progress.failed} failed)` : ''}` },
        { title: 'Opened', render: (_, order) => formatDate(order.createdAt) },
      ]}
    />
  );
}
