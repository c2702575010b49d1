import { describe, expect, it } from 'vitest';
import { paths, safeNextPath } from './paths';

describe('safeNextPath', () => {
  it('returns to the page the person asked for, with its query', () => {
    expect(safeNextPath('/people?role=admin&page=2')).toBe('/people?role=admin&page=2');
  });

  it('goes to the shop floor when nothing was asked for', () => {
    expect(safeNextPath(null)).toBe('/');
    expect(safeNextPath('')).toBe('/');
  });

  it('never follows a link to another site', () => {
    expect(safeNextPath('https://elsewhere.example/phish')).toBe('/');
    expect(safeNextPath('//elsewhere.example/phish')).toBe('/');
    expect(safeNextPath('/\\elsewhere.example')).toBe('/');
    expect(safeNextPath('javascript:alert(1)')).toBe('/');
  });

  it('does not send a signed-in person back to a signed-out page', () => {
    expect(safeNextPath('/sign-in?next=/people')).toBe('/');
    expect(safeNextPath('/reset-password?token=abc')).toBe('/');
  });
});

describe('paths', () => {
  it('carries the page to return to in the sign-in address', () => {
    expect(paths.signIn.getHref('/people?page=2')).toBe('/sign-in?next=%2Fpeople%3Fpage%3D2');
    expect(paths.signIn.getHref()).toBe('/sign-in');
  });
});
