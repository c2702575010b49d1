import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { useShopPolicies } from '../api/get-shop-policies';
import { useUpdateShopPolicies } from '../api/update-shop-policies';
import { ShopPoliciesForm } from './shop-policies-form';

/** Setup › Policies: the shop-wide rules that hold members back from the machines (clearance rule 8). */
export function ShopPoliciesSetup() {
  const policies = useShopPolicies();
  const update = useUpdateShopPolicies();

  if (policies.isPending) return <Spinner label="Loading the policies…" />;
  if (policies.isError) return <QueryError error={policies.error} what="the policies" onRetry={() => void policies.refetch()} retrying={policies.isFetching} />;

  return (
    <Panel title="Tool crib" description="Whether a tool kept past its due time stops its borrower at the machines.">
      <ShopPoliciesForm policies={policies.data} onSave={(input) => update.mutateAsync(input)} />
    </Panel>
  );
}
