export const quoteKeys = {
  all: ['quotes'] as const,
  project: (projectId: string) => [...quoteKeys.all, 'project', projectId] as const,
  link: (token: string) => [...quoteKeys.all, 'link', token] as const,
};
