import { roleLabels, type Member, type Role } from '@chuckkey/core';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { errorMessage } from '../../../lib/api-client';
import { useUpdateMember } from '../api/update-member';

export type MemberChange = { member: Member; role: Role } | { member: Member; active: boolean };

const messages = {
  cannot_change_self: "You can't demote or deactivate yourself. Ask another admin to do it.",
};

const roleNotes: Record<Role, string> = {
  member: 'Members see the shop floor and their own profile.',
  instructor: 'Instructors see what members see.',
  admin: 'Admins can also manage people, invitations and the outbox.',
};

function describe(change: MemberChange) {
  const { member } = change;
  if ('role' in change) {
    return {
      title: `Change the role of ${member.name}?`,
      body: `From ${roleLabels[member.role]} to ${roleLabels[change.role]}. ${roleNotes[change.role]}`,
      confirmLabel: `Make ${roleLabels[change.role].toLowerCase()}`,
      variant: 'primary' as const,
    };
  }
  if (!change.active) {
    return {
      title: `Deactivate ${member.name}?`,
      body: 'Their membership becomes inactive, and no machine clears them until an admin reactivates them. Their record stays.',
      confirmLabel: 'Deactivate',
      variant: 'danger' as const,
    };
  }
  return {
    title: `Reactivate ${member.name}?`,
    body: 'Their membership becomes active again. Their trainings and sign-offs decide what they may use.',
    confirmLabel: 'Reactivate',
    variant: 'primary' as const,
  };
}

interface MemberChangeDialogProps {
  change: MemberChange | null;
  onClose: () => void;
}

export function MemberChangeDialog({ change, onClose }: MemberChangeDialogProps) {
  const update = useUpdateMember();
  const text = change ? describe(change) : null;

  function close() {
    update.reset();
    onClose();
  }

  function confirm() {
    if (!change) return;
    const changes = 'role' in change ? { role: change.role } : { active: change.active };
    update.mutate({ id: change.member.id, changes }, { onSuccess: close });
  }

  return (
    <ConfirmDialog
      open={change !== null}
      title={text?.title ?? ''}
      confirmLabel={text?.confirmLabel ?? ''}
      confirmVariant={text?.variant}
      pending={update.isPending}
      error={update.isError ? errorMessage(update.error, messages) : null}
      onConfirm={confirm}
      onCancel={close}
    >
      {text?.body}
    </ConfirmDialog>
  );
}
