import { can } from '@chuckkey/core';
import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { Button, ButtonLink } from '../../components/ui/button';
import { EmptyState } from '../../components/ui/empty-state';
import { PrinterIcon } from '../../components/ui/icons';
import { PageHeading } from '../../components/ui/page-heading';
import { QueryError } from '../../components/ui/query-error';
import { Spinner } from '../../components/ui/spinner';
import { paths } from '../../config/paths';
import { useCribItems } from '../../features/crib/api/get-crib-items';
import { AssetLabelSheet, labelledTools, LABELS_PER_SHEET } from '../../features/crib/components/asset-label-sheet';
import { useShop } from '../../features/shop/api/get-shop';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

/** Asset tag labels to print: the tools chosen in the inventory (`?items=id,id`), or every tool. */
export default function CribLabelsRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  const items = useCribItems();
  const [searchParams] = useSearchParams();
  const wanted = searchParams.get('items');
  const tools = useMemo(() => {
    const all = labelledTools(items.data ?? []);
    if (!wanted) return all;
    const ids = new Set(wanted.split(','));
    return all.filter((tool) => ids.has(tool.id));
  }, [items.data, wanted]);

  if (!can(user.role, 'manage:crib:any')) return <NoAccess area="the crib" />;

  const sheets = Math.ceil(tools.length / LABELS_PER_SHEET);
  return (
    <>
      <div className="flex flex-col gap-4 print:hidden">
        <PageHeading
          title="Asset tag labels"
          description={
            <>
              Labels of 64 × 33 mm, 24 to a sheet (3 across, 8 down), for A4 or US Letter paper. Print at 100 % (&ldquo;actual size&rdquo;) so that each
              code stays the size scanners expect.
            </>
          }
          actions={
            <>
              <ButtonLink to={paths.crib.getHref()}>Back to the inventory</ButtonLink>
              {tools.length > 0 && (
                <Button onClick={() => window.print()}>
                  <PrinterIcon />
                  Print
                </Button>
              )}
            </>
          }
        />
        {tools.length > 0 && (
          <p className="text-neutral-800">
            {tools.length === 1 ? '1 label' : `${tools.length} labels`} for {wanted ? 'the chosen tools' : 'every tool in the crib'}, on{' '}
            {sheets === 1 ? '1 sheet' : `${sheets} sheets`}.
          </p>
        )}
      </div>
      {items.isPending ? (
        <Spinner label="Loading the tools…" />
      ) : items.isError ? (
        <QueryError error={items.error} what="the crib's tools" onRetry={() => void items.refetch()} retrying={items.isFetching} />
      ) : tools.length === 0 ? (
        <EmptyState title="No tools to label" action={<ButtonLink to={paths.crib.getHref()}>Go to the inventory</ButtonLink>}>
          {wanted ? 'The chosen tools are no longer in the crib.' : 'Add tools to the crib first; each gets a label with the QR code of its asset tag.'}
        </EmptyState>
      ) : (
        <AssetLabelSheet tools={tools} shopName={shop.data?.name} />
      )}
    </>
  );
}
