import { DEFAULT_RESERVATION_RULES } from '@chuckkey/core';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../lib/api-client';
import { weekSlots } from '../utils/week-slots';
import { ReserveForm } from './reserve-form';
import { WeekView } from './week-view';

const CHICAGO = 'America/Chicago';
const machine = { id: '00000000-0000-4000-8000-0000000000aa', name: 'MIG welder' };
// Saturday 14 March 2026, 9:00 in Chicago, the first Saturday on CDT (UTC−5) per the IANA tz database via Intl.
const saturdayNine = new Date('2026-03-14T14:00:00Z');

function setup(onReserve = vi.fn(async () => undefined), start: Date | null = saturdayNine) {
  const user = userEvent.setup();
  render(
    <ReserveForm
      machine={machine}
      rules={{ ...DEFAULT_RESERVATION_RULES, bufferMinutes: 15 }}
      timeZone={CHICAGO}
      start={start}
      quotaLeftMinutes={240}
      onReserve={onReserve}
    />,
  );
  return { user, onReserve };
}

describe('ReserveForm', () => {
  it('shows the rules that apply and the quota left before anything is sent', () => {
    setup();
    const rules = screen.getByRole('list', { name: 'Rules for this machine' });
    expect(rules.textContent).toContain('Starts and ends on steps of 15 min.');
    expect(rules.textContent).toContain('At most 2 h at a time.');
    expect(rules.textContent).toContain('15 min of cleanup is kept free after each reservation.');
    expect(rules.textContent).toContain('Up to 14 days ahead.');
    expect(rules.textContent).toContain('Weekly quota 6 h (Monday to Sunday): 4 h left that week.');
  });

  it('waits for a start to be chosen', () => {
    setup(undefined, null);
    expect(screen.getByText('Choose a free start time in the week above.')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Reserve the MIG welder' })).toHaveProperty('disabled', true);
  });

  it('offers lengths in slot steps up to the longest allowed, and sends the start and end as instants', async () => {
    const { user, onReserve } = setup();
    const length = screen.getByRole('combobox', { name: 'Length' });
    const options = Array.from(length.querySelectorAll('option')).map((o) => o.textContent);
    expect(options[0]).toBe('15 min');
    expect(options.at(-1)).toBe('2 h');
    expect(options).toHaveLength(8);

    await user.selectOptions(length, '120');
    expect(screen.getByText('You are reserving Saturday 14 March, 9:00–11:00.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Reserve the MIG welder' }));

    expect(onReserve).toHaveBeenCalledWith({ machineId: machine.id, start: '2026-03-14T14:00:00.000Z', end: '2026-03-14T16:00:00.000Z' });
    expect((await screen.findByRole('status')).textContent).toContain('The MIG welder is yours on Saturday 14 March, 9:00–11:00.');
  });

  it('shows the rule that refused the reservation in words under the form', async () => {
    const refusal = new ApiError({
      status: 409,
      code: 'overlap',
      title: 'That clashes with what is already saved.',
      detail: 'The MIG welder is already reserved for part of that time. Choose another slot.',
    });
    const { user } = setup(vi.fn(async () => Promise.reject(refusal)));
    await user.click(screen.getByRole('button', { name: 'Reserve the MIG welder' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('That time is already taken');
    expect(alert.textContent).toContain('The MIG welder is already reserved for part of that time. Choose another slot.');
    expect(alert.querySelector('[data-refusal-code]')?.getAttribute('data-refusal-code')).toBe('overlap');
  });
});

describe('WeekView', () => {
  const days = weekSlots({
    monday: '2026-03-09',
    timeZone: CHICAGO,
    slotMinutes: 60,
    weekly: [{ weekday: 6, opensAt: '09:00', closesAt: '11:00' }],
    closures: [],
    taken: [{ start: '2026-03-14T15:00:00Z', end: '2026-03-14T16:00:00Z', blockedUntil: '2026-03-14T16:00:00Z', kind: 'member' }],
    now: new Date('2026-03-09T00:00:00Z'),
  });

  it('names each slot by day, time and state, keeps taken slots reachable but not choosable, and chooses a free one', async () => {
    const user = userEvent.setup();
    const onChoose = vi.fn();
    render(<WeekView days={days} chosen={null} onChoose={onChoose} />);

    const taken = screen.getByRole('button', { name: 'Saturday 10:00, taken' });
    expect(taken.getAttribute('aria-disabled')).toBe('true');
    await user.click(taken);
    expect(onChoose).not.toHaveBeenCalled();

    const free = screen.getByRole('button', { name: 'Saturday 9:00, free' });
    expect(free.getAttribute('aria-pressed')).toBe('false');
    free.focus();
    await user.keyboard('{Enter}');
    expect(onChoose).toHaveBeenCalledWith(expect.objectContaining({ start: saturdayNine, state: 'free' }));
    expect(screen.getByRole('group', { name: /Monday/ }).textContent).toContain('Closed');
  });

  it('makes each day one stop for Tab, the arrow keys moving between its slots (WAI-ARIA APG roving tabindex)', async () => {
    const user = userEvent.setup();
    const wider = weekSlots({
      monday: '2026-03-09',
      timeZone: CHICAGO,
      slotMinutes: 60,
      weekly: [
        { weekday: 5, opensAt: '18:00', closesAt: '20:00' },
        { weekday: 6, opensAt: '09:00', closesAt: '12:00' },
      ],
      closures: [],
      taken: [{ start: '2026-03-14T14:00:00Z', end: '2026-03-14T15:00:00Z', blockedUntil: '2026-03-14T15:00:00Z', kind: 'member' }],
      now: new Date('2026-03-09T00:00:00Z'),
    });
    render(<WeekView days={wider} chosen={null} onChoose={vi.fn()} />);

    await user.tab();
    expect(document.activeElement?.getAttribute('aria-label')).toBe('Friday 18:00, free');
    await user.tab();
    // Saturday's Tab stop is its first free slot, past the taken 9:00.
    expect(document.activeElement?.getAttribute('aria-label')).toBe('Saturday 10:00, free');
    await user.keyboard('{ArrowLeft}');
    expect(document.activeElement?.getAttribute('aria-label')).toBe('Saturday 9:00, taken');
    await user.keyboard('{End}');
    expect(document.activeElement?.getAttribute('aria-label')).toBe('Saturday 11:00, free');
    await user.tab({ shift: true });
    expect(document.activeElement?.getAttribute('aria-label')).toBe('Friday 18:00, free');
  });
});
