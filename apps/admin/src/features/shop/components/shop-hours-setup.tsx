import { Alert } from '../../../components/ui/alert';
import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { useAddClosure } from '../api/add-closure';
import { useShopHours } from '../api/get-shop-hours';
import { useRemoveClosure } from '../api/remove-closure';
import { useUpdateShopHours } from '../api/update-shop-hours';
import { todayText } from '../utils/hours-text';
import { ClosureForm } from './closure-form';
import { ClosuresList } from './closures-list';
import { WeeklyHoursForm } from './weekly-hours-form';

/** Setup › Shop hours: today at a glance, the weekly hours and the closures. */
export function ShopHoursSetup() {
  const hours = useShopHours();
  const update = useUpdateShopHours();
  const addClosure = useAddClosure();
  const removeClosure = useRemoveClosure();

  if (hours.isPending) return <Spinner label="Loading the shop hours…" />;
  if (hours.isError) return <QueryError error={hours.error} what="the shop hours" onRetry={() => void hours.refetch()} retrying={hours.isFetching} />;

  const { timeZone, weekly, closures, today } = hours.data;
  const now = todayText(hours.data);
  return (
    <div className="flex flex-col gap-6">
      <section aria-label="Today" className="flex flex-col gap-1 rounded-lg border border-neutral-300 bg-white p-4">
        <p className="text-lg font-bold text-neutral-900">{now.state}</p>
        <p className="text-neutral-800">{now.change}</p>
        <p className="text-neutral-700">
          Today’s hours: {now.hours}. Times are the shop’s own, in its time zone, {timeZone}.
        </p>
      </section>

      {weekly.length === 0 && (
        <Alert tone="info" title="No opening hours set: the shop counts as open at all times.">
          Members can start on a machine at any hour until you give the days their hours here. Instructors and admins may work outside the hours
          in any case.
        </Alert>
      )}

      <div className="grid grid-cols-1 items-start gap-6 xl:grid-cols-2">
        <Panel
          title="Weekly hours"
          description="Outside these hours stations refuse members; instructors and admins supervise themselves and may still work."
        >
          <WeeklyHoursForm weekly={weekly} onSave={async (input) => (await update.mutateAsync(input)).weekly} />
        </Panel>
        <Panel title="Closures" description="Whole days the shop stays shut, whatever the weekly hours say: holidays, deep cleans, moving machines.">
          <div className="flex flex-col gap-6">
            <ClosuresList closures={closures} onRemove={(closure) => removeClosure.mutateAsync(closure.id)} />
            <div className="flex flex-col gap-3 border-t border-neutral-300 pt-4">
              <h3 className="text-lg font-bold text-neutral-900">Add a closure</h3>
              <ClosureForm today={today.date} onAdd={(input) => addClosure.mutateAsync(input)} />
            </div>
          </div>
        </Panel>
      </div>
    </div>
  );
}
