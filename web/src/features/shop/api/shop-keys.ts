export const shopKeys = {
  all: ['shop'] as const,
  current: () => [...shopKeys.all, 'current'] as const,
  quoteSettings: () => [...shopKeys.all, 'quote-settings'] as const,
};
