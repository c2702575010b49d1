import { passwordResetRequestSchema } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

const messages = {
  too_many_attempts: 'Too many requests in a short time. Wait a few minutes, then try again.',
};

export function ForgotPasswordForm() {
  const requestReset = useRequestPasswordReset();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(passwordResetRequestSchema), defaultValues: { email: '' } });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await requestReset.mutateAsync(values);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email'], { messages }));
    }
  });

  if (requestReset.isSuccess) {
    return (
      <Alert tone="success" title="If that address has an account, we sent a link">
        Open the link in that e-mail to choose a new password. Nothing arrived after a few minutes? Look in the
        spam folder, or ask for another link.
      </Alert>
    );
  }

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextField
        label="E-mail"
        hint="The address you sign in with. We send a link to set a new password."
        type="email"
        autoComplete="username"
        inputMode="email"
        autoCapitalize="none"
        spellCheck={false}
        error={errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" pending={requestReset.isPending} className="w-full">
        Send the link
      </Button>
    </form>
  );
}
