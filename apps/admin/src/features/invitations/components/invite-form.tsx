import { invitationCreateSchema, roleLabels, roles, type InvitationCreate, type InvitationCreateInput } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmailField } from '../../../components/ui/email-field';
import { Panel } from '../../../components/ui/panel';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useCreateInvitation } from '../api/create-invitation';

const emptyForm: InvitationCreateInput = { firstName: '', lastName: '', email: '', role: 'member' };

const errorOptions = {
  codeFields: { already_member: 'email' as const },
  messages: { already_member: 'Someone with this e-mail address is already a member.' },
};

export function InviteForm() {
  const createInvitation = useCreateInvitation();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<InvitationCreateInput, unknown, InvitationCreate>({
    resolver: zodResolver(invitationCreateSchema),
    defaultValues: emptyForm,
  });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['firstName', 'lastName', 'email', 'role'], errorOptions);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSentTo(null);
    try {
      const invitation = await createInvitation.mutateAsync(values);
      reset(emptyForm);
      setSentTo(invitation.email);
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <Panel
      title="Invite someone"
      description="They get an e-mail with a link to choose a password and join the shop."
    >
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        {formError && <Alert tone="error">{formError}</Alert>}
        {sentTo && (
          <Alert tone="success" title="Invitation sent">
            We sent it to {sentTo}. It stays under Open invitations until they accept it.
          </Alert>
        )}
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          <TextField label="First name" autoComplete="off" error={errors.firstName?.message} {...register('firstName')} />
          <TextField label="Last name" autoComplete="off" error={errors.lastName?.message} {...register('lastName')} />
        </div>
        <EmailField autoComplete="off" error={errors.email?.message} {...register('email')} />
        <SelectField label="Role" error={errors.role?.message} {...register('role')}>
          {roles.map((role) => (
            <option key={role} value={role}>
              {roleLabels[role]}
            </option>
          ))}
        </SelectField>
        <div>
          <Button type="submit" pending={createInvitation.isPending}>
            Send invitation
          </Button>
        </div>
      </form>
    </Panel>
  );
}
