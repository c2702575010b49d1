import { fullName, roleLabels } from '@chuckkey/core';
import { EmptyState } from '../../../components/ui/empty-state';
import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { formatDate } from '../../../lib/format';
import { useInvitations } from '../api/get-invitations';

export function OpenInvitations({ timeZone }: { timeZone: string | undefined }) {
  const invitations = useInvitations();

  return (
    <Panel title="Open invitations" description="Sent, and not yet accepted.">
      {invitations.isPending ? (
        <Spinner label="Loading invitations…" />
      ) : invitations.isError ? (
        <QueryError
          error={invitations.error}
          what="the invitations"
          onRetry={() => void invitations.refetch()}
          retrying={invitations.isFetching}
        />
      ) : invitations.data.length === 0 ? (
        <EmptyState title="No open invitations">
          Invite someone with the form, and their invitation waits here until they accept it.
        </EmptyState>
      ) : (
        <ul aria-label="Open invitations" className="divide-y divide-neutral-200 rounded-lg border border-neutral-300">
          {invitations.data.map((invitation) => (
            <li key={invitation.id} className="flex flex-col gap-1 px-4 py-3">
              <p className="flex flex-wrap items-baseline justify-between gap-x-3">
                <span className="font-bold text-neutral-900">{fullName(invitation.firstName, invitation.lastName)}</span>
                <span className="text-neutral-800">{roleLabels[invitation.role]}</span>
              </p>
              <p className="break-all text-neutral-800">{invitation.email}</p>
              <p className="text-sm text-neutral-700">
                Invited by {invitation.invitedBy} · the link works until {formatDate(invitation.expiresAt, timeZone)}
              </p>
            </li>
          ))}
        </ul>
      )}
    </Panel>
  );
}
