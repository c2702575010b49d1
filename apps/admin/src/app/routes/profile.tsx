import { PageHeading } from '../../components/ui/page-heading';
import { useRefreshMe } from '../../features/auth/hooks/use-refresh-me';
import { PasswordForm } from '../../features/profile/components/password-form';
import { ProfileForm } from '../../features/profile/components/profile-form';

export default function ProfileRoute() {
  const refreshMe = useRefreshMe();
  return (
    <>
      <PageHeading title="Profile" description="How the shop knows you, and how you sign in." />
      <div className="grid max-w-5xl grid-cols-1 items-start gap-6 lg:grid-cols-2">
        <ProfileForm onSaved={() => void refreshMe()} />
        <PasswordForm />
      </div>
    </>
  );
}
