import type { CheckoutMemberSearchProps } from '../../features/crib/components/crib-checkouts-form';
import { CribCheckoutsView } from '../../features/crib/components/crib-checkouts-view';
import { useShop } from '../../features/shop/api/get-shop';
import { CandidateChoice } from '../../features/sign-offs/components/candidate-choice';
import { CribPage } from '../components/crib-page';

/** The same member search as signing off: a search box and every match reachable by Tab. */
function MemberSearch({ onChoose, error, inputRef }: CheckoutMemberSearchProps) {
  return (
    <CandidateChoice
      label="Find the member"
      error={error}
      inputRef={inputRef}
      onChoose={onChoose}
      whyNot={(candidate) => (candidate.active ? null : 'Inactive: reactivate their membership before lending to them.')}
    />
  );
}

export default function CribCheckoutsRoute() {
  const shop = useShop();
  return (
    <CribPage title="Checkouts" description="Lend tools and hand out consumables, see what is out and when it is due, and record returns. Times are the shop's.">
      <CribCheckoutsView timeZone={shop.data?.timeZone} MemberSearch={MemberSearch} />
    </CribPage>
  );
}
