import { hashPassword } from '@chuckkey/db';
import type { Invitation, InvitationAccept, InvitationCreate, InvitationPreview } from '@chuckkey/core';
import { AppError, conflict, notFound, pgCode, UNIQUE_VIOLATION } from '../../lib/errors';
import type { Deps } from '../../lib/deps';
import { hashToken, randomToken } from '../../lib/tokens';
import { membersRepository, toUser } from '../members/members.repository';
import { shopRepository } from '../shop/shop.repository';
import { invitationsRepository, type InvitationRecord } from './invitations.repository';

const INVITATION_DAYS = 7;

function toInvitation(row: InvitationRecord): Invitation {
  return {
    id: row.id,
    email: row.email,
    firstName: row.firstName,
    lastName: row.lastName,
    role: row.role,
    invitedBy: row.invitedBy,
    expiresAt: row.expiresAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
  };
}

const notOpen = () => notFound('invitation_not_found', 'This invitation has expired, was already used or was replaced by a newer one. Ask an admin to invite you again.');

export function invitationsService({ db, config, mailer, logger }: Deps) {
  const invitations = invitationsRepository(db);
  const members = membersRepository(db);
  const shop = shopRepository(db);

  return {
    async listOpen(): Promise<Invitation[]> {
      return (await invitations.listOpen()).map(toInvitation);
    },

    async invite(actor: Express.User, input: InvitationCreate): Promise<Invitation> {
      if (await members.findByEmail(input.email)) {
        throw conflict('already_member', 'Someone with that e-mail address is already a member.', { email: ['Already a member.'] });
      }
      const token = randomToken();
      const created = await invitations.create({
        ...input,
        invitedBy: actor.id,
        tokenHash: hashToken(token),
        expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
      });
      const { name: shopName } = await shop.get();
      try {
        await mailer.send({
          to: input.email,
          subject: `You're invited to ${shopName} on Chuckkey`,
          text: [
            `Hello ${input.firstName},`,
            '',
            `${actor.name} invited you to ${shopName}. Chuckkey is how the shop keeps track of training sign-offs, machine time and the tool crib.`,
            `Open this link within ${INVITATION_DAYS} days to choose your password:`,
            '',
            `${config.publicUrl}/accept-invitation?token=${token}`,
            '',
            'Signing up does not replace the in-person safety training: an instructor signs you off on each machine.',
          ].join('\n'),
        });
      } catch (err) {
        logger.error({ err }, 'invitation mail could not be sent');
        await invitations.revoke(created.id);
        throw new AppError(502, 'mail_unavailable', 'The invitation could not be e-mailed, so it was not kept. Check the mail settings and try again.');
      }
      return toInvitation(created);
    },

    async preview(token: string): Promise<InvitationPreview> {
      const invitation = await invitations.findOpenByTokenHash(hashToken(token));
      if (!invitation) throw notOpen();
      const { name: shopName } = await shop.get();
      return { email: invitation.email, firstName: invitation.firstName, lastName: invitation.lastName, shopName };
    },

    /** Creates the member from the invitation; both happen or neither does. */
    async accept({ token, password }: InvitationAccept): Promise<Express.User> {
      const invitation = await invitations.findOpenByTokenHash(hashToken(token));
      if (!invitation) throw notOpen();
      const passwordHash = await hashPassword(password);
      try {
        const member = await db.transaction(async (trx) => {
          if (!(await invitations.markAccepted(trx, invitation.id))) throw notOpen();
          return membersRepository(trx).insert({ ...invitation, passwordHash });
        });
        return toUser(member);
      } catch (error) {
        if (pgCode(error) === UNIQUE_VIOLATION) {
          throw conflict('already_member', 'An account with this e-mail address already exists. Sign in or reset your password.');
        }
        throw error;
      }
    },
  };
}
