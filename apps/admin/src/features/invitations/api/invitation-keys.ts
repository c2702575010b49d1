export const invitationKeys = {
  all: ['invitations'] as const,
  lists: () => [...invitationKeys.all, 'list'] as const,
  list: () => [...invitationKeys.lists()] as const,
  previews: () => [...invitationKeys.all, 'preview'] as const,
  preview: (token: string) => [...invitationKeys.previews(), token] as const,
};
