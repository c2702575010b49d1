import { passwordResetConfirmSchema } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { NewPasswordFields } from '../../../components/new-password-fields';
import { Alert } from '../../../components/ui/alert';
import { Button, ButtonLink } from '../../../components/ui/button';
import { TextLink } from '../../../components/ui/text-link';
import { paths } from '../../../config/paths';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { ApiError } from '../../../lib/api-client';
import { passwordPairSchema } from '../../../lib/password-confirmation';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';

const formSchema = passwordPairSchema(passwordResetConfirmSchema.shape.password);

export function ResetPasswordForm({ token }: { token: string }) {
  const confirmReset = useConfirmPasswordReset();
  const [linkExpired, setLinkExpired] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(formSchema), defaultValues: { password: '', confirmPassword: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['password']);

  const onSubmit = handleSubmit(async ({ password }) => {
    setFormError(null);
    try {
      await confirmReset.mutateAsync({ token, password });
    } catch (error) {
      if (error instanceof ApiError && error.code === 'invalid_token') {
        setLinkExpired(true);
        return;
      }
      showServerError(error);
    }
  });

  if (confirmReset.isSuccess) {
    return (
      <Alert tone="success" title="Your new password is set" action={<ButtonLink to={paths.signIn.getHref()} variant="primary">Sign in</ButtonLink>}>
        Sign in with your e-mail and the new password.
      </Alert>
    );
  }

  if (linkExpired) {
    return (
      <Alert tone="error" title="This link no longer works">
        It has expired or was already used. <TextLink to={paths.forgotPassword.getHref()}>Ask for a new link</TextLink>.
      </Alert>
    );
  }

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
      {formError && <Alert tone="error">{formError}</Alert>}
      <NewPasswordFields
        password={register('password')}
        confirm={register('confirmPassword')}
        passwordError={errors.password?.message}
        confirmError={errors.confirmPassword?.message}
      />
      <Button type="submit" pending={confirmReset.isPending} className="w-full">
        Set new password
      </Button>
    </form>
  );
}
