import { newPasswordSchema } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { passwordPairSchema, passwordsDifferMessage } from './password-confirmation';

const pair = passwordPairSchema(newPasswordSchema);

function messages(values: unknown) {
  const result = pair.safeParse(values);
  return result.success ? [] : result.error.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message }));
}

describe('a new password typed twice', () => {
  it('passes when both copies match and the password follows the rules', () => {
    expect(pair.safeParse({ password: 'lathe chuck key guard', confirmPassword: 'lathe chuck key guard' }).success).toBe(true);
  });

  it('says under the second copy when the two differ', () => {
    expect(messages({ password: 'lathe chuck key guard', confirmPassword: 'lathe chuck key gaurd' })).toEqual([
      { path: 'confirmPassword', message: passwordsDifferMessage },
    ]);
  });

  it('asks for the second copy when it is empty', () => {
    expect(messages({ password: 'lathe chuck key guard', confirmPassword: '' })).toContainEqual({
      path: 'confirmPassword',
      message: 'Type the new password again.',
    });
  });

  it('checks the password itself with the rules it is given', () => {
    expect(messages({ password: 'short', confirmPassword: 'short' }).map((issue) => issue.path)).toEqual(['password']);
  });
});
