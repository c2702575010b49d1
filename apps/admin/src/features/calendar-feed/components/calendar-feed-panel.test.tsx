import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../lib/api-client';
import { CalendarFeedPanel } from './calendar-feed-panel';

const FIRST = 'https://shop.example.org/api/calendar/first-token.ics';
const SECOND = 'https://shop.example.org/api/calendar/second-token.ics';

// jsdom has no modal dialogs; the confirmation only needs to open and close.
beforeAll(() => {
  HTMLDialogElement.prototype.showModal ??= function showModal(this: HTMLDialogElement) {
    this.setAttribute('open', '');
  };
  HTMLDialogElement.prototype.close ??= function close(this: HTMLDialogElement) {
    this.removeAttribute('open');
  };
});

describe('CalendarFeedPanel', () => {
  it('shows a new address once with the warning, copies it, and replaces it with the next one', async () => {
    const user = userEvent.setup();
    const onCreate = vi.fn<() => Promise<string>>().mockResolvedValueOnce(FIRST).mockResolvedValueOnce(SECOND);
    render(<CalendarFeedPanel onCreate={onCreate} onRevoke={vi.fn(async () => undefined)} />);
    expect(screen.queryByLabelText('Your feed address')).toBeNull();

    await user.click(screen.getByRole('button', { name: 'Make a feed address' }));

    expect((screen.getByLabelText('Your feed address') as HTMLInputElement).value).toBe(FIRST);
    expect(screen.getByText(/Anyone with this link can see your reservations/)).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Copy address' }));
    expect(await navigator.clipboard.readText()).toBe(FIRST);
    expect(screen.getByText('Copied.')).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Replace feed address' }));
    expect((screen.getByLabelText('Your feed address') as HTMLInputElement).value).toBe(SECOND);
    expect(screen.queryByText('Copied.')).toBeNull();
    expect(onCreate).toHaveBeenCalledTimes(2);
  });

  it('turns the feed off only after the question is confirmed, and hides the address', async () => {
    const user = userEvent.setup();
    const onRevoke = vi.fn(async () => undefined);
    render(<CalendarFeedPanel onCreate={vi.fn(async () => FIRST)} onRevoke={onRevoke} />);
    await user.click(screen.getByRole('button', { name: 'Make a feed address' }));

    await user.click(screen.getByRole('button', { name: 'Turn off calendar feed' }));
    const dialog = screen.getByRole('dialog', { name: 'Turn off your calendar feed?' });
    expect(onRevoke).not.toHaveBeenCalled();
    await user.click(within(dialog).getByRole('button', { name: 'Turn off feed' }));

    expect(onRevoke).toHaveBeenCalledTimes(1);
    expect(screen.getByText('Calendar feed turned off')).toBeTruthy();
    expect(screen.queryByLabelText('Your feed address')).toBeNull();
  });

  it('says so in the dialog when there is no feed to turn off', async () => {
    const user = userEvent.setup();
    const missing = new ApiError({ status: 404, code: 'calendar_feed_not_found', title: 'Not Found', detail: 'No calendar feed.' });
    render(<CalendarFeedPanel onCreate={vi.fn(async () => FIRST)} onRevoke={vi.fn(async () => Promise.reject(missing))} />);

    await user.click(screen.getByRole('button', { name: 'Turn off calendar feed' }));
    const dialog = screen.getByRole('dialog', { name: 'Turn off your calendar feed?' });
    await user.click(within(dialog).getByRole('button', { name: 'Turn off feed' }));

    expect(within(dialog).getByRole('alert').textContent).toContain('You have no calendar feed to turn off.');
  });
});
