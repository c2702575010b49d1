import type { CribCheckout } from '@chuckkey/core';
import { useQuery } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { FilterBar } from '../../../components/ui/filter-bar';
import { PagedResults } from '../../../components/ui/paged-results';
import { ActionsTh, SortableThs, TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { TextField } from '../../../components/ui/text-field';
import { formatDateTime } from '../../../lib/format';
import { nextSort, type SortColumn } from '../../../lib/table-sort';
import { cribCheckoutsQueryOptions } from '../api/checkouts';
import { useCribClock } from '../hooks/use-crib-clock';
import { CHECKOUT_PAGE_SIZE, checkoutPage, type CheckoutSort, type CheckoutSortField } from '../utils/crib-checkouts-rows';
import { CribCheckoutsDueBadge } from './crib-checkouts-due-badge';
import { conditionLabels } from './crib-checkouts-return-dialog';

const columns: SortColumn<CheckoutSortField>[] = [
  { field: 'member', label: 'Member' },
  { field: 'item', label: 'Item' },
  { field: 'checkedOut', label: 'Checked out' },
  { field: 'due', label: 'Due' },
];

function historyState(checkout: CribCheckout): string {
  if (checkout.itemKind === 'consumable') return `Taken: ${checkout.quantity}`;
  return checkout.returnCondition ? `Returned: ${conditionLabels[checkout.returnCondition]}` : 'Returned';
}

interface CribCheckoutsTableProps {
  /** The tools out now, or the recent history of checkouts and takes. */
  open: boolean;
  timeZone: string | undefined;
  onReturn?: (checkout: CribCheckout) => void;
}

/** The crib's checkouts, searched by member or item, sorted by any column, a page at a time. */
export function CribCheckoutsTable({ open, timeZone, onReturn }: CribCheckoutsTableProps) {
  const now = useCribClock();
  const [search, setSearch] = useState('');
  const [sort, setSort] = useState<CheckoutSort>(open ? { field: 'due', order: 'asc' } : { field: 'checkedOut', order: 'desc' });
  const [page, setPage] = useState(1);
  const select = useCallback((rows: CribCheckout[]) => checkoutPage(rows, { search, sort, page }), [search, sort, page]);
  const list = useQuery({ ...cribCheckoutsQueryOptions(open), select });
  const caption = open ? 'Checked-out tools' : 'Checkouts and takes';
  const searchLabel = open ? 'Search the tools out' : 'Search the history';

  return (
    <div className="flex flex-col gap-4">
      <FilterBar label={open ? 'Filter the tools out' : 'Filter the history'}>
        <TextField
          label={searchLabel}
          hint="Part of the member’s name or the item’s."
          type="search"
          autoComplete="off"
          spellCheck={false}
          value={search}
          onChange={(event) => {
            setSearch(event.target.value);
            setPage(1);
          }}
          containerClassName="flex flex-1 flex-col gap-1.5"
        />
      </FilterBar>
      <PagedResults
        query={list}
        loadingLabel={open ? 'Loading the tools out…' : 'Loading the history…'}
        what={open ? 'the tools out' : 'the history'}
        page={page}
        pageSize={CHECKOUT_PAGE_SIZE}
        nouns={open ? ['tool out', 'tools out'] : ['checkout', 'checkouts']}
        onPageChange={setPage}
        empty={
          search.trim() ? (
            <EmptyState title={`Nothing matches “${search.trim()}”`}>Try part of the member’s first or last name, or of the item’s name.</EmptyState>
          ) : open ? (
            <EmptyState title="No tools are out">Every tool is in the crib. Check one out to a member with the form above.</EmptyState>
          ) : (
            <EmptyState title="No checkouts yet">Tools lent and consumables taken are listed here, newest first.</EmptyState>
          )
        }
      >
        {(items) => (
          <Table caption={caption}>
            <THead>
              <Tr>
                <SortableThs
                  columns={columns}
                  sortedField={sort.field}
                  order={sort.order}
                  onSort={(field) => {
                    setSort((current) => nextSort(current, field));
                    setPage(1);
                  }}
                />
                <Th>{open ? 'Overdue' : 'State'}</Th>
                {open && onReturn && <ActionsTh />}
              </Tr>
            </THead>
            <TBody>
              {items.map((checkout) => (
                <Tr key={checkout.id}>
                  <Td className="font-bold">{checkout.memberName}</Td>
                  <Td>{checkout.itemName}</Td>
                  <Td className="whitespace-nowrap">{formatDateTime(checkout.checkedOutAt, timeZone)}</Td>
                  <Td className="whitespace-nowrap">{checkout.dueAt ? formatDateTime(checkout.dueAt, timeZone) : '—'}</Td>
                  <Td>{checkout.itemKind === 'tool' && !checkout.returnedAt ? <CribCheckoutsDueBadge dueAt={checkout.dueAt} now={now} /> : historyState(checkout)}</Td>
                  {open && onReturn && (
                    <Td>
                      <Button variant="secondary" aria-label={`Return ${checkout.itemName} from ${checkout.memberName}`} onClick={() => onReturn(checkout)}>
                        Return
                      </Button>
                    </Td>
                  )}
                </Tr>
              ))}
            </TBody>
          </Table>
        )}
      </PagedResults>
    </div>
  );
}
