import { closureInputSchema, type ClosureInput, type ShopClosure } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { useFocusedNotice } from '../../../hooks/use-focused-notice';
import { useServerErrors } from '../../../hooks/use-server-errors';

type FormInput = z.input<typeof closureInputSchema>;

const fields = ['startsOn', 'endsOn', 'reason'] as const;

const TOUCH = 'min-h-12!';

interface ClosureFormProps {
  /** The shop's date today, 'YYYY-MM-DD': the earliest a closure can end. */
  today: string;
  onAdd: (input: ClosureInput) => Promise<ShopClosure>;
}

export function ClosureForm({ today, onAdd }: ClosureFormProps) {
  const [added, setAdded, addedRef] = useFocusedNotice<ShopClosure | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<FormInput, unknown, ClosureInput>({
    resolver: zodResolver(closureInputSchema),
    defaultValues: { startsOn: '', endsOn: '', reason: '' },
  });
  const { formError, setFormError, showServerError } = useServerErrors(setError, fields);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setAdded(null);
    try {
      setAdded(await onAdd(values));
      reset({ startsOn: '', endsOn: '', reason: '' });
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Add a closure" className="flex flex-col gap-4">
      {formError && <Alert tone="error">{formError}</Alert>}
      {added && (
        <Alert ref={addedRef} tabIndex={-1} tone="success">
          Closure added: {added.reason}.
        </Alert>
      )}
      <p className="text-neutral-700">Both days are included: the shop opens again, by its weekly hours, the day after the last.</p>
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <TextField type="date" label="First day" min={today} className={TOUCH} error={errors.startsOn?.message} {...register('startsOn')} />
        <TextField type="date" label="Last day" min={today} className={TOUCH} error={errors.endsOn?.message} {...register('endsOn')} />
      </div>
      <TextField
        label="Reason"
        hint="Members see it at the station, for example “Winter deep clean”."
        autoComplete="off"
        maxLength={200}
        className={TOUCH}
        error={errors.reason?.message}
        {...register('reason')}
      />
      <div>
        <Button type="submit" pending={isSubmitting} className={TOUCH}>
          Add closure
        </Button>
      </div>
    </form>
  );
}
