export const badgeKeys = {
  all: ['badges'] as const,
  members: () => [...badgeKeys.all, 'member'] as const,
  member: (memberId: string) => [...badgeKeys.members(), memberId] as const,
};
