import { DEFAULT_RESERVATION_RULES, type MachineReservationRules } from '@chuckkey/core';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../lib/api-client';
import { BookingRulesForm } from './booking-rules-form';

const current: MachineReservationRules = {
  machineId: '00000000-0000-4000-8000-0000000000aa',
  reservable: true,
  rules: DEFAULT_RESERVATION_RULES,
};

function setup(onSave: (rules: unknown) => Promise<unknown> = vi.fn(async () => undefined)) {
  const user = userEvent.setup();
  render(<BookingRulesForm machineName="MIG welder" current={current} onSave={onSave} />);
  return { user, onSave };
}

const field = (name: string) => screen.getByRole('textbox', { name }) as HTMLInputElement;

async function retype(user: ReturnType<typeof userEvent.setup>, name: string, value: string) {
  await user.clear(field(name));
  if (value !== '') await user.type(field(name), value);
}

describe('BookingRulesForm', () => {
  it('shows the current rules, the quota in hours, each with its default in the hint', () => {
    setup();
    expect(field('Slot step (minutes)').value).toBe('15');
    expect(field('Weekly quota per member (hours)').value).toBe('6');
    expect(field('No-show grace (minutes)').getAttribute('aria-describedby')).toBeTruthy();
    const hintId = field('Slot step (minutes)').getAttribute('aria-describedby') ?? '';
    expect(document.getElementById(hintId.split(' ')[0] ?? '')?.textContent).toContain('Default 15.');
    expect(screen.getByText('The MIG welder can be reserved.', { exact: false })).toBeTruthy();
  });

  it('sends the quota in minutes, keeps whether the machine can be reserved, and says it is saved (docs/api.md body)', async () => {
    const { user, onSave } = setup();
    await retype(user, 'Longest reservation (minutes)', '60');
    await retype(user, 'Weekly quota per member (hours)', '2');
    await user.click(screen.getByRole('button', { name: 'Save booking rules' }));

    expect(onSave).toHaveBeenCalledWith({ reservable: true, ...DEFAULT_RESERVATION_RULES, maxMinutes: 60, weeklyQuotaMinutes: 120 });
    expect((await screen.findByRole('status')).textContent).toBe('The booking rules of the MIG welder are saved.');
  });

  it('refuses a maximum that is not whole steps under the field, sends nothing and keeps what was typed (docs/api.md: maximum whole steps)', async () => {
    const { user, onSave } = setup();
    await retype(user, 'Longest reservation (minutes)', '50');
    await user.click(screen.getByRole('button', { name: 'Save booking rules' }));

    expect(await screen.findByText('The longest reservation must be a whole number of 15-minute steps.')).toBeTruthy();
    expect(field('Longest reservation (minutes)').getAttribute('aria-invalid')).toBe('true');
    expect(onSave).not.toHaveBeenCalled();
    expect(field('Longest reservation (minutes)').value).toBe('50');
    expect(screen.getByRole('status').textContent).toBe('');
  });

  it('asks for a number left empty and keeps the others as typed (common practice: required fields say so)', async () => {
    const { user, onSave } = setup();
    await retype(user, 'Booking horizon (days)', '');
    await retype(user, 'Buffer after each reservation (minutes)', '10');
    await user.click(screen.getByRole('button', { name: 'Save booking rules' }));

    expect(await screen.findByText('Give the booking horizon (days) as a whole number.')).toBeTruthy();
    expect(document.activeElement).toBe(field('Booking horizon (days)'));
    expect(field('Buffer after each reservation (minutes)').value).toBe('10');
    expect(onSave).not.toHaveBeenCalled();
  });

  it("puts the server's 400 field errors under their fields, the quota's on the hours field, and keeps the values", async () => {
    const refusal = new ApiError({
      status: 400,
      code: 'validation_failed',
      title: 'Some values need fixing.',
      fieldErrors: { noShowLimit: ['The no-show limit must be at least 1.'], weeklyQuotaMinutes: ['The weekly quota (minutes) can be at most 10080.'] },
    });
    const { user } = setup(vi.fn(async () => Promise.reject(refusal)));
    await retype(user, 'Weekly quota per member (hours)', '3.5');
    await user.click(screen.getByRole('button', { name: 'Save booking rules' }));

    expect(await screen.findByText('The no-show limit must be at least 1.')).toBeTruthy();
    expect(screen.getByText('Give the weekly quota as a number of hours from 0 to 168, e.g. 1.5 for an hour and a half.')).toBeTruthy();
    expect(document.activeElement).toBe(field('Weekly quota per member (hours)'));
    expect(field('Weekly quota per member (hours)').value).toBe('3.5');
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('says what went wrong above the form when the server names no field', async () => {
    const refusal = new ApiError({ status: 404, code: 'machine_not_found', title: 'That machine is gone.' });
    const { user } = setup(vi.fn(async () => Promise.reject(refusal)));
    await user.click(screen.getByRole('button', { name: 'Save booking rules' }));
    expect((await screen.findByRole('alert')).textContent).toContain('That machine is gone.');
    expect(field('Slot step (minutes)').value).toBe('15');
  });
});
