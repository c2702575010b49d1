import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import type { CheckoutMemberSearchProps } from '../../features/crib/components/crib-checkouts-form';
import { CribCheckoutsView } from '../../features/crib/components/crib-checkouts-view';
import { CribTabs } from '../../features/crib/components/crib-tabs';
import { useShop } from '../../features/shop/api/get-shop';
import { CandidateSearch } from '../../features/sign-offs/components/candidate-search';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

/** The same member search as signing off: a search box and every match reachable by Tab. */
function MemberSearch({ onChoose, error }: CheckoutMemberSearchProps) {
  return (
    <CandidateSearch
      label="Find the member"
      error={error}
      renderResult={(candidate) =>
        candidate.active ? (
          <button
            type="button"
            onClick={() => onChoose(candidate)}
            className="flex min-h-11 w-full flex-col items-start px-4 py-3 text-left hover:bg-brand-soft"
          >
            <span className="font-bold text-brand underline underline-offset-4">Choose {candidate.name}</span>
            <span className="break-all text-neutral-800">{candidate.email}</span>
          </button>
        ) : (
          <div className="flex flex-col px-4 py-3">
            <span className="font-bold text-neutral-900">{candidate.name}</span>
            <span className="break-all text-neutral-800">{candidate.email}</span>
            <span className="text-sm text-neutral-700">Inactive: reactivate their membership before lending to them.</span>
          </div>
        )
      }
    />
  );
}

export default function CribCheckoutsRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'manage:crib:any')) return <NoAccess area="the crib" />;

  return (
    <>
      <CribTabs />
      <PageHeading title="Checkouts" description="Lend tools and hand out consumables, see what is out and when it is due, and record returns. Times are the shop's." />
      <CribCheckoutsView timeZone={shop.data?.timeZone} MemberSearch={MemberSearch} />
    </>
  );
}
