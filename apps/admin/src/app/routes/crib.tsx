import { CribInventory } from '../../features/crib/components/crib-inventory';
import { CribPage } from '../components/crib-page';

export default function CribRoute() {
  return (
    <CribPage
      title="Crib inventory"
      description="The tools members borrow and the consumables they take. Tick tools to print their asset tag labels; export the list as CSV, change it in a spreadsheet and import it back."
    >
      <CribInventory />
    </CribPage>
  );
}
