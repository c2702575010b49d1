import { hashPassword, verifyPassword } from '@chuckkey/db';
import type { PasswordChange, Profile, ProfileUpdate } from '@chuckkey/core';
import { badRequest, conflict, pgCode, unauthenticated, UNIQUE_VIOLATION } from '../../lib/errors';
import type { Deps } from '../../lib/deps';
import { membersRepository, toUser as toProfile, type MemberRecord } from '../members/members.repository';

export function profileService({ db }: Deps) {
  const members = membersRepository(db);

  async function load(id: string): Promise<MemberRecord> {
    const member = await members.findById(id);
    if (!member?.active) throw unauthenticated();
    return member;
  }

  return {
    async get(id: string): Promise<Profile> {
      return toProfile(await load(id));
    },

    async update(id: string, changes: ProfileUpdate): Promise<Profile> {
      try {
        const updated = await members.update(id, changes);
        if (!updated) throw unauthenticated();
        return toProfile(updated);
      } catch (error) {
        if (pgCode(error) === UNIQUE_VIOLATION) {
          throw conflict('email_taken', 'Another account uses that e-mail address.', { email: ['Another account uses that e-mail address.'] });
        }
        throw error;
      }
    },

    /** Changes the password and signs the person out of every other browser. */
    async changePassword(id: string, currentSid: string, { currentPassword, newPassword }: PasswordChange): Promise<void> {
      const member = await load(id);
      if (!member.passwordHash || !(await verifyPassword(member.passwordHash, currentPassword))) {
        throw badRequest('wrong_password', 'Your current password is not right.', { currentPassword: ['This is not your current password.'] });
      }
      await members.update(id, { passwordHash: await hashPassword(newPassword) });
      await members.endWebSessions(id, currentSid);
    },
  };
}
