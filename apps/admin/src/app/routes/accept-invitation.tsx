import { tokenSchema } from '@chuckkey/core';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '../../config/paths';
import { useSetSignedInUser } from '../../features/auth/hooks/use-set-signed-in-user';
import { AcceptInvitation, InvitationUnusable } from '../../features/invitations/components/accept-invitation';

export default function AcceptInvitationRoute() {
  const [searchParams] = useSearchParams();
  const token = tokenSchema.safeParse(searchParams.get('token') ?? undefined);
  const setSignedInUser = useSetSignedInUser();
  const navigate = useNavigate();

  if (!token.success) {
    return (
      <>
        <title>Your invitation · Chuckkey</title>
        <h1 className="text-2xl font-bold text-neutral-900">Your invitation</h1>
        <InvitationUnusable />
      </>
    );
  }

  return (
    <AcceptInvitation
      token={token.data}
      onAccepted={(user) => {
        setSignedInUser(user);
        navigate(paths.home.getHref(), { replace: true });
      }}
    />
  );
}
