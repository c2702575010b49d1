import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { RangePicker } from './range-picker';

const today = '2026-12-02';

function setup(range = { from: '2026-11-03', to: today }) {
  const onChange = vi.fn();
  const user = userEvent.setup();
  render(<RangePicker range={range} today={today} onChange={onChange} />);
  return { user, onChange };
}

describe('RangePicker', () => {
  it('marks the preset the range is, and asks for another preset in one press', async () => {
    const { user, onChange } = setup();
    expect(screen.getByRole('button', { name: 'Last 30 days' }).getAttribute('aria-pressed')).toBe('true');
    expect(screen.getByRole('button', { name: 'This year' }).getAttribute('aria-pressed')).toBe('false');
    await user.click(screen.getByRole('button', { name: 'This year' }));
    expect(onChange).toHaveBeenCalledWith({ from: '2026-01-01', to: today });
  });

  it('asks for the days typed in once they make a range', async () => {
    const { user, onChange } = setup();
    const from = screen.getByLabelText('From');
    await user.clear(from);
    await user.type(from, '2026-10-01');
    await user.click(screen.getByRole('button', { name: 'Show these days' }));
    expect(onChange).toHaveBeenCalledWith({ from: '2026-10-01', to: today });
  });

  it('says what is wrong under the field, and asks for nothing, when the last day comes first', async () => {
    const { user, onChange } = setup();
    const to = screen.getByLabelText('To');
    await user.clear(to);
    await user.type(to, '2026-10-01');
    await user.click(screen.getByRole('button', { name: 'Show these days' }));
    expect(onChange).not.toHaveBeenCalled();
    expect(to.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText('The last day must not come before the first day.')).toBeTruthy();
  });
});
