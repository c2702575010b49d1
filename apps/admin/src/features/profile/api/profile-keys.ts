export const profileKeys = {
  all: ['profile'] as const,
  own: () => [...profileKeys.all, 'own'] as const,
};
