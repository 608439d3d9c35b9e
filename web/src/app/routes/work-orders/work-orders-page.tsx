import { Card } from 'antd';
import { useSearchParams } from 'react-router-dom';
import { FilterStrip } from '@/components/filter-strip';
import { PageHeader } from '@/components/page-header';
import { toWorkOrder } from '@/config/paths';
import { WorkOrdersTable } from '@/features/work-orders/components/work-orders-table';
import type { WorkOrderState } from '@/features/work-orders/types';

const FILTERS: { value: WorkOrderState | 'all'; label: string }[] = [
  { value: 'all', label: 'All' },
  { value: 'ready', label: 'Ready for the bay' },
  { value: 'in-the-bay', label: 'In the bay' },
  { value: 'finished', label: 'Finished' },
];

export function WorkOrdersPage() {
  const [params, setParams] = useSearchParams();
  const state = FILTERS.find((filter) => filter.value === params.get('state') && filter.value !== 'all')?.value as WorkOrderState | undefined;
  return (
    <>
      <PageHeader title="Work orders" subtitle="Operations in build order, tightening figures and the checks the bay records." />
      <Card>
        <FilterStrip
          label="Work order state"
          options={FILTERS}
          value={state ?? 'all'}
          onChange={(value) => setParams(value === 'all' ? {} : { state: value })}
        />
        <WorkOrdersTable state={state} toWorkOrder={toWorkOrder} />
      </Card>
    </>
  );
}
