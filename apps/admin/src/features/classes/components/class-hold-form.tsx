import { CLASS_MAX_WEEKS, type ClassDetail } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId, useRef, useState } from 'react';
import { useForm, useWatch, type DefaultValues } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { TextLink } from '../../../components/ui/text-link';
import { useFocusedNotice } from '../../../hooks/use-focused-notice';
import { ApiError, errorMessage } from '../../../lib/api-client';
import { durationLabel, spanLabel } from '../../../lib/shop-clock';
import type { ClassRequestBody } from '../api/create-class';
import {
  classHoldFormSchema,
  classLengths,
  classRequestBody,
  planClassHold,
  type ClassHoldFormInput,
  type ClassHoldValues,
} from '../utils/class-plan';

interface Choice {
  id: string;
  name: string;
}

interface ClassHoldFormProps {
  machines: readonly Choice[];
  trainings: readonly Choice[];
  timeZone: string;
  /** The shop's date today, 'YYYY-MM-DD': the earliest a first class can be. */
  today: string;
  onHold: (body: ClassRequestBody) => Promise<ClassDetail>;
  /** Where a class just held can be looked at: its own page. */
  classHref: (classId: string) => string;
}

type FieldName = keyof ClassHoldFormInput;

/** The server speaks of the request's instants; the form of a date, a start time and a length. */
const serverFields: Record<string, FieldName> = {
  machineId: 'machineId',
  trainingId: 'trainingId',
  title: 'title',
  start: 'date',
  end: 'lengthMinutes',
  weeks: 'weeks',
  capacity: 'capacity',
};

/** Headlines for the refusals a class hold can meet; the server's sentence follows with the date. */
const refusalTitles: Record<string, string> = {
  overlap: 'The machine is already taken then',
  outside_hours: 'The shop is not open then',
};

const emptyForm: DefaultValues<ClassHoldFormInput> = {
  machineId: '',
  trainingId: '',
  title: '',
  date: '',
  startTime: '',
  lengthMinutes: '120',
  weeks: '1',
  capacity: '',
};

interface Refusal {
  title: string;
  text: string;
  code: string | undefined;
}

/**
 * Holds a machine for a class, once or on the same weekday and time for several weeks. The
 * meetings it will hold are listed, on the shop's clock, before anything is sent; a refusal
 * (the machine taken, the shop closed) is shown under the form with what was typed kept.
 */
export function ClassHoldForm({ machines, trainings, timeZone, today, onHold, classHref }: ClassHoldFormProps) {
  const [refusal, setRefusal] = useState<Refusal | null>(null);
  const [held, setHeld, heldRef] = useFocusedNotice<ClassDetail | null>(null);
  const refusalRef = useRef<HTMLDivElement>(null);
  const previewId = useId();
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<ClassHoldFormInput, unknown, ClassHoldValues>({ resolver: zodResolver(classHoldFormSchema), defaultValues: emptyForm });
  const watched = useWatch({ control });

  useEffect(() => {
    if (refusal) refusalRef.current?.focus();
  }, [refusal]);

  const draft = classHoldFormSchema.safeParse({ ...emptyForm, ...watched });
  const preview = draft.success ? planClassHold(draft.data, timeZone, new Date()) : null;

  const onSubmit = handleSubmit(async (values) => {
    setRefusal(null);
    setHeld(null);
    const plan = planClassHold(values, timeZone, new Date());
    if (!plan.ok) {
      setError(plan.field, { type: 'plan', message: plan.message }, { shouldFocus: true });
      return;
    }
    const [first] = plan.occurrences;
    if (!first) return;
    try {
      setHeld(await onHold(classRequestBody(values, first)));
      reset(emptyForm);
    } catch (error) {
      if (!(error instanceof ApiError)) {
        setRefusal({ title: "Couldn't hold the machine", text: errorMessage(error), code: undefined });
        return;
      }
      const leftovers: string[] = [];
      let focus = true;
      for (const [field, messages] of Object.entries(error.fieldErrors)) {
        const name = serverFields[field];
        if (!name) {
          leftovers.push(...messages);
          continue;
        }
        setError(name, { type: 'server', message: messages.join(' ') }, { shouldFocus: focus });
        focus = false;
      }
      if (focus || leftovers.length > 0) {
        setRefusal({
          title: refusalTitles[error.code] ?? "Couldn't hold the machine",
          text: leftovers.length > 0 ? leftovers.join(' ') : (error.detail ?? error.title),
          code: error.code,
        });
      }
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Hold a machine for a class" className="flex flex-col gap-4">
      {held && (
        <Alert ref={heldRef} tabIndex={-1} tone="success" title="Machine held">
          {held.machineName} is held for {held.title}, {held.occurrences.length === 1 ? 'once' : `${held.occurrences.length} weeks`}.{' '}
          <TextLink to={classHref(held.id)}>Open the class to book members</TextLink>
        </Alert>
      )}
      <SelectField label="Machine" error={errors.machineId?.message} {...register('machineId')}>
        <option value="">Choose a machine</option>
        {machines.map((machine) => (
          <option key={machine.id} value={machine.id}>
            {machine.name}
          </option>
        ))}
      </SelectField>
      <SelectField label="Training (optional)" hint="The training the class teaches; members who need it are told when it runs." error={errors.trainingId?.message} {...register('trainingId')}>
        <option value="">No training</option>
        {trainings.map((training) => (
          <option key={training.id} value={training.id}>
            {training.name}
          </option>
        ))}
      </SelectField>
      <TextField label="Title" hint="Members see it in their reservations and on the wall board." autoComplete="off" maxLength={120} error={errors.title?.message} {...register('title')} />
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <TextField type="date" label="Date of the first class" min={today} error={errors.date?.message} {...register('date')} />
        <TextField type="time" label="Start time" hint={`The shop's clock (${timeZone}).`} step={60 * 15} error={errors.startTime?.message} {...register('startTime')} />
        <SelectField label="Length" error={errors.lengthMinutes?.message} {...register('lengthMinutes')}>
          {classLengths.map((minutes) => (
            <option key={minutes} value={String(minutes)}>
              {durationLabel(minutes)}
            </option>
          ))}
        </SelectField>
        <TextField
          type="number"
          inputMode="numeric"
          label="Repeat weekly for (weeks)"
          hint={`1 holds it once; up to ${CLASS_MAX_WEEKS}.`}
          min={1}
          max={CLASS_MAX_WEEKS}
          error={errors.weeks?.message}
          {...register('weeks')}
        />
        <TextField type="number" inputMode="numeric" label="Places (optional)" hint="Leave empty for no limit." min={1} error={errors.capacity?.message} {...register('capacity')} />
      </div>

      <section aria-labelledby={previewId} className="flex flex-col gap-2 rounded-md border border-neutral-300 bg-neutral-50 p-3">
        <h3 id={previewId} className="font-bold text-neutral-900">
          It will hold
        </h3>
        {!preview ? (
          <p className="text-neutral-700">Fill in the machine, title, date, start time and length to see the times it will hold.</p>
        ) : !preview.ok ? (
          <p className="text-neutral-800">{preview.message}</p>
        ) : (
          <ol aria-labelledby={previewId} className="flex flex-col gap-1 text-neutral-900">
            {preview.occurrences.map((occurrence) => (
              <li key={occurrence.start.getTime()}>{spanLabel(occurrence.start, occurrence.end, timeZone)}</li>
            ))}
          </ol>
        )}
      </section>

      <div>
        <Button type="submit" pending={isSubmitting}>
          Hold the machine
        </Button>
      </div>

      {refusal && (
        <Alert ref={refusalRef} tabIndex={-1} tone="error" title={refusal.title}>
          <span data-refusal-code={refusal.code}>{refusal.text}</span>
        </Alert>
      )}
    </form>
  );
}
