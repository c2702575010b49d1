import { describe, expect, it } from 'vitest';
import { serverClockOffset } from './server-clock';

describe('server clock offset', () => {
  it('is how far the server’s clock runs ahead of the screen’s', () => {
    const received = Date.parse('2027-03-05T21:40:00Z');

    expect(serverClockOffset('2027-03-05T21:42:00Z', received)).toBe(120_000);
    expect(serverClockOffset('2027-03-05T21:39:30Z', received)).toBe(-30_000);
  });

  it('is nothing while no answer has arrived or the answer has no readable time', () => {
    expect(serverClockOffset('2027-03-05T21:42:00Z', 0)).toBe(0);
    expect(serverClockOffset('not a time', Date.parse('2027-03-05T21:40:00Z'))).toBe(0);
  });
});
