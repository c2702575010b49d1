import type { ShopPolicies } from '@chuckkey/core';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../lib/api-client';
import { ShopPoliciesForm } from './shop-policies-form';

function setup(policies: ShopPolicies = { overdueCheckoutBlockDays: null }, onSave = vi.fn(async (input: ShopPolicies) => input)) {
  const user = userEvent.setup();
  render(<ShopPoliciesForm policies={policies} onSave={onSave} />);
  return {
    user,
    onSave,
    block: () => screen.getByRole('switch', { name: 'Block machine use when a crib tool is overdue' }),
    days: () => screen.queryByRole('textbox', { name: 'Days overdue before machines refuse' }),
    save: () => user.click(screen.getByRole('button', { name: 'Save policies' })),
  };
}

describe('ShopPoliciesForm', () => {
  it('starts off with no days field, says it is off by default, and saving off sends null', async () => {
    const { block, days, save, onSave } = setup();

    expect(block()).toHaveProperty('checked', false);
    expect(days()).toBeNull();
    expect(screen.getByText(/^Off by default\./)).toBeTruthy();
    await save();
    expect(onSave).toHaveBeenCalledWith({ overdueCheckoutBlockDays: null });
    expect(await screen.findByText('Policies saved.')).toBeTruthy();
  });

  it('turned on, asks for the days: an empty field is refused under it and nothing is sent', async () => {
    const { user, block, days, save, onSave } = setup();

    await user.click(block());
    await save();
    const field = days()!;
    expect(field.getAttribute('aria-invalid')).toBe('true');
    expect(document.activeElement).toBe(field);
    expect(screen.getByText('Give a whole number of days from 0 to 365.')).toBeTruthy();
    expect(onSave).not.toHaveBeenCalled();

    await user.type(field, '4');
    await save();
    expect(onSave).toHaveBeenCalledWith({ overdueCheckoutBlockDays: 4 });
  });

  it('shows the saved days, and a field error from the server under the field', async () => {
    const onSave = vi.fn(async (): Promise<ShopPolicies> => {
      throw new ApiError({ status: 400, code: 'validation_failed', title: 'Bad request', fieldErrors: { overdueCheckoutBlockDays: ['Too many days.'] } });
    });
    const { days, save } = setup({ overdueCheckoutBlockDays: 2 }, onSave);

    expect(days()).toHaveProperty('value', '2');
    await save();
    expect(await screen.findByText('Too many days.')).toBeTruthy();
    expect(days()!.getAttribute('aria-invalid')).toBe('true');
  });
});
