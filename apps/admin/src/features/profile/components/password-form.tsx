import { passwordChangeSchema } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { NewPasswordFields } from '../../../components/new-password-fields';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Panel } from '../../../components/ui/panel';
import { TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { confirmPasswordSchema, passwordsDifferMessage } from '../../../lib/password-confirmation';
import { useChangePassword } from '../api/change-password';

const formSchema = passwordChangeSchema
  .extend({ confirmNewPassword: confirmPasswordSchema })
  .refine((values) => values.newPassword === values.confirmNewPassword, {
    path: ['confirmNewPassword'],
    error: passwordsDifferMessage,
  });

const emptyForm = { currentPassword: '', newPassword: '', confirmNewPassword: '' };

const errorOptions = {
  codeFields: { wrong_password: 'currentPassword' as const },
  messages: { wrong_password: 'That is not your current password.' },
};

export function PasswordForm() {
  const changePassword = useChangePassword();
  const [changed, setChanged] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(formSchema), defaultValues: emptyForm });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['currentPassword', 'newPassword'], errorOptions);

  const onSubmit = handleSubmit(async ({ currentPassword, newPassword }) => {
    setFormError(null);
    setChanged(false);
    try {
      await changePassword.mutateAsync({ currentPassword, newPassword });
      reset(emptyForm);
      setChanged(true);
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <Panel title="Password">
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        {formError && <Alert tone="error">{formError}</Alert>}
        {changed && <Alert tone="success">Your password is changed. Use the new one next time you sign in.</Alert>}
        <TextField
          label="Current password"
          type="password"
          autoComplete="current-password"
          error={errors.currentPassword?.message}
          {...register('currentPassword')}
        />
        <NewPasswordFields
          password={register('newPassword')}
          confirm={register('confirmNewPassword')}
          passwordError={errors.newPassword?.message}
          confirmError={errors.confirmNewPassword?.message}
        />
        <div>
          <Button type="submit" pending={changePassword.isPending}>
            Change password
          </Button>
        </div>
      </form>
    </Panel>
  );
}
