import { hashPassword, verifyPassword } from '@chuckkey/db';
import type { LoginInput } from '@chuckkey/core';
import { AppError, badRequest } from '../../lib/errors';
import type { Deps } from '../../lib/deps';
import { hashToken, randomToken } from '../../lib/tokens';
import { membersRepository, toUser } from '../members/members.repository';
import { authRepository } from './auth.repository';

const RESET_TOKEN_HOURS = 1;

// Verifying against a real hash when the account does not exist keeps the answer's timing
// the same, so the time taken does not tell which e-mail addresses have accounts.
const decoyHash = hashPassword('decoy-password-never-used');

export function authService({ db, config, mailer, logger }: Deps) {
  const members = membersRepository(db);
  const auth = authRepository(db);

  return {
    /** The account and address throttles (OWASP ASVS 2.2.1), shared by all server processes. */
    async assertNotThrottled(email: string, ip: string): Promise<void> {
      const failures = await auth.recentFailures(email, ip, config.SIGN_IN_WINDOW_MINUTES);
      if (failures.account >= config.SIGN_IN_MAX_FAILURES_PER_ACCOUNT || failures.address >= config.SIGN_IN_MAX_FAILURES_PER_ADDRESS) {
        throw new AppError(429, 'too_many_attempts', `Too many failed sign-ins. Wait ${config.SIGN_IN_WINDOW_MINUTES} minutes, or reset your password.`, {
          headers: { 'Retry-After': String(config.SIGN_IN_WINDOW_MINUTES * 60) },
        });
      }
    },

    /** The person for these credentials, or null; records the attempt either way. */
    async verifyCredentials({ email, password }: LoginInput, ip: string): Promise<Express.User | null> {
      const member = await members.findByEmail(email);
      const usable = member?.active && member.passwordHash ? member.passwordHash : null;
      const ok = await verifyPassword(usable ?? (await decoyHash), password);
      const succeeded = Boolean(usable && ok);
      await auth.recordSignIn({ email, ip, succeeded });
      return succeeded && member ? toUser(member) : null;
    },

    async findActiveUser(id: string): Promise<Express.User | null> {
      const member = await members.findById(id);
      return member?.active ? toUser(member) : null;
    },

    /** Sends a reset link to an active account; says nothing about whether one exists. */
    async requestPasswordReset(email: string): Promise<void> {
      const member = await members.findByEmail(email);
      if (!member?.active) return;
      const token = randomToken();
      await auth.createResetToken(member.id, hashToken(token), new Date(Date.now() + RESET_TOKEN_HOURS * 3_600_000));
      const link = `${config.publicUrl}/reset-password?token=${token}`;
      try {
        await mailer.send({
          to: member.email,
          subject: 'Reset your Chuckkey password',
          text: [
            `Hello ${member.firstName},`,
            '',
            'Someone (we hope you) asked to reset the password of your Chuckkey account.',
            `Open this link within ${RESET_TOKEN_HOURS} hour to choose a new password:`,
            '',
            link,
            '',
            'If you did not ask for this, ignore this message: your password stays as it is.',
          ].join('\n'),
        });
      } catch (err) {
        logger.error({ err }, 'password reset mail could not be sent');
      }
    },

    async resetPassword(token: string, password: string): Promise<void> {
      const memberId = await auth.consumeResetToken(hashToken(token));
      if (!memberId) {
        throw badRequest('invalid_token', 'This reset link has expired or was already used. Ask for a new one.');
      }
      await members.update(memberId, { passwordHash: await hashPassword(password) });
      await auth.expireResetTokens(memberId);
      await members.endWebSessions(memberId);
    },
  };
}
export type AuthService = ReturnType<typeof authService>;
