import { loginSchema } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmailField } from '../../../components/ui/email-field';
import { TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useSignIn } from '../api/sign-in';

const messages = {
  invalid_credentials: "That e-mail and password don't match an account here. Check both and try again.",
  too_many_attempts: 'Too many tries in a short time. Wait a few minutes, then try again.',
};

/** On success the signed-in person's query is filled; the page decides where to go next. */
export function SignInForm() {
  const signIn = useSignIn();
  const {
    register,
    handleSubmit,
    setError,
    resetField,
    formState: { errors },
  } = useForm({ resolver: zodResolver(loginSchema), defaultValues: { email: '', password: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['email', 'password'], { messages });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await signIn.mutateAsync(values);
    } catch (error) {
      resetField('password');
      showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
      {formError && <Alert tone="error">{formError}</Alert>}
      <EmailField autoComplete="username" error={errors.email?.message} {...register('email')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={signIn.isPending} className="w-full">
        Sign in
      </Button>
    </form>
  );
}
