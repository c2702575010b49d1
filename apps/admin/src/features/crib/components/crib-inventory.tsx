import { cribItemKinds, type CribItem } from '@chuckkey/core';
import { useQuery } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { ChoiceFilter, FilterBar } from '../../../components/ui/filter-bar';
import { DownloadIcon, PlusIcon, PrinterIcon } from '../../../components/ui/icons';
import { PagedResults } from '../../../components/ui/paged-results';
import { SelectField } from '../../../components/ui/select-field';
import { ActionsTh, SortableThs, TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { TextField } from '../../../components/ui/text-field';
import { paths } from '../../../config/paths';
import { WIDE_SCREEN, useMediaQuery } from '../../../hooks/use-media-query';
import { cribItemsCsvHref } from '../api/import-crib-items';
import { cribItemsQueryOptions } from '../api/get-crib-items';
import { useInventoryFilters } from '../hooks/use-inventory-filters';
import {
  availabilities,
  availabilityLabels,
  conditionLabels,
  formatPrice,
  INVENTORY_PAGE_SIZE,
  inventoryColumns,
  inventorySorts,
  kindLabels,
  nextSort,
  pageOf,
  reorderState,
  visibleItems,
  type Availability,
  type InventoryFilters,
  type InventorySort,
} from '../utils/inventory';
import { CribCsvImport } from './crib-csv-import';
import { CribItemForm } from './crib-item-form';
import { CribItemPhoto } from './crib-item-photo';

type Editing = { item: CribItem | undefined; added: boolean } | null;

const isKind = (value: string): value is CribItem['kind'] => (cribItemKinds as readonly string[]).includes(value);
const isAvailability = (value: string): value is Availability => (availabilities as readonly string[]).includes(value);

function Flag({ on, yes, no }: { on: boolean; yes: string; no: string }) {
  return <span className={on ? 'text-neutral-900' : 'font-bold text-warning'}>{on ? yes : no}</span>;
}

/** A tool's condition, or a consumable's count with a badge once it is time to order more. */
function Level({ item }: { item: CribItem }) {
  if (item.kind === 'tool') {
    const condition = item.condition ?? 'good';
    return <span className={condition === 'good' ? undefined : 'font-bold text-danger'}>{conditionLabels[condition]}</span>;
  }
  const state = reorderState(item);
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <span>
        {item.stock} {item.unit}
        {item.priceCents !== null && <span className="text-neutral-700"> · {formatPrice(item.priceCents)} each</span>}
      </span>
      {state && (
        <span className="rounded-full border border-warning bg-warning-soft px-2 py-0.5 text-sm font-bold whitespace-nowrap text-warning">
          {state === 'below' ? 'Below reorder level' : 'At reorder level'}
        </span>
      )}
    </span>
  );
}

function ChooseBox({ item, chosen, onChoose }: { item: CribItem; chosen: boolean; onChoose: (ids: string[], on: boolean) => void }) {
  if (item.kind !== 'tool') return null;
  return (
    <label className="flex size-11 cursor-pointer items-center justify-center">
      <input type="checkbox" className="size-5 cursor-pointer accent-brand" checked={chosen} onChange={(event) => onChoose([item.id], event.target.checked)} />
      <span className="sr-only">Choose {item.name} for a label sheet</span>
    </label>
  );
}

interface ListProps {
  items: CribItem[];
  filters: InventoryFilters;
  chosen: ReadonlySet<string>;
  onChoose: (ids: string[], on: boolean) => void;
  onSort: (sort: InventorySort) => void;
  onEdit: (item: CribItem) => void;
}

function InventoryTable({ items, filters, chosen, onChoose, onSort, onEdit }: ListProps) {
  const tools = items.filter((item) => item.kind === 'tool');
  const allChosen = tools.length > 0 && tools.every((item) => chosen.has(item.id));
  return (
    <Table caption="Crib inventory">
      <THead>
        <Tr>
          <Th className="w-12 px-2">
            {tools.length > 0 && (
              <label className="flex size-11 cursor-pointer items-center justify-center">
                <input
                  type="checkbox"
                  className="size-5 cursor-pointer accent-brand"
                  checked={allChosen}
                  onChange={(event) => onChoose(tools.map((item) => item.id), event.target.checked)}
                />
                <span className="sr-only">Choose every tool on this page for a label sheet</span>
              </label>
            )}
          </Th>
          <SortableThs columns={inventoryColumns} sortedField={filters.sort} order={filters.order} onSort={onSort} />
          <ActionsTh />
        </Tr>
      </THead>
      <TBody>
        {items.map((item) => (
          <Tr key={item.id}>
            <Td className="px-2 py-1">
              <ChooseBox item={item} chosen={chosen.has(item.id)} onChoose={onChoose} />
            </Td>
            <Td className="font-bold">{item.name}</Td>
            <Td>{kindLabels[item.kind]}</Td>
            <Td className="font-mono whitespace-nowrap">{item.assetTag ?? '—'}</Td>
            <Td>{item.binLocation ?? '—'}</Td>
            <Td>
              <Level item={item} />
            </Td>
            <Td>
              <Flag on={item.inCirculation} yes="Yes" no="No" />
            </Td>
            <Td>
              <Flag on={item.available} yes="Yes" no="No" />
            </Td>
            <Td>
              <Button variant="secondary" onClick={() => onEdit(item)}>
                Edit<span className="sr-only"> {item.name}</span>
              </Button>
            </Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}

function InventoryCards({ items, chosen, onChoose, onEdit }: Omit<ListProps, 'filters' | 'onSort'>) {
  return (
    <ul aria-label="Crib inventory" className="flex flex-col gap-3">
      {items.map((item) => (
        <li key={item.id} className="flex gap-2 rounded-lg border border-neutral-300 bg-white p-3">
          <ChooseBox item={item} chosen={chosen.has(item.id)} onChoose={onChoose} />
          <div className="flex min-w-0 flex-1 flex-col gap-1">
            <p className="font-bold text-neutral-900">{item.name}</p>
            <p className="text-sm text-neutral-700">
              {kindLabels[item.kind]}
              {item.assetTag && <span className="font-mono"> · {item.assetTag}</span>}
              {item.binLocation && <> · Bin {item.binLocation}</>}
            </p>
            <Level item={item} />
            <p className="text-sm">
              <Flag on={item.inCirculation} yes="In circulation" no="Out of circulation" /> · <Flag on={item.available} yes="Available" no="Not available" />
            </p>
          </div>
          <Button variant="secondary" onClick={() => onEdit(item)} className="self-start">
            Edit<span className="sr-only"> {item.name}</span>
          </Button>
        </li>
      ))}
    </ul>
  );
}

const sortChoices = inventorySorts.flatMap((sort) => {
  const label = inventoryColumns.find((column) => column.field === sort)?.label ?? sort;
  return [
    { value: `${sort}:asc`, label: `${label}, ascending` },
    { value: `${sort}:desc`, label: `${label}, descending` },
  ];
});

/** The crib's tools and consumables: one table to find, check and change them, with the CSV and label sheets. */
export function CribInventory() {
  const [filters, update] = useInventoryFilters();
  const [searchText, setSearchText] = useState(filters.search ?? '');
  const select = useCallback((items: CribItem[]) => pageOf(visibleItems(items, filters), filters.page, INVENTORY_PAGE_SIZE), [filters]);
  const page = useQuery({ ...cribItemsQueryOptions(), select });
  const [chosen, setChosen] = useState<ReadonlySet<string>>(() => new Set());
  const [editing, setEditing] = useState<Editing>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const wide = useMediaQuery(WIDE_SCREEN);
  const filtered = Boolean(filters.search || filters.kind || filters.availability);

  const onChoose = useCallback((ids: string[], on: boolean) => {
    setChosen((current) => {
      const next = new Set(current);
      for (const id of ids) {
        if (on) next.add(id);
        else next.delete(id);
      }
      return next;
    });
  }, []);

  const close = () => setEditing(null);
  const title = editing?.item ? `Edit ${editing.item.name}` : 'Add an item';

  return (
    <section aria-labelledby="crib-inventory-heading" className="flex flex-col gap-4">
      <h2 id="crib-inventory-heading" className="sr-only">
        Inventory
      </h2>
      {saved && <Alert tone="success">{saved}</Alert>}
      <div className="flex flex-wrap gap-2">
        <Button
          onClick={() => {
            setSaved(null);
            setEditing({ item: undefined, added: false });
          }}
        >
          <PlusIcon />
          Add item
        </Button>
        <a href={cribItemsCsvHref} download className={buttonClasses('secondary')}>
          <DownloadIcon />
          Export CSV
        </a>
        <CribCsvImport />
        <Link to={paths.cribLabels.getHref(chosen.size > 0 ? [...chosen] : undefined)} className={buttonClasses('secondary')}>
          <PrinterIcon />
          {chosen.size > 0 ? `Print labels for ${chosen.size === 1 ? '1 chosen tool' : `${chosen.size} chosen tools`}` : 'Print labels for all tools'}
        </Link>
        {chosen.size > 0 && (
          <Button variant="quiet" onClick={() => setChosen(new Set())}>
            Clear the choice
          </Button>
        )}
      </div>

      <FilterBar label="Find crib items">
        <TextField
          label="Search the crib"
          hint="Part of a name, asset tag, serial number or bin."
          type="search"
          autoComplete="off"
          spellCheck={false}
          value={searchText}
          onChange={(event) => {
            setSearchText(event.target.value);
            update({ search: event.target.value.trim() || undefined });
          }}
          containerClassName="flex flex-1 flex-col gap-1.5"
        />
        <ChoiceFilter
          label="Kind"
          every="Tools and consumables"
          value={filters.kind}
          choices={cribItemKinds.map((kind) => ({ value: kind, label: `${kindLabels[kind]}s` }))}
          isChoice={isKind}
          onChange={(kind) => update({ kind })}
          className="sm:w-52"
        />
        <ChoiceFilter
          label="Availability"
          every="Available or not"
          value={filters.availability}
          choices={availabilities.map((value) => ({ value, label: availabilityLabels[value] }))}
          isChoice={isAvailability}
          onChange={(availability) => update({ availability })}
          className="sm:w-52"
        />
        {!wide && (
          <SelectField
            label="Sort by"
            value={`${filters.sort}:${filters.order}`}
            onChange={(event) => {
              const [sort, order] = event.target.value.split(':');
              const known = inventorySorts.find((value) => value === sort);
              if (known) update({ sort: known, order: order === 'desc' ? 'desc' : 'asc' });
            }}
          >
            {sortChoices.map((choice) => (
              <option key={choice.value} value={choice.value}>
                {choice.label}
              </option>
            ))}
          </SelectField>
        )}
      </FilterBar>

      <PagedResults
        query={page}
        loadingLabel="Loading the crib…"
        what="the crib inventory"
        page={filters.page}
        pageSize={INVENTORY_PAGE_SIZE}
        nouns={['item', 'items']}
        onPageChange={(next) => update({ page: next })}
        pastEndNote="The list is shorter than it was when this page was opened."
        empty={
          filtered ? (
            <EmptyState title="Nothing matches">Try a shorter search, or choose &ldquo;Tools and consumables&rdquo; and &ldquo;Available or not&rdquo;.</EmptyState>
          ) : (
            <EmptyState title="The crib is empty">Add the first tool or consumable with &ldquo;Add item&rdquo;, or import a CSV file.</EmptyState>
          )
        }
      >
        {(items) =>
          wide ? (
            <InventoryTable items={items} filters={filters} chosen={chosen} onChoose={onChoose} onSort={(sort) => update(nextSort(filters, sort))} onEdit={(item) => setEditing({ item, added: false })} />
          ) : (
            <InventoryCards items={items} chosen={chosen} onChoose={onChoose} onEdit={(item) => setEditing({ item, added: false })} />
          )
        }
      </PagedResults>

      <Dialog open={editing !== null} title={title} onClose={close}>
        {editing && (
          <div className="flex flex-col gap-4">
            {editing.added && editing.item && <Alert tone="success">{`${editing.item.name} is added to the crib. Add a photo below, or close.`}</Alert>}
            {!editing.added && (
              <CribItemForm
                item={editing.item}
                onCancel={close}
                onSaved={(item) => {
                  if (editing.item) {
                    setSaved(`Saved the changes to ${item.name}.`);
                    close();
                  } else {
                    setEditing({ item, added: true });
                  }
                }}
              />
            )}
            {editing.item && <CribItemPhoto item={editing.item} onChanged={(item) => setEditing({ ...editing, item })} />}
            {editing.added && (
              <div className="flex justify-end">
                <Button onClick={close}>Close</Button>
              </div>
            )}
          </div>
        )}
      </Dialog>
    </section>
  );
}
