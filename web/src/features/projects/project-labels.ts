import { palette } from '@/config/theme';
import type { ProjectStatus, ProjectUse } from './types';

export const statusLabels: Record<ProjectStatus, string> = {
  intake: 'Intake',
  measuring: 'Measuring',
  checking: 'Fit check',
  quoting: 'Quoting',
  approved: 'Approved',
  building: 'Building',
  done: 'Done',
};

export const statusHints: Record<ProjectStatus, string> = {
  intake: 'Vehicle, engine and goals being written down',
  measuring: 'Chassis on the measurement sheet',
  checking: 'Fit report being run and reviewed',
  quoting: 'Parts plan and quote being prepared',
  approved: 'Customer approved the quote',
  building: 'Work order open in the shop',
  done: 'Handed back to the customer',
};

export const statusColors: Record<ProjectStatus, { bg: string; fg: string }> = {
  intake: { bg: '#eceae4', fg: '#4c4a44' },
  measuring: { bg: '#e2eef6', fg: '#24557a' },
  checking: { bg: '#efe6f5', fg: '#5d3a78' },
  quoting: { bg: palette.oxide100, fg: palette.oxide600 },
  approved: { bg: '#e0f0e6', fg: '#23643d' },
  building: { bg: '#f7edd6', fg: '#7a5715' },
  done: { bg: palette.teal100, fg: palette.teal800 },
};

export const useLabels: Record<ProjectUse, string> = {
  street: 'Street',
  tow: 'Towing',
  'off-road': 'Off-road',
  strip: 'Drag strip',
};
