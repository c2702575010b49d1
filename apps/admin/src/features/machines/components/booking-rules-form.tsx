import type { MachineReservationRules, ReservationRulesInput } from '@chuckkey/core';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { TextField } from '../../../components/ui/text-field';
import { splitServerErrors } from '../../../lib/form-errors';
import { useReservationRules, useUpdateReservationRules } from '../api/reservation-rules';
import {
  bookingRulesFields,
  bookingRulesResolver,
  formFieldOf,
  messageFor,
  toFormValues,
  type BookingRulesField,
  type BookingRulesFormValues,
} from '../utils/booking-rules-form';

interface FieldText {
  label: string;
  hint: string;
  /** Hours may be fractional; every other rule is a whole number. */
  decimal?: boolean;
}

const fieldText: Record<BookingRulesField, FieldText> = {
  slotMinutes: { label: 'Slot step (minutes)', hint: 'Reservations start and end on these steps, counted from midnight. 5 to 240, dividing the day. Default 15.' },
  maxMinutes: { label: 'Longest reservation (minutes)', hint: 'A whole number of steps, up to 1,440. Default 120.' },
  bufferMinutes: { label: 'Buffer after each reservation (minutes)', hint: 'Kept free for cleanup after every reservation. 0 to 240. Default 0.' },
  horizonDays: { label: 'Booking horizon (days)', hint: 'How many days ahead members can reserve. 1 to 365. Default 14.' },
  weeklyQuotaHours: {
    label: 'Weekly quota per member (hours)',
    hint: "Reserved time each member may hold per Monday–Sunday week in the shop's time zone; 0 to 168, e.g. 1.5. Default 6.",
    decimal: true,
  },
  checkInMinutes: { label: 'Check-in window (minutes)', hint: 'How early before the start the holder can check in at the station. 0 to 120. Default 10.' },
  noShowGraceMinutes: {
    label: 'No-show grace (minutes)',
    hint: 'How long after the start a reservation waits for check-in before it is freed as a no-show. 0 to 120. Default 15.',
  },
  noShowLimit: { label: 'No-show limit', hint: 'This many no-shows within the window suspend the member from reserving this machine. 1 to 100. Default 3.' },
  noShowWindowDays: { label: 'No-show window (days)', hint: 'The days over which no-shows are counted. 1 to 365. Default 30.' },
  suspensionDays: { label: 'Suspension (days)', hint: 'How long reserving stays suspended after the last of those no-shows. 0 to 365. Default 7.' },
};

interface BookingRulesFormProps {
  machineName: string;
  current: MachineReservationRules;
  onSave: (rules: ReservationRulesInput) => Promise<unknown>;
}

export function BookingRulesForm({ machineName, current, onSave }: BookingRulesFormProps) {
  const [saved, setSaved] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<BookingRulesFormValues, unknown, ReservationRulesInput>({
    // Whether the machine can be reserved is saved with the machine's details; the rules keep it as it is.
    resolver: bookingRulesResolver(() => current.reservable),
    defaultValues: toFormValues(current.rules),
  });

  const onSubmit = handleSubmit(
    async (rules) => {
      setSaved(false);
      setFormError(null);
      try {
        await onSave(rules);
        setSaved(true);
      } catch (error) {
        // The server names body fields; the quota's minutes land on the form's hours.
        const split = splitServerErrors(error, ['reservable', 'weeklyQuotaMinutes', ...bookingRulesFields]);
        const byFormField = new Map<BookingRulesField, string>();
        const leftovers: string[] = [];
        for (const [bodyField, message] of Object.entries(split.fields)) {
          if (typeof message !== 'string') continue;
          const field = formFieldOf(bodyField);
          if (field) byFormField.set(field, messageFor(field, message));
          else leftovers.push(message);
        }
        // In the form's own order, so focus lands on the first field in reading order.
        let first = true;
        for (const field of bookingRulesFields) {
          const message = byFormField.get(field);
          if (message === undefined) continue;
          setError(field, { type: 'server', message }, { shouldFocus: first });
          first = false;
        }
        const alert = [split.message, ...leftovers].filter(Boolean).join(' ');
        setFormError(alert === '' ? null : alert);
      }
    },
    () => setSaved(false),
  );

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label={`Booking rules for the ${machineName}`}>
      <p className="text-neutral-800">
        {current.reservable
          ? `The ${machineName} can be reserved.`
          : `The ${machineName} is walk-up only, so these rules wait until it can be reserved.`}{' '}
        Change that with "Can be reserved" in the machine details above.
      </p>
      {formError && <Alert tone="error">{formError}</Alert>}
      <div className="grid gap-4 md:grid-cols-2">
        {bookingRulesFields.map((field) => (
          <TextField
            key={field}
            label={fieldText[field].label}
            hint={fieldText[field].hint}
            inputMode={fieldText[field].decimal ? 'decimal' : 'numeric'}
            autoComplete="off"
            error={errors[field]?.message}
            {...register(field, { onChange: () => setSaved(false) })}
          />
        ))}
      </div>
      <div className="flex flex-col gap-2 sm:flex-row sm:items-center">
        <Button type="submit" pending={isSubmitting}>
          Save booking rules
        </Button>
        <p role="status" className="text-neutral-800">
          {saved ? `The booking rules of the ${machineName} are saved.` : ''}
        </p>
      </div>
    </form>
  );
}

/** The machine's booking rules as the server has them now, loaded and saved on their own. */
export function BookingRulesPanelBody({ machineId, machineName }: { machineId: string; machineName: string }) {
  const current = useReservationRules(machineId);
  const update = useUpdateReservationRules();
  if (current.isPending) return <Spinner label="Loading the booking rules…" />;
  if (current.isError) {
    return <QueryError error={current.error} what="the booking rules" onRetry={() => void current.refetch()} retrying={current.isFetching} />;
  }
  return <BookingRulesForm machineName={machineName} current={current.data} onSave={(rules) => update.mutateAsync({ machineId, rules })} />;
}
