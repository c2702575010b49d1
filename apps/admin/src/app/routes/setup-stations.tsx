import { can } from '@chuckkey/core';
import { useState } from 'react';
import { Button } from '../../components/ui/button';
import { PlusIcon } from '../../components/ui/icons';
import { PageHeading } from '../../components/ui/page-heading';
import { useMachines } from '../../features/machines/api/get-machines';
import { useShop } from '../../features/shop/api/get-shop';
import { AddStationDialog } from '../../features/stations/components/add-station-dialog';
import { StationsList } from '../../features/stations/components/stations-list';
import { NoAccess } from '../components/no-access';
import { SetupNav } from '../components/setup-nav';
import { useSignedInUser } from '../signed-in-user';

function Stations() {
  const shop = useShop();
  const machines = useMachines();
  const [adding, setAdding] = useState(false);
  const timeZone = shop.data?.timeZone;
  return (
    <>
      <PageHeading
        title="Stations"
        description="Each tablet, small PC or wall screen in the shop is paired once to its station with a short code. It then holds a credential of its own, not a person’s."
        actions={
          <Button onClick={() => setAdding(true)}>
            <PlusIcon />
            Add a station
          </Button>
        }
      />
      <StationsList timeZone={timeZone} />
      <AddStationDialog open={adding} machines={machines} timeZone={timeZone} onClose={() => setAdding(false)} />
    </>
  );
}

export default function SetupStationsRoute() {
  const user = useSignedInUser();
  if (!can(user.role, 'manage:station:any')) return <NoAccess area="Setup" />;
  return (
    <>
      <SetupNav user={user} />
      <Stations />
    </>
  );
}
