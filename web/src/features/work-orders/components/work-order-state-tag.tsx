import { Tag } from 'antd';
import type { WorkOrderState } from '../types';

const LOOK: Record<WorkOrderState, { color: string; label: string }> = {
  ready: { color: 'gold', label: 'Ready for the bay' },
  'in-the-bay': { color: 'processing', label: 'In the bay' },
  finished: { color: 'success', label: 'Finished' },
};

export function WorkOrderStateTag({ state }: { state: WorkOrderState }) {
  return <Tag color={LOOK[state].color}>{LOOK[state].label}</Tag>;
}
