import { tokenSchema } from '@chuckkey/core';
import { useSearchParams } from 'react-router-dom';
import { Alert } from '../../components/ui/alert';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { ResetPasswordForm } from '../../features/auth/components/reset-password-form';

export default function ResetPasswordRoute() {
  const [searchParams] = useSearchParams();
  const token = tokenSchema.safeParse(searchParams.get('token') ?? undefined);

  return (
    <>
      <title>Choose a new password · Chuckkey</title>
      <h1 className="text-2xl font-bold text-neutral-900">Choose a new password</h1>
      {token.success ? (
        <ResetPasswordForm token={token.data} />
      ) : (
        <Alert tone="error" title="This link is not complete">
          Open the link from the e-mail again, in full, or{' '}
          <TextLink to={paths.forgotPassword.getHref()}>ask for a new link</TextLink>.
        </Alert>
      )}
      <p>
        <TextLink to={paths.signIn.getHref()}>Back to sign in</TextLink>
      </p>
    </>
  );
}
