export const tagOutKeys = {
  all: ['tag-outs'] as const,
  list: (open: boolean) => [...tagOutKeys.all, open ? 'open' : 'cleared'] as const,
};
