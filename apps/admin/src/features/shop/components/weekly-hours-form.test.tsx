import type { ShopHours, WeeklyHoursInput } from '@chuckkey/core';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../lib/api-client';
import { WeeklyHoursForm } from './weekly-hours-form';

// ISO 8601 weekdays: Monday 1 … Sunday 7.
const demoWeek: ShopHours['weekly'] = [
  { weekday: 2, opensAt: '16:00', closesAt: '22:00' },
  { weekday: 6, opensAt: '09:00', closesAt: '18:00' },
];

function setup(weekly = demoWeek, onSave = vi.fn(async (input: WeeklyHoursInput) => input.weekly as ShopHours['weekly'])) {
  const user = userEvent.setup();
  render(<WeeklyHoursForm weekly={weekly} onSave={onSave} />);
  return { user, onSave, day: (name: string) => within(screen.getByRole('group', { name })) };
}

describe('WeeklyHoursForm', () => {
  it('shows the seven days Monday first, a day without hours as closed, each time field named with its day', () => {
    const { day } = setup();

    expect(screen.getAllByRole('group').map((group) => group.querySelector('legend')?.textContent)).toEqual([
      'Monday',
      'Tuesday',
      'Wednesday',
      'Thursday',
      'Friday',
      'Saturday',
      'Sunday',
    ]);
    expect(day('Monday').getByText('Closed')).toBeTruthy();
    expect(day('Tuesday').getByRole('textbox', { name: 'Opens on Tuesday, opening 1' })).toHaveProperty('value', '16:00');
    expect(day('Tuesday').getByRole('textbox', { name: 'Closes on Tuesday, opening 1' })).toHaveProperty('value', '22:00');
    expect(day('Tuesday').getByRole('button', { name: 'Remove Tuesday, opening 1' })).toBeTruthy();
  });

  it('with no hours at all, says the days have none set rather than closed', () => {
    const { day } = setup([]);

    expect(day('Monday').getByText('No hours set')).toBeTruthy();
    expect(screen.queryByText('Closed')).toBeNull();
  });

  it('opening a closed day focuses its new field, and saving sends the whole week and says so', async () => {
    const { user, onSave, day } = setup();

    await user.click(day('Monday').getByRole('button', { name: 'Add opening times on Monday' }));
    const opens = day('Monday').getByRole('textbox', { name: 'Opens on Monday, opening 1' });
    expect(document.activeElement).toBe(opens);
    await user.type(opens, '9:30');
    await user.type(day('Monday').getByRole('textbox', { name: 'Closes on Monday, opening 1' }), '24:00');
    await user.click(screen.getByRole('button', { name: 'Save opening hours' }));

    expect(onSave).toHaveBeenCalledWith({
      weekly: [...demoWeek, { weekday: 1, opensAt: '09:30', closesAt: '24:00' }],
    });
    const notice = await screen.findByText('Opening hours saved.');
    expect(document.activeElement).toBe(notice.closest('[tabindex="-1"]'));
  });

  it('says under the field, in words, when a day closes before it opens or two openings overlap, and sends nothing', async () => {
    const { user, onSave, day } = setup();

    const closes = day('Tuesday').getByRole('textbox', { name: 'Closes on Tuesday, opening 1' });
    await user.clear(closes);
    await user.type(closes, '15:00');
    await user.click(day('Saturday').getByRole('button', { name: 'Add another opening on Saturday' }));
    await user.type(day('Saturday').getByRole('textbox', { name: 'Opens on Saturday, opening 2' }), '17:00');
    await user.type(day('Saturday').getByRole('textbox', { name: 'Closes on Saturday, opening 2' }), '20:00');
    await user.click(screen.getByRole('button', { name: 'Save opening hours' }));

    expect(closes.getAttribute('aria-invalid')).toBe('true');
    expect(closes.getAttribute('aria-describedby')).toBeTruthy();
    expect(document.getElementById(closes.getAttribute('aria-describedby') ?? '')?.textContent).toBe('The closing time must be after the opening time.');
    expect(day('Saturday').getByText('Overlaps 09:00–18:00 on Saturday.')).toBeTruthy();
    expect(onSave).not.toHaveBeenCalled();
  });

  it('an empty or impossible time is refused with a sentence', async () => {
    const { user, day } = setup();

    await user.click(day('Sunday').getByRole('button', { name: 'Add opening times on Sunday' }));
    await user.type(day('Sunday').getByRole('textbox', { name: 'Opens on Sunday, opening 1' }), '25:00');
    await user.click(screen.getByRole('button', { name: 'Save opening hours' }));

    expect(day('Sunday').getByText('Use a time from 00:00 to 24:00 (midnight at the end of the day).')).toBeTruthy();
    expect(day('Sunday').getByText('Enter a time.')).toBeTruthy();
  });

  it('removing an opening leaves the day closed and puts focus on its add button', async () => {
    const { user, onSave, day } = setup();

    await user.click(day('Saturday').getByRole('button', { name: 'Remove Saturday, opening 1' }));

    expect(day('Saturday').getByText('Closed')).toBeTruthy();
    expect(document.activeElement).toBe(day('Saturday').getByRole('button', { name: 'Add opening times on Saturday' }));
    await user.click(screen.getByRole('button', { name: 'Save opening hours' }));
    expect(onSave).toHaveBeenCalledWith({ weekly: [demoWeek[0]] });
  });

  it('puts the server’s field errors under the field they name', async () => {
    const refuse = vi.fn(async () => {
      throw new ApiError({ status: 400, code: 'validation_failed', title: 'Bad request', fieldErrors: { 'weekly.1.opensAt': ['Overlaps 09:00–18:00 on Saturday.'] } });
    });
    const { user } = setup(demoWeek, refuse);

    await user.click(screen.getByRole('button', { name: 'Save opening hours' }));

    const opens = screen.getByRole('textbox', { name: 'Opens on Saturday, opening 1' });
    expect(await screen.findByText('Overlaps 09:00–18:00 on Saturday.')).toBeTruthy();
    expect(opens.getAttribute('aria-invalid')).toBe('true');
    expect(screen.queryByText('Opening hours saved.')).toBeNull();
  });
});
