export const shopKeys = {
  all: ['shop'] as const,
  detail: () => [...shopKeys.all, 'detail'] as const,
  areas: () => [...shopKeys.all, 'areas'] as const,
};
