import type { Station, StationWithCode } from '@chuckkey/core';
import { useEffect, useRef, useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { errorMessage } from '../../../lib/api-client';
import { useStations } from '../api/get-stations';
import { useNewPairingCode } from '../api/new-pairing-code';
import { useRevokeStation } from '../api/revoke-station';
import { useNow } from '../hooks/use-now';
import { PairingCodeDialog } from './pairing-code';
import { newCodeButtonId, StationCard } from './station-card';

const NOTICE_ID = 'stations-notice';

const revokeMessages = {
  already_revoked: 'Someone revoked this station already. Close this and look at the list again.',
  station_not_found: 'This station is no longer in the list. Close this and look again.',
};

const revokeConsequences: Record<Station['kind'], string> = {
  machine: 'Nobody can badge in at that machine through it until a device is paired again.',
  crib: 'No checkouts or returns go through it until a device is paired again.',
  board: 'The wall shows the pairing screen until a device is paired again.',
};

export function StationsList({ timeZone }: { timeZone: string | undefined }) {
  const stations = useStations();
  const now = useNow(30_000);
  const newCode = useNewPairingCode();
  const revoke = useRevokeStation();
  const [shownCode, setShownCode] = useState<StationWithCode | null>(null);
  const [revoking, setRevoking] = useState<Station | null>(null);
  const [revoked, setRevoked] = useState<Station | null>(null);
  // Where focus goes once a dialog has closed, when the control that opened it is busy or gone.
  const focusAfterDialog = useRef<string | null>(null);

  useEffect(() => {
    if (shownCode || revoking || !focusAfterDialog.current) return;
    document.getElementById(focusAfterDialog.current)?.focus();
    focusAfterDialog.current = null;
  }, [shownCode, revoking]);

  if (stations.isPending) return <Spinner label="Loading the stations…" />;
  if (stations.isError) {
    return <QueryError error={stations.error} what="the stations" onRetry={() => void stations.refetch()} retrying={stations.isFetching} />;
  }

  return (
    <div className="flex flex-col gap-3">
      {revoked && (
        <Alert id={NOTICE_ID} tabIndex={-1} tone="success" title={`${revoked.name} is revoked`}>
          Its device no longer works. The station stays in the list; a new pairing code brings it back into use.
        </Alert>
      )}
      {stations.data.length === 0 ? (
        <EmptyState title="No stations yet — add one for a machine, the crib or the wall board">
          Each tablet, small PC or wall screen in the shop gets a station here and a short code to pair it with.
        </EmptyState>
      ) : (
        <ul aria-label="Stations" className="grid grid-cols-1 gap-3 md:grid-cols-2">
          {stations.data.map((station) => {
            const mine = newCode.variables === station.id;
            return (
              <li key={station.id}>
                <StationCard
                  station={station}
                  now={now}
                  timeZone={timeZone}
                  newCodePending={newCode.isPending && mine}
                  newCodeError={
                    newCode.isError && mine ? (
                      <Alert tone="error" title="Couldn't make a new pairing code.">
                        {errorMessage(newCode.error)}
                      </Alert>
                    ) : null
                  }
                  onNewCode={(chosen) => {
                    setRevoked(null);
                    newCode.mutate(chosen.id, {
                      onSuccess: (answer) => {
                        focusAfterDialog.current = newCodeButtonId(chosen);
                        setShownCode(answer);
                      },
                    });
                  }}
                  onRevoke={(chosen) => {
                    setRevoked(null);
                    revoke.reset();
                    setRevoking(chosen);
                  }}
                />
              </li>
            );
          })}
        </ul>
      )}

      <PairingCodeDialog station={shownCode} timeZone={timeZone} onClose={() => setShownCode(null)} />

      <ConfirmDialog
        open={revoking !== null}
        title={revoking ? `Revoke ${revoking.name}?` : ''}
        confirmLabel="Revoke station"
        confirmVariant="danger"
        pending={revoke.isPending}
        error={revoke.isError ? errorMessage(revoke.error, revokeMessages) : null}
        onCancel={() => setRevoking(null)}
        onConfirm={() => {
          if (!revoking) return;
          revoke.mutate(revoking.id, {
            onSuccess: (answer) => {
              focusAfterDialog.current = NOTICE_ID;
              setRevoked(answer);
              setRevoking(null);
            },
          });
        }}
      >
        {revoking && (
          <>
            <p>
              The device stops working at once: the server refuses it from its next contact, and it goes back to the pairing screen.{' '}
              {revokeConsequences[revoking.kind]}
            </p>
            <p className="mt-2">The station stays in the list, marked revoked.</p>
          </>
        )}
      </ConfirmDialog>
    </div>
  );
}
