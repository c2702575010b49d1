import { profileUpdateSchema, roleLabels, type Profile } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { EmailField } from '../../../components/ui/email-field';
import { TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useProfile } from '../api/get-profile';
import { useUpdateProfile } from '../api/update-profile';

const errorOptions = {
  codeFields: { email_taken: 'email' as const },
  messages: { email_taken: 'Another account already uses this e-mail address.' },
};

interface ProfileFormProps {
  /** Lets the page refresh whatever else shows the person's name and e-mail. */
  onSaved?: (profile: Profile) => void;
}

function ProfileFields({ profile, onSaved }: ProfileFormProps & { profile: Profile }) {
  const update = useUpdateProfile();
  const [saved, setSaved] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isDirty },
  } = useForm({
    resolver: zodResolver(profileUpdateSchema),
    defaultValues: { firstName: profile.firstName, lastName: profile.lastName, email: profile.email },
  });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['firstName', 'lastName', 'email'], errorOptions);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSaved(false);
    try {
      const next = await update.mutateAsync(values);
      reset({ firstName: next.firstName, lastName: next.lastName, email: next.email });
      setSaved(true);
      onSaved?.(next);
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {formError && <Alert tone="error">{formError}</Alert>}
      {saved && !isDirty && <Alert tone="success">Your profile is saved.</Alert>}
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <TextField label="First name" autoComplete="given-name" error={errors.firstName?.message} {...register('firstName')} />
        <TextField label="Last name" autoComplete="family-name" error={errors.lastName?.message} {...register('lastName')} />
      </div>
      <EmailField
        hint="You sign in with it, and the shop's mail goes to it."
        autoComplete="email"
        error={errors.email?.message}
        {...register('email')}
      />
      <dl className="flex gap-2">
        <dt className="font-bold text-neutral-900">Role:</dt>
        <dd className="text-neutral-800">{roleLabels[profile.role]}. An admin changes roles.</dd>
      </dl>
      <div>
        <Button type="submit" pending={update.isPending}>
          Save profile
        </Button>
      </div>
    </form>
  );
}

export function ProfileForm({ onSaved }: ProfileFormProps) {
  const profile = useProfile();
  return (
    <Panel title="Name and e-mail">
      {profile.isPending ? (
        <Spinner label="Loading your profile…" />
      ) : profile.isError ? (
        <QueryError error={profile.error} what="your profile" onRetry={() => void profile.refetch()} retrying={profile.isFetching} />
      ) : (
        <ProfileFields profile={profile.data} onSaved={onSaved} />
      )}
    </Panel>
  );
}
