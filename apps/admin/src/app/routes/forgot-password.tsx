import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';

export default function ForgotPasswordRoute() {
  return (
    <>
      <title>Forgot password · Chuckkey</title>
      <div className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold text-neutral-900">Forgot your password?</h1>
        <p className="text-neutral-800">Give your e-mail address and we send you a link to choose a new one.</p>
      </div>
      <ForgotPasswordForm />
      <p>
        <TextLink to={paths.signIn.getHref()}>Back to sign in</TextLink>
      </p>
    </>
  );
}
