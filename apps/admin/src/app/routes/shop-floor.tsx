import { PageHeading } from '../../components/ui/page-heading';
import { MachineFloor } from '../../features/machines/components/machine-floor';

export default function ShopFloorRoute() {
  return (
    <>
      <PageHeading title="Shop floor" description="Every machine in the shop, area by area, with its state as it changes on the floor." />
      <MachineFloor />
    </>
  );
}
