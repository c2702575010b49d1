import type { ComponentType } from 'react';
import { createBrowserRouter } from 'react-router-dom';
import { paths } from '../config/paths';
import { RootError, RootLayout, RouteLoading } from './routes/root';

/** Each page arrives as its own chunk, fetched the first time someone opens it. */
function page(load: () => Promise<{ default: ComponentType }>) {
  return async () => ({ Component: (await load()).default });
}

export function createAppRouter() {
  return createBrowserRouter([
    {
      Component: RootLayout,
      ErrorBoundary: RootError,
      HydrateFallback: RouteLoading,
      children: [
        {
          lazy: page(() => import('./routes/public-layout')),
          children: [
            { path: paths.signIn.path, lazy: page(() => import('./routes/sign-in')) },
            { path: paths.forgotPassword.path, lazy: page(() => import('./routes/forgot-password')) },
            { path: paths.resetPassword.path, lazy: page(() => import('./routes/reset-password')) },
            { path: paths.acceptInvitation.path, lazy: page(() => import('./routes/accept-invitation')) },
          ],
        },
        {
          lazy: page(() => import('./routes/app-layout')),
          children: [
            { index: true, lazy: page(() => import('./routes/shop-floor')) },
            { path: paths.reserve.path, lazy: page(() => import('./routes/reserve')) },
            { path: paths.myRecord.path, lazy: page(() => import('./routes/my-record')) },
            { path: paths.profile.path, lazy: page(() => import('./routes/profile')) },
            { path: paths.teach.path, lazy: page(() => import('./routes/teach')) },
            { path: paths.teachClasses.path, lazy: page(() => import('./routes/teach-classes')) },
            { path: paths.teachClass.path, lazy: page(() => import('./routes/teach-class')) },
            { path: paths.memberRecord.path, lazy: page(() => import('./routes/member-record')) },
            { path: paths.people.path, lazy: page(() => import('./routes/people')) },
            { path: paths.signOffReport.path, lazy: page(() => import('./routes/sign-off-report')) },
            { path: paths.auditLog.path, lazy: page(() => import('./routes/audit-log')) },
            { path: paths.reservationsReport.path, lazy: page(() => import('./routes/reservations-report')) },
            { path: paths.cribCheckouts.path, lazy: page(() => import('./routes/crib-checkouts')) },
            { path: paths.cribAttention.path, lazy: page(() => import('./routes/crib-attention')) },
            { path: paths.cribOverdue.path, lazy: page(() => import('./routes/crib-overdue')) },
            { path: paths.crib.path, lazy: page(() => import('./routes/crib')) },
            { path: paths.cribLabels.path, lazy: page(() => import('./routes/crib-labels')) },
            { path: paths.reportIncident.path, lazy: page(() => import('./routes/report-incident')) },
            { path: paths.upkeepIncidents.path, lazy: page(() => import('./routes/upkeep-incidents')) },
            { path: paths.upkeepIncident.path, lazy: page(() => import('./routes/upkeep-incident')) },
            { path: paths.usage.path, lazy: page(() => import('./routes/usage')) },
            { path: paths.upkeep.path, lazy: page(() => import('./routes/upkeep')) },
            { path: paths.upkeepMachine.path, lazy: page(() => import('./routes/upkeep-machine')) },
            { path: paths.upkeepTagOuts.path, lazy: page(() => import('./routes/upkeep-tag-outs')) },
            { path: paths.setup.path, lazy: page(() => import('./routes/setup')) },
            { path: paths.setupMachines.path, lazy: page(() => import('./routes/setup-machines')) },
            { path: paths.setupMachineNew.path, lazy: page(() => import('./routes/setup-machine-edit')) },
            { path: paths.setupMachine.path, lazy: page(() => import('./routes/setup-machine-edit')) },
            { path: paths.setupTrainings.path, lazy: page(() => import('./routes/setup-trainings')) },
            { path: paths.setupTrainingNew.path, lazy: page(() => import('./routes/setup-training-edit')) },
            { path: paths.setupTraining.path, lazy: page(() => import('./routes/setup-training-edit')) },
            { path: paths.setupStations.path, lazy: page(() => import('./routes/setup-stations')) },
            { path: paths.setupWaiver.path, lazy: page(() => import('./routes/setup-waiver')) },
            { path: paths.setupHours.path, lazy: page(() => import('./routes/setup-hours')) },
            { path: paths.setupPolicies.path, lazy: page(() => import('./routes/setup-policies')) },
            { path: paths.outbox.path, lazy: page(() => import('./routes/outbox')) },
            { path: '*', lazy: page(() => import('./routes/not-found')) },
          ],
        },
      ],
    },
  ]);
}
