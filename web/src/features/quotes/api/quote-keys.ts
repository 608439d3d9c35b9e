export const quoteKeys = {
  all: ['quotes'] as const,
  projects: () => [...quoteKeys.all, 'project'] as const,
  project: (projectId: string) => [...quoteKeys.projects(), projectId] as const,
  link: (token: string) => [...quoteKeys.all, 'link', token] as const,
  details: () => [...quoteKeys.all, 'detail'] as const,
  /** One quote as the shop reads it: the working revision, or a chosen revision number. */
  detail: (quoteId: string, revision?: number) => [...quoteKeys.details(), quoteId, revision ?? 'working'] as const,
  compares: () => [...quoteKeys.all, 'compare'] as const,
  compare: (quoteId: string, from: number, to: number) => [...quoteKeys.compares(), quoteId, from, to] as const,
  laborOperations: () => [...quoteKeys.all, 'labor-operations'] as const,
  settings: () => [...quoteKeys.all, 'settings'] as const,
};
