import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button, buttonClasses } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { DownloadIcon } from '../../../components/ui/icons';
import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { errorMessage } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { useBadge } from '../api/get-badge';
import { useReissueBadge } from '../api/reissue-badge';
import { badgeCardHref, badgeQrSrc } from '../utils/badge-links';

interface BadgePanelProps {
  memberId: string;
  timeZone: string | undefined;
}

/** The member's own badge: the QR a station scans, the card to print, and a way out when it is lost. */
export function BadgePanel({ memberId, timeZone }: BadgePanelProps) {
  const badge = useBadge(memberId);
  const reissue = useReissueBadge();
  const [confirming, setConfirming] = useState(false);
  const [reissued, setReissued] = useState(false);

  return (
    <Panel title="My badge" description="Hold the QR to a station's camera to start on a machine. The printed card carries the same code.">
      {badge.isPending ? (
        <Spinner label="Loading your badge…" />
      ) : badge.isError ? (
        <QueryError error={badge.error} what="your badge" onRetry={() => void badge.refetch()} retrying={badge.isFetching} />
      ) : (
        <div className="flex flex-col gap-4">
          {reissued && (
            <Alert tone="success" title="New badge issued">
              The old card no longer works. Download and print the new card, or show this page at a station.
            </Alert>
          )}
          <div className="flex flex-col gap-4">
            <img
              src={badgeQrSrc(memberId, badge.data.id)}
              alt="QR code of your badge, for a station's camera"
              width={192}
              height={192}
              className="size-48 shrink-0 rounded-md border border-neutral-300 bg-white"
            />
            <div className="flex flex-col gap-3">
              <p className="text-neutral-800">Issued {formatDate(badge.data.issuedAt, timeZone)}.</p>
              <a href={badgeCardHref(memberId)} download className={buttonClasses('primary', 'self-start whitespace-nowrap')}>
                <DownloadIcon />
                Download badge card (PDF)
              </a>
              <p className="text-sm text-neutral-700">
                Print it at 100 % (actual size): it comes out the size of a bank card.
              </p>
              <details className="rounded-md border border-neutral-200 bg-neutral-50 px-3">
                <summary className="flex min-h-11 cursor-pointer items-center font-bold text-neutral-900">
                  Show the code to type at a station
                </summary>
                <p className="pb-3 font-mono text-lg break-all text-neutral-900">{badge.data.code}</p>
              </details>
            </div>
          </div>
          <div>
            <Button
              variant="secondary"
              onClick={() => {
                setReissued(false);
                setConfirming(true);
              }}
            >
              Report lost badge / reissue
            </Button>
          </div>
        </div>
      )}
      <ConfirmDialog
        open={confirming}
        title="Reissue your badge?"
        confirmLabel="Reissue badge"
        confirmVariant="danger"
        pending={reissue.isPending}
        error={reissue.isError ? errorMessage(reissue.error) : null}
        onCancel={() => {
          reissue.reset();
          setConfirming(false);
        }}
        onConfirm={() =>
          reissue.mutate(memberId, {
            onSuccess: () => {
              setConfirming(false);
              setReissued(true);
            },
          })
        }
      >
        Your old card stops working at once: no station accepts it any more, even if it turns up again. You get a new QR
        here straight away; print the new card before your next visit.
      </ConfirmDialog>
    </Panel>
  );
}
