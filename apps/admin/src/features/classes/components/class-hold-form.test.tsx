import type { ClassDetail } from '@chuckkey/core';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../lib/api-client';
import type { ClassRequestBody } from '../api/create-class';
import { ClassHoldForm } from './class-hold-form';

const CHICAGO = 'America/Chicago';
const lathe = { id: '00000000-0000-4000-8000-0000000000aa', name: 'Lathe 2' };
const training = { id: '00000000-0000-4000-8000-0000000000bb', name: 'Metal lathe fundamentals' };

function setup(onHold: (body: ClassRequestBody) => Promise<ClassDetail>) {
  const user = userEvent.setup();
  render(
    <MemoryRouter>
      <ClassHoldForm machines={[lathe]} trainings={[training]} timeZone={CHICAGO} today="2026-12-02" onHold={onHold} classHref={(id) => `/teach/classes/${id}`} />
    </MemoryRouter>,
  );
  return { user };
}

async function fillWeeklyClass(user: ReturnType<typeof userEvent.setup>) {
  await user.selectOptions(screen.getByRole('combobox', { name: 'Machine' }), lathe.id);
  await user.selectOptions(screen.getByRole('combobox', { name: /^Training/ }), training.id);
  await user.type(screen.getByRole('textbox', { name: 'Title' }), 'Lathe basics class');
  await user.type(screen.getByLabelText('Date of the first class'), '2030-10-26');
  await user.type(screen.getByLabelText(/^Start time/), '09:00');
  await user.selectOptions(screen.getByRole('combobox', { name: 'Length' }), '120');
  const weeks = screen.getByRole('spinbutton', { name: /^Repeat weekly for/ });
  await user.clear(weeks);
  await user.type(weeks, '3');
}

describe('ClassHoldForm', () => {
  it('lists the meetings it will hold on the shop clock before sending, and sends the first one with the weeks', async () => {
    const onHold = vi.fn(async () => Promise.reject(new ApiError({ status: 500, code: 'http_500', title: 'The server had a problem.' })));
    const { user } = setup(onHold);
    await fillWeeklyClass(user);

    // IANA tz database via Intl: Chicago leaves CDT for CST on Sunday 3 November 2030, and the
    // 9 November meeting still starts at 9:00 local.
    const preview = screen.getByRole('list', { name: 'It will hold' });
    expect(within(preview).getAllByRole('listitem').map((item) => item.textContent)).toEqual([
      'Saturday 26 October, 9:00–11:00',
      'Saturday 2 November, 9:00–11:00',
      'Saturday 9 November, 9:00–11:00',
    ]);

    await user.click(screen.getByRole('button', { name: 'Hold the machine' }));
    expect(onHold).toHaveBeenCalledWith({
      machineId: lathe.id,
      trainingId: training.id,
      title: 'Lathe basics class',
      start: '2030-10-26T14:00:00.000Z',
      end: '2030-10-26T16:00:00.000Z',
      weeks: 3,
      capacity: null,
    });
  });

  it("shows the server's refusal under the form and keeps what was typed", async () => {
    const refused = new ApiError({
      status: 409,
      code: 'overlap',
      title: 'Conflict',
      detail: 'Lathe 2 is already reserved on Saturday 2 November for part of the class. Choose another time.',
    });
    const { user } = setup(vi.fn(async () => Promise.reject(refused)));
    await fillWeeklyClass(user);
    await user.click(screen.getByRole('button', { name: 'Hold the machine' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The machine is already taken then');
    expect(alert.textContent).toContain('Saturday 2 November');
    const form = screen.getByRole('form', { name: 'Hold a machine for a class' });
    expect(form.lastElementChild).toBe(alert);
    expect(screen.getByRole('textbox', { name: 'Title' })).toHaveProperty('value', 'Lathe basics class');
    expect(screen.getByRole('spinbutton', { name: /^Repeat weekly for/ })).toHaveProperty('value', '3');
  });

  it('puts the server’s field errors under the fields they concern', async () => {
    const refused = new ApiError({ status: 400, code: 'validation_failed', title: 'Bad request', fieldErrors: { start: ['The first class must start in the future.'] } });
    const { user } = setup(vi.fn(async () => Promise.reject(refused)));
    await fillWeeklyClass(user);
    await user.click(screen.getByRole('button', { name: 'Hold the machine' }));

    const date = await screen.findByLabelText('Date of the first class');
    await vi.waitFor(() => expect(date.getAttribute('aria-invalid')).toBe('true'));
    expect(screen.getByText('The first class must start in the future.')).toBeTruthy();
    expect(screen.queryByRole('alert')).toBeNull();
  });
});
