import { Navigate, useSearchParams } from 'react-router-dom';
import { TextLink } from '../../components/ui/text-link';
import { paths, safeNextPath } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { SignInForm } from '../../features/auth/components/sign-in-form';

export default function SignInRoute() {
  const [searchParams] = useSearchParams();
  const next = safeNextPath(searchParams.get('next'));
  const me = useMe();

  // Signing in fills the signed-in person's query, and this redirect takes them on from here.
  if (me.data) return <Navigate to={next} replace />;

  return (
    <>
      <title>Sign in · Chuckkey</title>
      <div className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold text-neutral-900">Sign in</h1>
        <p className="text-neutral-800">With the e-mail address the shop has for you.</p>
      </div>
      <SignInForm />
      <p>
        <TextLink to={paths.forgotPassword.getHref()}>Forgot your password?</TextLink>
      </p>
    </>
  );
}
