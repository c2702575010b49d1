import { Link, useSearchParams } from 'react-router-dom';
import { EmptyState } from '../../components/ui/empty-state';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { QueryError } from '../../components/ui/query-error';
import { Spinner } from '../../components/ui/spinner';
import { cn } from '../../components/ui/cn';
import { paths } from '../../config/paths';
import { useMachines } from '../../features/machines/api/get-machines';
import { MachineWeek } from '../../features/reservations/components/machine-week';
import { MyReservationsPanel } from '../../features/reservations/components/my-reservations-panel';
import { useShop } from '../../features/shop/api/get-shop';

export default function ReserveRoute() {
  const [searchParams] = useSearchParams();
  const machines = useMachines();
  const shop = useShop();
  const timeZone = shop.data?.timeZone;
  const reservable = (machines.data ?? []).filter((machine) => machine.reservable);
  const chosenId = searchParams.get('machine');
  const chosen = reservable.find((machine) => machine.id === chosenId) ?? null;

  return (
    <>
      <PageHeading title="Reserve" description="Claim time on a machine ahead: choose the machine, a free start in its week, and how long." />
      <div className="flex flex-col gap-6">
        <Panel title="Machines you can reserve" description="Others are first come, first served at the station.">
          {machines.isError ? (
            <QueryError error={machines.error} what="the machines" onRetry={() => void machines.refetch()} />
          ) : !machines.data ? (
            <Spinner label="Loading the machines…" />
          ) : reservable.length === 0 ? (
            <EmptyState title="No machine can be reserved yet">Ask an admin which machines take reservations; the others are free to walk up to.</EmptyState>
          ) : (
            <ul className="grid grid-cols-1 gap-2 sm:grid-cols-2 lg:grid-cols-3">
              {reservable.map((machine) => (
                <li key={machine.id}>
                  <Link
                    to={paths.reserve.getHref(machine.id)}
                    aria-current={machine.id === chosen?.id ? 'page' : undefined}
                    className={cn(
                      'flex min-h-11 flex-col rounded-md border px-3 py-2',
                      machine.id === chosen?.id ? 'border-brand bg-brand-soft' : 'border-neutral-300 hover:bg-neutral-100',
                    )}
                  >
                    <span className="font-bold text-brand">{machine.name}</span>
                    <span className="text-sm text-neutral-700">
                      {machine.area}
                      {machine.trainings.length > 0 && ` · needs ${machine.trainings.map((t) => t.name).join(', ')}`}
                    </span>
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </Panel>

        {chosen && timeZone && <MachineWeek key={chosen.id} machine={chosen} timeZone={timeZone} />}

        <MyReservationsPanel timeZone={timeZone} />
      </div>
    </>
  );
}
