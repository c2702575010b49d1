export type SignOffReportStatus = 'expiring' | 'expired';

export const signOffKeys = {
  all: ['sign-offs'] as const,
  members: () => [...signOffKeys.all, 'member'] as const,
  member: (memberId: string) => [...signOffKeys.members(), memberId] as const,
  reports: () => [...signOffKeys.all, 'report'] as const,
  report: (status: SignOffReportStatus) => [...signOffKeys.reports(), status] as const,
  candidates: () => [...signOffKeys.all, 'candidates'] as const,
  candidateSearch: (search: string) => [...signOffKeys.candidates(), search] as const,
};
