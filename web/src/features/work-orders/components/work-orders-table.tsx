import { Empty, Flex, Grid, Table, Typography } from 'antd';
import { Link } from 'react-router-dom';
import { formatDate } from '@/lib/dates';
import { useWorkOrders } from '../api/get-work-orders';
import type { WorkOrderState, WorkOrderSummary } from '../types';
import { WorkOrderStateTag } from './work-order-state-tag';

export interface WorkOrdersTableProps {
  state?: WorkOrderState;
  toWorkOrder: (id: string) => string;
}

/** "3 of 8 (1 failed)". */
function progressText(order: WorkOrderSummary): string {
  return `${order.progress.passed} of ${order.progress.total}${order.progress.failed ? ` (${order.progress.failed} failed)` : ''}`;
}

/** The shop's work orders, newest first, with their checks' progress. */
export function WorkOrdersTable({ state, toWorkOrder }: WorkOrdersTableProps) {
  const orders = useWorkOrders(state ? { state } : {});
  // Below antd's md (768 px) each order is one stacked cell (label, project, state, checks, opened); the other
  // columns give way, so the list never scrolls sideways on a phone.
  const narrow = Grid.useBreakpoint().md === false;
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
        {
          title: 'Work order',
          render: (_, order) =>
            narrow ? (
              <Flex vertical gap={2} data-testid={`work-order-${order.label}`}>
                <Flex justify="space-between" align="baseline" gap={8}>
                  <Link to={toWorkOrder(order.id)} className="record-link">{order.label}</Link>
                  <WorkOrderStateTag state={order.state} />
                </Flex>
                <span>
                  {order.projectTitle}
                  {order.customerName && <Typography.Text type="secondary"> · {order.customerName}</Typography.Text>}
                </span>
                <Typography.Text type="secondary" style={{ fontSize: 13 }}>
                  Checks passed {progressText(order)} · opened {formatDate(order.createdAt)}
                </Typography.Text>
              </Flex>
            ) : (
              <Link to={toWorkOrder(order.id)} className="record-link">{order.label}</Link>
            ),
        },
        {
          title: 'Project',
          responsive: ['md'],
          render: (_, order) => (
            <>
              {order.projectTitle}
              {order.customerName && <Typography.Text type="secondary"> · {order.customerName}</Typography.Text>}
            </>
          ),
        },
        { title: 'State', responsive: ['md'], render: (_, order) => <WorkOrderStateTag state={order.state} /> },
        { title: 'Checks passed', responsive: ['md'], align: 'right', render: (_, order) => progressText(order) },
        { title: 'Opened', responsive: ['md'], render: (_, order) => formatDate(order.createdAt) },
      ]}
    />
  );
}
