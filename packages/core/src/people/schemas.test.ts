import { describe, expect, it } from 'vitest';
import { loginSchema, newPasswordSchema, PASSWORD_MAX, PASSWORD_MIN } from '../auth/schemas';
import { memberListQuerySchema, memberUpdateSchema, publicName } from './schemas';

describe('loginSchema', () => {
  it('trims the e-mail address and lower-cases it', () => {
    const parsed = loginSchema.parse({ email: '  Welder.One@Test.Example.ORG ', password: 'anything' });
    expect(parsed.email).toBe('welder.one@test.example.org');
  });

  it('rejects an address without an @ and says what to enter', () => {
    const result = loginSchema.safeParse({ email: 'not-an-address', password: 'anything' });
    expect(result.success).toBe(false);
    const issue = result.error!.issues.find((i) => i.path[0] === 'email');
    expect(issue?.message).toBe('Enter an e-mail address like name@example.org.');
  });

  it('rejects an empty password', () => {
    const result = loginSchema.safeParse({ email: 'someone@test.example.org', password: '' });
    expect(result.success).toBe(false);
    expect(result.error!.issues[0]?.path).toEqual(['password']);
  });
});

describe('newPasswordSchema', () => {
  // NIST SP 800-63B §3.1.1.2: length limits only, no composition rules.
  it('accepts exactly the minimum and exactly the maximum length', () => {
    expect(PASSWORD_MIN).toBe(12);
    expect(PASSWORD_MAX).toBe(128);
    expect(newPasswordSchema.safeParse('a'.repeat(12)).success).toBe(true);
    expect(newPasswordSchema.safeParse('a'.repeat(128)).success).toBe(true);
  });

  it('rejects one character too few with a message naming the minimum', () => {
    const result = newPasswordSchema.safeParse('a'.repeat(11));
    expect(result.success).toBe(false);
    expect(result.error!.issues[0]?.message).toBe('Use at least 12 characters.');
  });

  it('rejects one character too many with a message naming the maximum', () => {
    const result = newPasswordSchema.safeParse('a'.repeat(129));
    expect(result.success).toBe(false);
    expect(result.error!.issues[0]?.message).toBe('Use at most 128 characters.');
  });
});

describe('memberListQuerySchema', () => {
  it('with nothing given, asks for the first page of 25 sorted by name ascending', () => {
    expect(memberListQuerySchema.parse({})).toEqual({ page: 1, pageSize: 25, sort: 'name', order: 'asc' });
  });

  it('turns the strings of a query string into numbers and keeps the rest', () => {
    const parsed = memberListQuerySchema.parse({ page: '3', pageSize: '10', search: '  lathe  ', role: 'instructor', sort: 'email', order: 'desc' });
    expect(parsed).toEqual({ page: 3, pageSize: 10, search: 'lathe', role: 'instructor', sort: 'email', order: 'desc' });
  });

  it('rejects page 0, more than 100 rows, an unknown role and an unknown sort field', () => {
    const result = memberListQuerySchema.safeParse({ page: '0', pageSize: '101', role: 'wizard', sort: 'nope' });
    expect(result.success).toBe(false);
    const fields = result.error!.issues.map((i) => i.path[0]).sort();
    expect(fields).toEqual(['page', 'pageSize', 'role', 'sort']);
  });
});

describe('memberUpdateSchema', () => {
  it('rejects a change that changes nothing', () => {
    const result = memberUpdateSchema.safeParse({});
    expect(result.success).toBe(false);
    expect(result.error!.issues[0]?.message).toBe('Change the role or the active state.');
  });

  it('accepts a role alone or the active state alone', () => {
    expect(memberUpdateSchema.parse({ role: 'admin' })).toEqual({ role: 'admin' });
    expect(memberUpdateSchema.parse({ active: false })).toEqual({ active: false });
  });

  it('rejects a role that does not exist', () => {
    expect(memberUpdateSchema.safeParse({ role: 'wizard' }).success).toBe(false);
  });
});

describe('publicName()', () => {
  it('shows the first name and the initial of the last name', () => {
    expect(publicName('Priya', 'Castellanos')).toBe('Priya C.');
  });

  it('upper-cases the initial and ignores leading spaces in the last name', () => {
    expect(publicName('Tamsin', '  van Roon')).toBe('Tamsin V.');
  });

  it('with no last name, shows the first name alone', () => {
    expect(publicName('Oskar', '')).toBe('Oskar');
  });
});
