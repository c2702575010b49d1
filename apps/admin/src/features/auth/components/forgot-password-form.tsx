import { passwordResetRequestSchema } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmailField } from '../../../components/ui/email-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

const messages = {
  too_many_attempts: 'Too many requests in a short time. Wait a few minutes, then try again.',
};

export function ForgotPasswordForm() {
  const requestReset = useRequestPasswordReset();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(passwordResetRequestSchema), defaultValues: { email: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['email'], { messages });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await requestReset.mutateAsync(values);
    } catch (error) {
      showServerError(error);
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
      <EmailField
        hint="The address you sign in with. We send a link to set a new password."
        autoComplete="username"
        error={errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" pending={requestReset.isPending} className="w-full">
        Send the link
      </Button>
    </form>
  );
}
