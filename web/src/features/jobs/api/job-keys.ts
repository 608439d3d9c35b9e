import type { JobQuery } from '../types';

export const jobKeys = {
  all: ['jobs'] as const,
  lists: () => [...jobKeys.all, 'list'] as const,
  list: (query: JobQuery) => [...jobKeys.lists(), query] as const,
};
