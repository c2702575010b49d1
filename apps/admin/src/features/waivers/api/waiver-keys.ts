export const waiverKeys = {
  all: ['waivers'] as const,
  current: () => [...waiverKeys.all, 'current'] as const,
  members: () => [...waiverKeys.all, 'member'] as const,
  member: (memberId: string) => [...waiverKeys.members(), memberId] as const,
};
