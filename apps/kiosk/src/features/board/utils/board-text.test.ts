import { describe, expect, it } from 'vitest';
import { formatShopMoment, hoursLine, plateText, shortName, supervisorLine, type PlateFacts } from './board-text';

const zone = 'America/Chicago';
// IANA time zone database: America/Chicago is UTC−6 on 5 March 2027 (daylight-saving time starts 14 March).
const now = new Date('2027-03-05T21:42:07Z'); // 15:42:07 on Friday in the shop

const lathe: PlateFacts = {
  state: 'available',
  category: 'lathe',
  member: null,
  startedAt: null,
  nextReservationAt: null,
  tagOut: null,
};

describe('names on the board', () => {
  it('shows a first name and the initial of the last name only', () => {
    expect(shortName({ firstName: 'Peregrine', lastInitial: 'V' })).toBe('Peregrine V.');
  });

  it('shows the first name alone when there is no last initial', () => {
    expect(shortName({ firstName: 'Ottoline', lastInitial: '' })).toBe('Ottoline');
  });

  it('names the supervisor on duty, or says there is none', () => {
    expect(supervisorLine({ firstName: 'Isolde', lastInitial: 'K' })).toBe('Supervisor on duty: Isolde K.');
    expect(supervisorLine(null)).toBe('No supervisor on duty');
  });
});

describe('today’s hours', () => {
  it('gives the opening times and whether the shop is open now', () => {
    expect(hoursLine({ open: true, intervals: [{ opensAt: '09:00', closesAt: '21:00' }], closure: null })).toBe('Open now · today 09:00–21:00');
    expect(
      hoursLine({
        open: false,
        intervals: [
          { opensAt: '09:00', closesAt: '12:00' },
          { opensAt: '16:00', closesAt: '22:00' },
        ],
        closure: null,
      }),
    ).toBe('Closed now · today 09:00–12:00, 16:00–22:00');
  });

  it('says why the shop is closed on a closure day', () => {
    expect(hoursLine({ open: false, intervals: [], closure: { reason: 'Winter deep clean' } })).toBe('Closed today: Winter deep clean');
  });

  it('says closed today on a day without hours', () => {
    expect(hoursLine({ open: false, intervals: [], closure: null })).toBe('Closed today');
  });

  it('says open all day when the day runs from midnight to midnight', () => {
    expect(hoursLine({ open: true, intervals: [{ opensAt: '00:00', closesAt: '24:00' }], closure: null })).toBe('Open all day');
  });
});

describe('times on the shop’s clock', () => {
  it('shows a time today as hours and minutes, another day with its weekday', () => {
    expect(formatShopMoment(new Date('2027-03-05T23:30:00Z'), now, zone)).toBe('17:30');
    // 02:00 UTC on Saturday is still Friday evening in the shop.
    expect(formatShopMoment(new Date('2027-03-06T02:00:00Z'), now, zone)).toBe('20:00');
    expect(formatShopMoment(new Date('2027-03-06T15:00:00Z'), now, zone)).toBe('Sat 09:00');
  });
});

describe('a nameplate’s detail line', () => {
  it('shows who is on a machine in use and how long the session has run', () => {
    const text = plateText(
      { ...lathe, state: 'in_use', member: { firstName: 'Peregrine', lastInitial: 'V' }, startedAt: '2027-03-05T21:00:00Z' },
      now,
      zone,
    );

    expect(text).toEqual({ detail: 'Peregrine V.', aside: '42:07' });
  });

  it('counts hours once a session passes the hour', () => {
    const text = plateText({ ...lathe, state: 'in_use', member: { firstName: 'Ada', lastInitial: 'R' }, startedAt: '2027-03-05T19:30:00Z' }, now, zone);

    expect(text.aside).toBe('2:12:07');
  });

  it('adds the next reservation to a machine in use', () => {
    const text = plateText(
      {
        ...lathe,
        state: 'in_use',
        member: { firstName: 'Peregrine', lastInitial: 'V' },
        startedAt: '2027-03-05T21:00:00Z',
        nextReservationAt: '2027-03-05T23:00:00Z',
      },
      now,
      zone,
    );

    expect(text.detail).toBe('Peregrine V. · next 17:00');
  });

  it('gives a tagged-out machine’s reason', () => {
    const text = plateText({ ...lathe, state: 'tagged_out', tagOut: { reason: 'Cross-slide gib is loose', since: '2027-03-05T14:00:00Z' } }, now, zone);

    expect(text).toEqual({ detail: 'Cross-slide gib is loose', aside: null });
  });

  it('says an offline machine’s station is not reporting', () => {
    expect(plateText({ ...lathe, state: 'offline' }, now, zone).detail).toBe('Station not reporting');
  });

  it('shows a free machine’s kind, or its next reservation when there is one', () => {
    expect(plateText(lathe, now, zone).detail).toBe('Engine lathe');
    expect(plateText({ ...lathe, nextReservationAt: '2027-03-06T15:00:00Z' }, now, zone).detail).toBe('Next reservation Sat 09:00');
  });

  it('shows when a reserved machine’s reservation starts', () => {
    expect(plateText({ ...lathe, state: 'reserved', nextReservationAt: '2027-03-05T22:00:00Z' }, now, zone).detail).toBe('From 16:00');
  });
});
