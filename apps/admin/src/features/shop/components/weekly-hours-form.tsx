import { weekdayNames, weekdays, weeklyHoursInputSchema, type ShopHours, type Weekday, type WeeklyHoursInput } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId, useRef, type ComponentProps } from 'react';
import { useFieldArray, useForm, type FieldErrors } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { controlClasses, describedBy, FieldError, useFieldIds } from '../../../components/ui/field';
import { PlusIcon, TrashIcon } from '../../../components/ui/icons';
import { useFocusedNotice } from '../../../hooks/use-focused-notice';
import { useServerErrors } from '../../../hooks/use-server-errors';

type FormInput = z.input<typeof weeklyHoursInputSchema>;
type Interval = FormInput['weekly'][number];

/** On a phone in the shop, every control here is at least 48 px tall. */
const TOUCH = 'min-h-12!';

interface WeeklyHoursFormProps {
  /** The schedule as saved, in weekday order. */
  weekly: ShopHours['weekly'];
  /** Saves the schedule and answers it as the server kept it. */
  onSave: (input: WeeklyHoursInput) => Promise<ShopHours['weekly']>;
}

function ClockField({
  label,
  context,
  error,
  ...input
}: { label: string; context: string; error: string | undefined } & ComponentProps<'input'>) {
  const ids = useFieldIds();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={ids.control} className="font-bold text-neutral-900">
        {label}{' '}
        <span className="sr-only">on {context}</span>
      </label>
      <input
        id={ids.control}
        type="text"
        autoComplete="off"
        spellCheck={false}
        maxLength={5}
        className={`${controlClasses} ${TOUCH} w-full sm:w-28`}
        {...describedBy(ids, null, error)}
        {...input}
      />
      {error && <FieldError id={ids.error}>{error}</FieldError>}
    </div>
  );
}

const intervalError = (errors: FieldErrors<FormInput>, index: number, field: keyof Interval) => errors.weekly?.[index]?.[field]?.message;

/**
 * The week as seven days, Monday first, each closed or open for one or more stretches. The
 * form's values are the request body itself, so the schema's messages and the server's field
 * errors ("weekly.3.opensAt") land under the very field they are about.
 */
export function WeeklyHoursForm({ weekly, onSave }: WeeklyHoursFormProps) {
  const baseId = useId();
  const [saved, setSaved, savedRef] = useFocusedNotice(false);
  const pendingFocus = useRef<string | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<FormInput, unknown, WeeklyHoursInput>({
    resolver: zodResolver(weeklyHoursInputSchema),
    defaultValues: { weekly },
  });
  const { fields, append, remove } = useFieldArray({ control, name: 'weekly' });
  const serverFields = fields.flatMap((_, index) => [`weekly.${index}.opensAt`, `weekly.${index}.closesAt`] as const);
  const { formError, setFormError, showServerError } = useServerErrors(setError, serverFields);

  const addButtonId = (weekday: Weekday) => `${baseId}-add-${weekday}`;

  useEffect(() => {
    if (!pendingFocus.current) return;
    document.getElementById(pendingFocus.current)?.focus();
    pendingFocus.current = null;
  });

  const noHoursAtAll = fields.length === 0;

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSaved(false);
    try {
      // The form starts again from what the server kept, in its order, so positions match its errors.
      reset({ weekly: await onSave(values) });
      setSaved(true);
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Weekly opening hours" className="flex flex-col gap-5">
      {formError && <Alert tone="error">{formError}</Alert>}
      {saved && (
        <Alert ref={savedRef} tabIndex={-1} tone="success">
          Opening hours saved.
        </Alert>
      )}
      <p className="text-neutral-700">
        Use the 24-hour clock, like 09:00 or 16:30; 24:00 is midnight at the end of the day. A day with no opening times is closed.
      </p>
      {errors.weekly?.message && <Alert tone="error">{errors.weekly.message}</Alert>}
      <ul className="flex flex-col gap-4">
        {weekdays.map((weekday) => {
          const day = weekdayNames[weekday];
          const ofDay = fields.map((field, index) => ({ field, index })).filter(({ field }) => field.weekday === weekday);
          return (
            <li key={weekday}>
              <fieldset className="flex min-w-0 flex-col gap-3 rounded-md border border-neutral-300 bg-neutral-50 p-3">
                <legend className="px-1 text-lg font-bold text-neutral-900">{day}</legend>
                {ofDay.length === 0 && <p className="text-neutral-800">{noHoursAtAll ? 'No hours set' : 'Closed'}</p>}
                {ofDay.map(({ field, index }, position) => {
                  const context = `${day}, opening ${position + 1}`;
                  return (
                    <div key={field.id} className="flex flex-col gap-3 sm:flex-row sm:items-start">
                      <ClockField label="Opens" context={context} error={intervalError(errors, index, 'opensAt')} {...register(`weekly.${index}.opensAt`)} />
                      <ClockField label="Closes" context={context} error={intervalError(errors, index, 'closesAt')} {...register(`weekly.${index}.closesAt`)} />
                      <Button
                        variant="secondary"
                        className={`${TOUCH} sm:mt-7`}
                        onClick={() => {
                          pendingFocus.current = addButtonId(weekday);
                          remove(index);
                        }}
                      >
                        <TrashIcon />
                        <span>
                          Remove{' '}
                          <span className="sr-only">{context}</span>
                        </span>
                      </Button>
                    </div>
                  );
                })}
                <div>
                  <Button
                    id={addButtonId(weekday)}
                    variant="secondary"
                    className={TOUCH}
                    onClick={() => append({ weekday, opensAt: '', closesAt: '' }, { focusName: `weekly.${fields.length}.opensAt` })}
                  >
                    <PlusIcon />
                    <span>
                      {ofDay.length === 0 ? 'Add opening times' : 'Add another opening'}{' '}
                      <span className="sr-only">on {day}</span>
                    </span>
                  </Button>
                </div>
              </fieldset>
            </li>
          );
        })}
      </ul>
      <div>
        <Button type="submit" pending={isSubmitting} className={TOUCH}>
          Save opening hours
        </Button>
      </div>
    </form>
  );
}
