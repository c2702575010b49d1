import type { ReservationRefusalCode, ReservationRules } from '@chuckkey/core';
import { useId, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { ApiError, errorMessage } from '../../../lib/api-client';
import type { ReservationRequestBody } from '../api/create-reservation';
import { durationLabel, spanLabel, startLabel } from '../utils/week-slots';

interface ReserveFormProps {
  machine: { id: string; name: string };
  rules: ReservationRules;
  timeZone: string;
  /** The start chosen in the week view; null until a free slot is chosen. */
  start: Date | null;
  /** Minutes of the weekly quota still free in the chosen start's week. */
  quotaLeftMinutes: number;
  onReserve: (body: ReservationRequestBody) => Promise<unknown>;
}

/** Headlines for the rules a reservation can be refused by; the server's sentence follows with the numbers. */
const refusalTitles: Record<ReservationRefusalCode, string> = {
  not_reservable: 'This machine cannot be reserved',
  in_the_past: 'That time has passed',
  bad_step: 'That time is off the slot steps',
  too_long: 'That is longer than allowed',
  beyond_horizon: 'That is too far ahead',
  suspended: 'Reserving is paused for you',
  training_required: 'A sign-off is needed',
  outside_hours: 'The shop is not open then',
  quota_exceeded: 'That is over your weekly quota',
  overlap: 'That time is already taken',
};

interface Outcome {
  tone: 'success' | 'error';
  title: string;
  text: string;
  code?: string;
}

/**
 * Choose a length for the chosen start, see the rules that apply and the quota left, confirm.
 * A refusal shows the rule that refused, in words, under the form.
 */
export function ReserveForm({ machine, rules, timeZone, start, quotaLeftMinutes, onReserve }: ReserveFormProps) {
  const lengths = Array.from({ length: Math.floor(rules.maxMinutes / rules.slotMinutes) }, (_, i) => (i + 1) * rules.slotMinutes);
  const [length, setLength] = useState(() => Math.min(rules.maxMinutes, Math.max(rules.slotMinutes, 60 - (60 % rules.slotMinutes))));
  const [pending, setPending] = useState(false);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const rulesId = useId();
  const minutes = lengths.includes(length) ? length : (lengths[0] ?? rules.slotMinutes);
  const end = start ? new Date(start.getTime() + minutes * 60_000) : null;

  async function submit(event: FormEvent) {
    event.preventDefault();
    if (!start || !end) return;
    setPending(true);
    setOutcome(null);
    try {
      await onReserve({ machineId: machine.id, start: start.toISOString(), end: end.toISOString() });
      setOutcome({ tone: 'success', title: 'Reserved', text: `The ${machine.name} is yours on ${spanLabel(start, end, timeZone)}. A confirmation is on its way by e-mail.` });
    } catch (error) {
      const code = error instanceof ApiError ? error.code : undefined;
      const title = code && code in refusalTitles ? refusalTitles[code as ReservationRefusalCode] : "Couldn't reserve";
      setOutcome({ tone: 'error', title, text: error instanceof ApiError ? (error.detail ?? error.title) : errorMessage(error), ...(code ? { code } : {}) });
    } finally {
      setPending(false);
    }
  }

  return (
    <form onSubmit={submit} aria-describedby={rulesId} className="flex flex-col gap-4">
      <ul id={rulesId} aria-label="Rules for this machine" className="flex flex-col gap-1 text-neutral-800">
        <li>Starts and ends on steps of {durationLabel(rules.slotMinutes)}.</li>
        <li>At most {durationLabel(rules.maxMinutes)} at a time.</li>
        {rules.bufferMinutes > 0 && <li>{durationLabel(rules.bufferMinutes)} of cleanup is kept free after each reservation.</li>}
        <li>Up to {rules.horizonDays} days ahead.</li>
        <li>
          Weekly quota {durationLabel(rules.weeklyQuotaMinutes)} (Monday to Sunday): <strong>{durationLabel(quotaLeftMinutes)} left</strong> that week.
        </li>
        <li>Check in at the station from {durationLabel(rules.checkInMinutes)} before the start; after {durationLabel(rules.noShowGraceMinutes)} without check-in the time is freed and counts as a missed reservation.</li>
      </ul>

      {start ? (
        <p className="font-bold text-neutral-900">Start: {startLabel(start, timeZone)}</p>
      ) : (
        <p className="text-neutral-700">Choose a free start time in the week above.</p>
      )}

      <SelectField label="Length" value={minutes} onChange={(event) => setLength(Number(event.target.value))} disabled={!start}>
        {lengths.map((value) => (
          <option key={value} value={value}>
            {durationLabel(value)}
          </option>
        ))}
      </SelectField>

      {start && end && <p className="text-neutral-800">You are reserving {spanLabel(start, end, timeZone)}.</p>}

      <div>
        <Button type="submit" pending={pending} disabled={!start}>
          Reserve the {machine.name}
        </Button>
      </div>

      {outcome && (
        <Alert tone={outcome.tone} title={outcome.title}>
          <span data-refusal-code={outcome.code}>{outcome.text}</span>
        </Alert>
      )}
    </form>
  );
}
