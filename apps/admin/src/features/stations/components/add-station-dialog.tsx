import type { StationWithCode } from '@chuckkey/core';
import type { UseQueryResult } from '@tanstack/react-query';
import { useState } from 'react';
import { Dialog } from '../../../components/ui/dialog';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { useCreateStation } from '../api/create-station';
import { useStations } from '../api/get-stations';
import { AddStationForm } from './add-station-form';
import { PairingCode, pairingCodeTitle } from './pairing-code';

interface AddStationDialogProps {
  open: boolean;
  /** The shop's machines, for a machine station; the page that opens the dialog loads them. */
  machines: UseQueryResult<readonly { id: string; name: string }[]>;
  timeZone: string | undefined;
  onClose: () => void;
}

/** Adding a station and showing its pairing code happen in one dialog: the code is shown only this once. */
export function AddStationDialog({ open, machines, timeZone, onClose }: AddStationDialogProps) {
  const create = useCreateStation();
  const stations = useStations();
  const [created, setCreated] = useState<StationWithCode | null>(null);

  const close = () => {
    setCreated(null);
    create.reset();
    onClose();
  };

  return (
    <Dialog
      open={open}
      title={created ? pairingCodeTitle(created) : 'Add a station'}
      description={created ? undefined : 'Choose what the device is for. Next you get a short code to type on it.'}
      busy={create.isPending}
      onClose={close}
    >
      {created ? (
        <PairingCode station={created} timeZone={timeZone} onDone={close} />
      ) : machines.isPending ? (
        <Spinner label="Loading the machines…" />
      ) : machines.isError ? (
        <QueryError error={machines.error} what="the machines" onRetry={() => void machines.refetch()} retrying={machines.isFetching} />
      ) : (
        <AddStationForm
          machines={machines.data}
          stations={stations.data ?? []}
          pending={create.isPending}
          onCancel={close}
          onCreate={async (input) => setCreated(await create.mutateAsync(input))}
        />
      )}
    </Dialog>
  );
}
