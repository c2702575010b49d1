import type { SignOff } from '@chuckkey/core';
import { useEffect, useState, type ReactNode } from 'react';
import { Alert } from '../../../components/ui/alert';
import { EmptyState } from '../../../components/ui/empty-state';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { useMemberSignOffs } from '../api/get-member-sign-offs';
import { RevokeDialog } from './revoke-dialog';
import { SignOffCard, signOffHeadingId } from './sign-off-card';

interface SignOffListProps {
  memberId: string;
  timeZone: string | undefined;
  /** Instructors and admins may revoke; a member reading their own record may not. */
  canRevoke?: boolean;
  empty: ReactNode;
  /** Whose sign-offs these are, for the list's name: "Your sign-offs", "Ada Quill's sign-offs". */
  label: string;
}

export function SignOffList({ memberId, timeZone, canRevoke = false, empty, label }: SignOffListProps) {
  const signOffs = useMemberSignOffs(memberId);
  const [now] = useState(() => new Date());
  const [revoking, setRevoking] = useState<SignOff | null>(null);
  const [revoked, setRevoked] = useState<SignOff | null>(null);

  // The revoke button is gone once the card shows the sign-off as revoked; focus goes to the
  // card's heading so that keyboard and screen-reader users stay where they were.
  useEffect(() => {
    if (revoked && !revoking) document.getElementById(signOffHeadingId(revoked))?.focus();
  }, [revoked, revoking]);

  if (signOffs.isPending) return <Spinner label="Loading sign-offs…" />;
  if (signOffs.isError) {
    return <QueryError error={signOffs.error} what="the sign-offs" onRetry={() => void signOffs.refetch()} retrying={signOffs.isFetching} />;
  }

  return (
    <div className="flex flex-col gap-3">
      {revoked && (
        <Alert tone="success" title="Sign-off revoked">
          {revoked.memberName}&apos;s sign-off for {revoked.trainingName} no longer counts.
        </Alert>
      )}
      {signOffs.data.length === 0 ? (
        <EmptyState title={empty} />
      ) : (
        <ul aria-label={label} className="flex flex-col gap-3">
          {signOffs.data.map((signOff) => (
            <li key={signOff.id}>
              <SignOffCard
                signOff={signOff}
                timeZone={timeZone}
                now={now}
                onRevoke={
                  canRevoke
                    ? (chosen) => {
                        setRevoked(null);
                        setRevoking(chosen);
                      }
                    : undefined
                }
              />
            </li>
          ))}
        </ul>
      )}
      <RevokeDialog
        signOff={revoking}
        onClose={() => setRevoking(null)}
        onRevoked={(signOff) => {
          setRevoked(signOff);
          setRevoking(null);
        }}
      />
    </div>
  );
}
