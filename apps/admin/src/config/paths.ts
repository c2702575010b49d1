function withQuery(path: string, params: Record<string, string | undefined>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value) search.set(key, value);
  const text = search.toString();
  return text ? `${path}?${text}` : path;
}

export const paths = {
  home: { path: '/', getHref: () => '/' },
  signIn: { path: '/sign-in', getHref: (next?: string) => withQuery('/sign-in', { next }) },
  forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
  resetPassword: { path: '/reset-password', getHref: (token?: string) => withQuery('/reset-password', { token }) },
  acceptInvitation: {
    path: '/accept-invitation',
    getHref: (token?: string) => withQuery('/accept-invitation', { token }),
  },
  profile: { path: '/profile', getHref: () => '/profile' },
  reserve: { path: '/reserve', getHref: (machineId?: string) => withQuery('/reserve', { machine: machineId }) },
  myRecord: { path: '/my-record', getHref: () => '/my-record' },
  teach: { path: '/teach', getHref: () => '/teach' },
  teachClasses: { path: '/teach/classes', getHref: () => '/teach/classes' },
  teachClass: {
    path: '/teach/classes/:classId',
    getHref: (classId: string) => `/teach/classes/${encodeURIComponent(classId)}`,
  },
  memberRecord: {
    path: '/teach/members/:memberId',
    getHref: (memberId: string) => `/teach/members/${encodeURIComponent(memberId)}`,
  },
  people: { path: '/people', getHref: () => '/people' },
  signOffReport: {
    path: '/people/sign-offs',
    getHref: (status?: 'expiring' | 'expired') =>
      withQuery('/people/sign-offs', { status: status === 'expired' ? status : undefined }),
  },
  auditLog: { path: '/people/audit-log', getHref: () => '/people/audit-log' },
  reservationsReport: { path: '/people/reservations', getHref: () => '/people/reservations' },
  crib: { path: '/crib', getHref: () => '/crib' },
  cribCheckouts: { path: '/crib/checkouts', getHref: () => '/crib/checkouts' },
  cribAttention: { path: '/crib/attention', getHref: () => '/crib/attention' },
  cribOverdue: { path: '/crib/overdue', getHref: () => '/crib/overdue' },
  cribLabels: {
    path: '/crib/labels',
    getHref: (itemIds?: readonly string[]) => withQuery('/crib/labels', { items: itemIds?.length ? itemIds.join(',') : undefined }),
  },
  setup: { path: '/setup', getHref: () => '/setup' },
  setupMachines: { path: '/setup/machines', getHref: () => '/setup/machines' },
  setupMachineNew: { path: '/setup/machines/new', getHref: () => '/setup/machines/new' },
  setupMachine: {
    path: '/setup/machines/:machineId',
    getHref: (machineId: string) => `/setup/machines/${encodeURIComponent(machineId)}`,
  },
  setupTrainings: { path: '/setup/trainings', getHref: () => '/setup/trainings' },
  setupTrainingNew: { path: '/setup/trainings/new', getHref: () => '/setup/trainings/new' },
  setupTraining: {
    path: '/setup/trainings/:trainingId',
    getHref: (trainingId: string) => `/setup/trainings/${encodeURIComponent(trainingId)}`,
  },
  setupStations: { path: '/setup/stations', getHref: () => '/setup/stations' },
  setupWaiver: { path: '/setup/waiver', getHref: () => '/setup/waiver' },
  setupHours: { path: '/setup/hours', getHref: () => '/setup/hours' },
  setupPolicies: { path: '/setup/policies', getHref: () => '/setup/policies' },
  upkeep: { path: '/upkeep', getHref: () => '/upkeep' },
  upkeepMachine: {
    path: '/upkeep/machines/:id',
    getHref: (id: string) => `/upkeep/machines/${encodeURIComponent(id)}`,
  },
  upkeepTagOuts: { path: '/upkeep/tag-outs', getHref: () => '/upkeep/tag-outs' },
  upkeepIncidents: { path: '/upkeep/incidents', getHref: () => '/upkeep/incidents' },
  upkeepIncident: {
    path: '/upkeep/incidents/:id',
    getHref: (id: string) => `/upkeep/incidents/${encodeURIComponent(id)}`,
  },
  reportIncident: { path: '/incidents/new', getHref: () => '/incidents/new' },
  usage: { path: '/usage', getHref: () => '/usage' },
  outbox: { path: '/outbox', getHref: () => '/outbox' },
} as const;

const publicPaths: readonly string[] = [
  paths.signIn.path,
  paths.forgotPassword.path,
  paths.resetPassword.path,
  paths.acceptInvitation.path,
];

/**
 * Where to go after signing in. `next` arrives in the URL, so anyone can write it: only paths
 * on this origin are followed, never another site, and never back to a signed-out page.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/')) return paths.home.path;
  const base = 'http://chuckkey.invalid';
  let url: URL;
  try {
    url = new URL(next, base);
  } catch {
    return paths.home.path;
  }
  if (url.origin !== base || publicPaths.includes(url.pathname)) return paths.home.path;
  return `${url.pathname}${url.search}${url.hash}`;
}
