import { RESERVATION_LIST_PAGE_SIZE, reservationStatuses, type ReservationStatus } from '@chuckkey/core';
import { useCallback, useMemo } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { EmptyState } from '../../../components/ui/empty-state';
import { ChoiceFilter, FilterBar } from '../../../components/ui/filter-bar';
import { PagedResults } from '../../../components/ui/paged-results';
import { SelectField } from '../../../components/ui/select-field';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { TextField } from '../../../components/ui/text-field';
import { paths } from '../../../config/paths';
import { useMachines } from '../../machines/api/get-machines';
import { useReservations } from '../api/get-reservations';
import {
  isReservationStatus,
  readReservationFilters,
  reservationCsvHref,
  reservationFiltersToSearchParams,
  type ReservationFilters,
} from '../utils/reservation-filters';
import { spanLabel } from '../utils/week-slots';

const statusLabels: Record<ReservationStatus, string> = {
  active: 'Reserved',
  checked_in: 'Checked in',
  cancelled: 'Cancelled',
  released: 'Freed for others',
  no_show: 'No-show',
};

/** Every reservation in the shop, filtered by days, machine and status, with the same list as CSV. */
export function ReservationsAdminView({ timeZone }: { timeZone: string | undefined }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = useMemo(() => readReservationFilters(searchParams), [searchParams]);
  const update = useCallback(
    (change: Partial<ReservationFilters>) =>
      // A changed filter starts again at its first page.
      setSearchParams((current) => reservationFiltersToSearchParams({ ...readReservationFilters(current), ...change, page: change.page ?? 1 })),
    [setSearchParams],
  );
  const machines = useMachines();
  const list = useReservations(filters, timeZone);
  const filtered = Boolean(filters.from || filters.to || filters.machineId || filters.status);

  return (
    <div className="flex flex-col gap-4">
      <FilterBar label="Filter the reservations" exportHref={timeZone ? reservationCsvHref(filters, timeZone) : undefined}>
        <TextField label="From" type="date" value={filters.from ?? ''} onChange={(event) => update({ from: event.target.value || undefined })} />
        <TextField label="To" type="date" value={filters.to ?? ''} onChange={(event) => update({ to: event.target.value || undefined })} />
        <SelectField label="Machine" value={filters.machineId ?? ''} onChange={(event) => update({ machineId: event.target.value || undefined })}>
          <option value="">Every machine</option>
          {(machines.data ?? []).map((machine) => (
            <option key={machine.id} value={machine.id}>
              {machine.name}
            </option>
          ))}
        </SelectField>
        <ChoiceFilter
          label="Status"
          every="Every status"
          value={filters.status}
          choices={reservationStatuses.map((status) => ({ value: status, label: statusLabels[status] }))}
          isChoice={isReservationStatus}
          onChange={(status) => update({ status })}
        />
      </FilterBar>

      <PagedResults
        query={list}
        loadingLabel="Loading the reservations…"
        what="the reservations"
        page={filters.page}
        pageSize={RESERVATION_LIST_PAGE_SIZE}
        nouns={['reservation', 'reservations']}
        onPageChange={(page) => update({ page })}
        empty={
          <EmptyState title={filtered ? 'No reservation matches these filters' : 'No reservations yet'}>
            {filtered ? 'Widen the days or choose every machine.' : 'Members reserve machines under Reserve; admins choose which machines can be reserved in Setup.'}
          </EmptyState>
        }
      >
        {(items) => (
          <Table caption="Reservations">
            <THead>
              <Tr>
                <Th>When</Th>
                <Th>Machine</Th>
                <Th>Member</Th>
                <Th>Kind</Th>
                <Th>Status</Th>
              </Tr>
            </THead>
            <TBody>
              {items.map((item) => {
                const name = `${item.member.firstName} ${item.member.lastName}`;
                return (
                  <Tr key={item.id}>
                    <Td className="whitespace-nowrap">{timeZone ? spanLabel(new Date(item.start), new Date(item.end), timeZone) : item.start}</Td>
                    <Td className="font-bold">{item.machine.name}</Td>
                    <Td>
                      <Link to={paths.memberRecord.getHref(item.member.id)} state={{ name }} className="text-brand underline underline-offset-4">
                        {name}
                      </Link>
                    </Td>
                    <Td>{item.kind === 'class' ? 'Class' : 'Member'}</Td>
                    <Td>{statusLabels[item.status]}</Td>
                  </Tr>
                );
              })}
            </TBody>
          </Table>
        )}
      </PagedResults>
    </div>
  );
}
