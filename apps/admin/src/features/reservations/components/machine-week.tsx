import { addCalendarDays, wallTimeToInstant, type MachineDetail } from '@chuckkey/core';
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { useShopHours } from '../../shop/api/get-shop-hours';
import { useCreateReservation } from '../api/create-reservation';
import { useAvailability } from '../api/get-availability';
import { useMyReservations } from '../api/get-my-reservations';
import { calendarDateLabel, mondayOf, quotaLeft, weekSlots, type Slot } from '../utils/week-slots';
import { ReserveForm } from './reserve-form';
import { WeekView } from './week-view';

interface MachineWeekProps {
  machine: MachineDetail;
  timeZone: string;
}

/** One machine's week in the shop's time zone, with the form that reserves a chosen start. */
export function MachineWeek({ machine, timeZone }: MachineWeekProps) {
  const thisMonday = mondayOf(new Date(), timeZone);
  const [monday, setMonday] = useState(thisMonday);
  const [chosen, setChosen] = useState<Slot | null>(null);
  const from = wallTimeToInstant(monday, 0, timeZone)?.toISOString();
  const to = wallTimeToInstant(addCalendarDays(monday, 7), 0, timeZone)?.toISOString();
  const availability = useAvailability(machine.id, from, to);
  const hours = useShopHours();
  const mine = useMyReservations();
  const reserve = useCreateReservation();

  if (availability.isError) return <QueryError error={availability.error} what="the machine's week" onRetry={() => void availability.refetch()} />;
  if (hours.isError) return <QueryError error={hours.error} what="the shop's hours" onRetry={() => void hours.refetch()} />;
  if (!availability.data || !hours.data) return <Spinner label="Loading the week…" />;

  const { rules } = availability.data;
  const days = weekSlots({
    monday,
    timeZone,
    slotMinutes: rules.slotMinutes,
    weekly: hours.data.weekly,
    closures: hours.data.closures,
    taken: availability.data.taken,
    now: new Date(),
  });
  const lastDay = addCalendarDays(hours.data.today.date, rules.horizonDays);
  const all = mine.data ? [...mine.data.upcoming, ...mine.data.past] : [];
  const quotaWeek = chosen ? mondayOf(chosen.start, timeZone) : monday;
  const moveWeek = (weeks: number) => {
    setMonday(addCalendarDays(monday, weeks * 7));
    setChosen(null);
  };

  return (
    <div className="flex flex-col gap-6">
      <Panel title={`${machine.name}: week of ${calendarDateLabel(monday)}`} description={`Times are the shop's (${timeZone}). Choose a free start, then the length below.`}>
        <div className="mb-4 flex flex-wrap gap-2">
          <Button variant="secondary" onClick={() => moveWeek(-1)} disabled={monday <= thisMonday}>
            Previous week
          </Button>
          <Button variant="secondary" onClick={() => moveWeek(1)} disabled={addCalendarDays(monday, 7) > lastDay}>
            Next week
          </Button>
        </div>
        <WeekView days={days} chosen={chosen?.start.getTime() ?? null} onChoose={setChosen} />
      </Panel>
      <Panel title="Reserve">
        <ReserveForm
          key={machine.id}
          machine={machine}
          rules={rules}
          timeZone={timeZone}
          start={chosen?.start ?? null}
          quotaLeftMinutes={quotaLeft(all, machine.id, quotaWeek, timeZone, rules.weeklyQuotaMinutes)}
          onReserve={async (body) => {
            await reserve.mutateAsync(body);
            setChosen(null);
          }}
        />
      </Panel>
    </div>
  );
}
