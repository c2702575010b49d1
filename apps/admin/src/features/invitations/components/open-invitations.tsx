import { roleLabels, fullName } from '@chuckkey/core';
import { EmptyState } from '../../../components/ui/empty-state';
import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
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
        <Table caption="Open invitations">
          <THead>
            <Tr>
              <Th>Name</Th>
              <Th>E-mail</Th>
              <Th>Role</Th>
              <Th>Invited by</Th>
              <Th>Link works until</Th>
            </Tr>
          </THead>
          <TBody>
            {invitations.data.map((invitation) => (
              <Tr key={invitation.id}>
                <Td className="font-bold">{fullName(invitation.firstName, invitation.lastName)}</Td>
                <Td className="break-all">{invitation.email}</Td>
                <Td>{roleLabels[invitation.role]}</Td>
                <Td>{invitation.invitedBy}</Td>
                <Td className="whitespace-nowrap">{formatDate(invitation.expiresAt, timeZone)}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
    </Panel>
  );
}
