import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../lib/api-client';
import { CalendarFeedPanel } from './calendar-feed-panel';

const FIRST = 'https://shop.example.org/api/calendar/first-token.ics';
const SECOND = 'https://shop.example.org/api/calendar/second-token.ics';
const NONE = { exists: false, createdAt: null };
// 15:30 UTC on 1 December 2026 is 09:30 CST in Chicago (IANA tz database via Intl).
const LIVE = { exists: true, createdAt: '2026-12-01T15:30:00Z' };

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
    const onChanged = vi.fn(async () => undefined);
    render(<CalendarFeedPanel status={NONE} onCreate={onCreate} onRevoke={vi.fn(async () => undefined)} onChanged={onChanged} />);
    expect(screen.queryByLabelText('Your feed address')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Turn off calendar feed' })).toBeNull();

    await user.click(screen.getByRole('button', { name: 'Make a feed link' }));
    expect(onChanged).toHaveBeenCalledTimes(1);

    expect((screen.getByLabelText('Your feed address') as HTMLInputElement).value).toBe(FIRST);
    expect(screen.getByText(/Anyone with this link can see your reservations/)).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Copy address' }));
    expect(await navigator.clipboard.readText()).toBe(FIRST);
    expect(screen.getByText('Copied.')).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Make a new link' }));
    expect((screen.getByLabelText('Your feed address') as HTMLInputElement).value).toBe(SECOND);
    expect(screen.queryByText('Copied.')).toBeNull();
    expect(onCreate).toHaveBeenCalledTimes(2);
  });

  it('turns the feed off only after the question is confirmed, and hides the address', async () => {
    const user = userEvent.setup();
    const onRevoke = vi.fn(async () => undefined);
    render(<CalendarFeedPanel status={NONE} onCreate={vi.fn(async () => FIRST)} onRevoke={onRevoke} />);
    await user.click(screen.getByRole('button', { name: 'Make a feed link' }));

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
    // The status said a feed was live, but it was turned off elsewhere since.
    render(<CalendarFeedPanel status={LIVE} onCreate={vi.fn(async () => FIRST)} onRevoke={vi.fn(async () => Promise.reject(missing))} />);

    await user.click(screen.getByRole('button', { name: 'Turn off calendar feed' }));
    const dialog = screen.getByRole('dialog', { name: 'Turn off your calendar feed?' });
    await user.click(within(dialog).getByRole('button', { name: 'Turn off feed' }));

    expect(within(dialog).getByRole('alert').textContent).toContain('You have no calendar feed to turn off.');
  });

  it('after a reload knows a feed is live and since when, without its address, and offers a new link or turning it off', async () => {
    const user = userEvent.setup();
    const onCreate = vi.fn(async () => SECOND);
    const onRevoke = vi.fn(async () => undefined);
    render(<CalendarFeedPanel status={LIVE} timeZone="America/Chicago" onCreate={onCreate} onRevoke={onRevoke} />);
    const since = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short', timeZone: 'America/Chicago' }).format(new Date(LIVE.createdAt));
    expect(since).toMatch(/9:30/);
    expect(screen.getByText((text) => text.includes(`live since ${since}.`))).toBeTruthy();
    expect(screen.queryByLabelText('Your feed address')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Make a feed link' })).toBeNull();

    await user.click(screen.getByRole('button', { name: 'Turn off calendar feed' }));
    await user.click(within(screen.getByRole('dialog', { name: 'Turn off your calendar feed?' })).getByRole('button', { name: 'Turn off feed' }));
    expect(onRevoke).toHaveBeenCalledTimes(1);
    // The old status still says live until it is asked again; the panel goes by what was just done.
    expect(screen.queryByText(/live since/)).toBeNull();
    expect(screen.getByRole('button', { name: 'Make a feed link' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Turn off calendar feed' })).toBeNull();
  });

  it('makes a new link in place of a live one and shows its address', async () => {
    const user = userEvent.setup();
    render(<CalendarFeedPanel status={LIVE} onCreate={vi.fn(async () => SECOND)} onRevoke={vi.fn(async () => undefined)} />);
    await user.click(screen.getByRole('button', { name: 'Make a new link' }));
    expect((screen.getByLabelText('Your feed address') as HTMLInputElement).value).toBe(SECOND);
    expect(screen.queryByText(/live since/)).toBeNull();
  });

  it('says it is still asking while the status has not answered', () => {
    render(<CalendarFeedPanel status={undefined} onCreate={vi.fn(async () => FIRST)} onRevoke={vi.fn(async () => undefined)} />);
    expect(screen.getByText('Checking whether you have a calendar feed…')).toBeTruthy();
  });
});
