import { palette } from '@/config/theme';
import type { ProjectStatus, ProjectUse } from './types';

/** The job's stages in the shop's words; each is reached by an event, never set by hand. */
export const statusLabels: Record<ProjectStatus, string> = {
  intake: 'Intake',
  measured: 'Measured',
  'fit-checked': 'Fit checked',
  'parts-planned': 'Parts planned',
  'quote-sent': 'Quote sent',
  approved: 'Approved',
  'deposit-paid': 'Deposit paid',
  'in-the-bay': 'In the bay',
  done: 'Built',
};

/** What moves a project on to each stage (and what it is waiting for there). */
export const statusHints: Record<ProjectStatus, string> = {
  intake: 'Written down; the chassis is waiting to be measured',
  measured: 'Measurement sheet signed off; ready for a fit check',
  'fit-checked': 'Fit report run; the parts plan comes next',
  'parts-planned': 'Parts plan saved; ready to quote',
  'quote-sent': 'Quote with the customer, awaiting an answer',
  approved: 'Customer approved the quote; the deposit is due',
  'deposit-paid': 'Deposit paid; the work order is ready for the bay',
  'in-the-bay': 'Work order started in the bay',
  done: 'Work order finished: built and checked',
};

export const statusColors: Record<ProjectStatus, { bg: string; fg: string }> = {
  intake: { bg: '#eceae4', fg: '#4c4a44' },
  measured: { bg: '#e2eef6', fg: '#24557a' },
  'fit-checked': { bg: '#efe6f5', fg: '#5d3a78' },
  'parts-planned': { bg: '#e8ecf8', fg: '#34467a' },
  'quote-sent': { bg: palette.oxide100, fg: palette.oxide600 },
  approved: { bg: '#e0f0e6', fg: '#23643d' },
  'deposit-paid': { bg: '#dcefe9', fg: '#1d5e4f' },
  'in-the-bay': { bg: '#f7edd6', fg: '#7a5715' },
  done: { bg: palette.teal100, fg: palette.teal800 },
};

export const useLabels: Record<ProjectUse, string> = {
  street: 'Street',
  tow: 'Towing',
  'off-road': 'Off-road',
  strip: 'Drag strip',
};
