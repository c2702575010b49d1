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

describe('paths with ids', () => {
  it('keeps an id in one segment of the address, whatever it holds', () => {
    expect(paths.memberRecord.getHref('a/b')).toBe('/teach/members/a%2Fb');
    expect(paths.setupMachine.getHref('5f0c')).toBe('/setup/machines/5f0c');
    expect(paths.reserve.getHref('a/b')).toBe('/reserve?machine=a%2Fb');
    expect(paths.reserve.getHref()).toBe('/reserve');
  });

  it('leaves the default view of the sign-off report out of its address', () => {
    expect(paths.signOffReport.getHref()).toBe('/people/sign-offs');
    expect(paths.signOffReport.getHref('expiring')).toBe('/people/sign-offs');
    expect(paths.signOffReport.getHref('expired')).toBe('/people/sign-offs?status=expired');
  });

  it('names the chosen tools of a label sheet in its address, and none for every tool', () => {
    expect(paths.cribLabels.getHref(['a1', 'b2'])).toBe('/crib/labels?items=a1%2Cb2');
    expect(paths.cribLabels.getHref([])).toBe('/crib/labels');
    expect(paths.cribLabels.getHref()).toBe('/crib/labels');
  });
});
