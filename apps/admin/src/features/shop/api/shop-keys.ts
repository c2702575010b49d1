export const shopKeys = {
  all: ['shop'] as const,
  detail: () => [...shopKeys.all, 'detail'] as const,
  areas: () => [...shopKeys.all, 'areas'] as const,
  hours: () => [...shopKeys.all, 'hours'] as const,
  policies: () => [...shopKeys.all, 'policies'] as const,
};
