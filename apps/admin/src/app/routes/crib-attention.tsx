import { CribAttentionList } from '../../features/crib/components/crib-attention-list';
import { useShop } from '../../features/shop/api/get-shop';
import { CribPage } from '../components/crib-page';

export default function CribAttentionRoute() {
  const shop = useShop();
  return (
    <CribPage
      title="Needs attention"
      description="Tools returned needing attention or damaged are out of circulation. Once one is repaired or checked, put it back in circulation."
    >
      <CribAttentionList timeZone={shop.data?.timeZone} />
    </CribPage>
  );
}
