import { QUOTE_STATUS_LABELS } from '@swapwright/shared';
import { Tag } from 'antd';
import type { QuoteStatus } from '../types';

const COLOURS: Record<QuoteStatus, string> = {
  drafting: 'default',
  'awaiting-answer': 'processing',
  approved: 'success',
  'turned-down': 'error',
  lapsed: 'warning',
};

/** `forCustomer`: the customer reads their own quote, so a quote waiting for them says so in their words. */
export function QuoteStatusTag({ status, forCustomer = false }: { status: QuoteStatus; forCustomer?: boolean }) {
  const label = forCustomer && status === 'awaiting-answer' ? 'Waiting for your answer' : QUOTE_STATUS_LABELS[status];
  return <Tag color={COLOURS[status]}>{label}</Tag>;
}

export function DepositTag({ state }: { state: 'not-due' | 'due' | 'paid' }) {
  if (state === 'paid') return <Tag color="success">Deposit paid</Tag>;
  if (state === 'due') return <Tag color="gold">Deposit due</Tag>;
  return null;
}
