import { Tag } from 'antd';
import type { QuoteStatus } from '../types';

const LOOK: Record<QuoteStatus, { color: string; label: string }> = {
  drafting: { color: 'default', label: 'Being written' },
  'awaiting-answer': { color: 'processing', label: 'Awaiting the customer' },
  approved: { color: 'success', label: 'Approved' },
  'turned-down': { color: 'error', label: 'Turned down' },
  lapsed: { color: 'warning', label: 'Lapsed' },
};

/** `forCustomer`: the customer reads their own quote, so a quote waiting for them says so in their words. */
export function QuoteStatusTag({ status, forCustomer = false }: { status: QuoteStatus; forCustomer?: boolean }) {
  const label = forCustomer && status === 'awaiting-answer' ? 'Waiting for your answer' : LOOK[status].label;
  return <Tag color={LOOK[status].color}>{label}</Tag>;
}

export function DepositTag({ state }: { state: 'not-due' | 'due' | 'paid' }) {
  if (state === 'paid') return <Tag color="success">Deposit paid</Tag>;
  if (state === 'due') return <Tag color="gold">Deposit due</Tag>;
  return null;
}
