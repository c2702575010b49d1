import { pinSchema } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Panel } from '../../../components/ui/panel';
import { TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useSetPin } from '../api/set-pin';

// The second copy exists only in the browser, to catch a slip of the thumb.
const formSchema = pinSchema
  .extend({ confirmPin: z.string({ error: 'Type the PIN again.' }).min(1, { error: 'Type the PIN again.' }) })
  .refine((values) => values.pin === values.confirmPin, { path: ['confirmPin'], error: 'The two PINs are not the same. Type them again.' });

const emptyForm = { pin: '', confirmPin: '' };

export function PinForm() {
  const setPin = useSetPin();
  const [saved, setSaved] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(formSchema), defaultValues: emptyForm });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['pin']);

  const onSubmit = handleSubmit(async ({ pin }) => {
    setFormError(null);
    setSaved(false);
    try {
      await setPin.mutateAsync({ pin });
      reset(emptyForm);
      setSaved(true);
    } catch (error) {
      showServerError(error);
    }
  });

  const digits = { type: 'password', inputMode: 'numeric', pattern: '[0-9]*', maxLength: 6, autoComplete: 'off' } as const;
  return (
    <Panel
      title="My PIN"
      description="Stations ask for it on machines that need more than a badge, and instructors confirm sign-offs at a station with it."
    >
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        {formError && <Alert tone="error">{formError}</Alert>}
        {saved && <Alert tone="success">Your PIN is saved. Use it from your next scan at a station.</Alert>}
        <div className="flex flex-col gap-4">
          <TextField
            label="New PIN"
            hint="4 to 6 digits. Not your birthday, not 1234."
            error={errors.pin?.message}
            className="max-w-48 tracking-[0.3em]"
            {...digits}
            {...register('pin')}
          />
          <TextField
            label="Type the PIN again"
            error={errors.confirmPin?.message}
            className="max-w-48 tracking-[0.3em]"
            {...digits}
            {...register('confirmPin')}
          />
        </div>
        <div>
          <Button type="submit" pending={setPin.isPending}>
            Save PIN
          </Button>
        </div>
      </form>
    </Panel>
  );
}
