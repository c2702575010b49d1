import { fullName, invitationAcceptSchema, type InvitationPreview, type User } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { NewPasswordFields } from '../../../components/new-password-fields';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { ApiError } from '../../../lib/api-client';
import { passwordPairSchema } from '../../../lib/password-confirmation';
import { useAcceptInvitation } from '../api/accept-invitation';
import { useInvitationPreview } from '../api/get-invitation-preview';

const formSchema = passwordPairSchema(invitationAcceptSchema.shape.password);

export function InvitationUnusable() {
  return (
    <Alert tone="error" title="This invitation no longer works">
      It has expired, was already used, or the link got cut short. Ask the admin who invited you to send a new
      one.
    </Alert>
  );
}

interface AcceptFormProps {
  token: string;
  preview: InvitationPreview;
  onAccepted: (user: User) => void;
}

function AcceptForm({ token, preview, onAccepted }: AcceptFormProps) {
  const accept = useAcceptInvitation();
  const [unusable, setUnusable] = useState(false);
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
      onAccepted(await accept.mutateAsync({ token, password }));
    } catch (error) {
      if (error instanceof ApiError && (error.code === 'invitation_not_found' || error.code === 'invalid_token')) {
        setUnusable(true);
        return;
      }
      showServerError(error);
    }
  });

  if (unusable) return <InvitationUnusable />;

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
      {formError && <Alert tone="error">{formError}</Alert>}
      <input type="email" name="username" autoComplete="username" value={preview.email} readOnly hidden />
      <dl>
        <dt className="font-bold text-neutral-900">Your e-mail</dt>
        <dd className="break-all text-neutral-800">{preview.email}</dd>
      </dl>
      <NewPasswordFields
        first
        password={register('password')}
        confirm={register('confirmPassword')}
        passwordError={errors.password?.message}
        confirmError={errors.confirmPassword?.message}
      />
      <Button type="submit" pending={accept.isPending} className="w-full">
        Join the shop
      </Button>
    </form>
  );
}

interface AcceptInvitationProps {
  token: string;
  onAccepted: (user: User) => void;
}

export function AcceptInvitation({ token, onAccepted }: AcceptInvitationProps) {
  const preview = useInvitationPreview(token);

  if (!preview.data) {
    return (
      <div className="flex flex-col gap-5">
        <title>Your invitation · Chuckkey</title>
        <h1 className="text-2xl font-bold text-neutral-900">Your invitation</h1>
        {preview.isPending ? (
          <Spinner label="Opening your invitation…" />
        ) : preview.error instanceof ApiError && preview.error.status === 404 ? (
          <InvitationUnusable />
        ) : (
          <QueryError error={preview.error} what="your invitation" onRetry={() => void preview.refetch()} retrying={preview.isFetching} />
        )}
      </div>
    );
  }

  const { firstName, lastName, shopName } = preview.data;
  return (
    <div className="flex flex-col gap-5">
      <title>{`Join ${shopName} · Chuckkey`}</title>
      <div className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold text-neutral-900">Welcome, {fullName(firstName, lastName)}</h1>
        <p className="text-neutral-800">
          You are invited to join <strong>{shopName}</strong>. Choose a password to finish, and you are signed in.
        </p>
      </div>
      <AcceptForm token={token} preview={preview.data} onAccepted={onAccepted} />
    </div>
  );
}
