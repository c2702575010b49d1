import type { ShopHours } from '@chuckkey/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '../../../lib/query-client';
import { ShopHoursSetup } from './shop-hours-setup';

// jsdom has no modal dialogs; the confirmation only needs to open and close.
beforeAll(() => {
  HTMLDialogElement.prototype.showModal ??= function showModal(this: HTMLDialogElement) {
    this.setAttribute('open', '');
  };
  HTMLDialogElement.prototype.close ??= function close(this: HTMLDialogElement) {
    this.removeAttribute('open');
  };
});
afterEach(() => {
  vi.unstubAllGlobals();
});

const TODAY = '2026-03-10';
const noHours: ShopHours = {
  timeZone: 'America/Chicago',
  weekly: [],
  closures: [],
  today: { date: TODAY, open: true, opensAt: null, closesAt: null, intervals: [{ opensAt: '00:00', closesAt: '24:00' }], closure: null },
};

interface Call {
  method: string;
  path: string;
  body: unknown;
}

/** The server as the page sees it: one state that the writes change, and every call written down. */
function fakeServer(initial: ShopHours) {
  let state = initial;
  const calls: Call[] = [];
  const json = (status: number, body: unknown) =>
    new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init: RequestInit = {}) => {
      const method = init.method ?? 'GET';
      const path = input.replace(/^\/api/, '');
      const body = typeof init.body === 'string' ? JSON.parse(init.body) : undefined;
      calls.push({ method, path, body });
      if (path === '/auth/csrf') return json(200, { token: 'test-token' });
      if (method === 'GET' && path === '/shop/hours') return json(200, state);
      if (method === 'PUT' && path === '/shop/hours') {
        state = { ...state, weekly: body.weekly };
        return json(200, state);
      }
      if (method === 'POST' && path === '/shop/closures') {
        const closure = { id: '6f1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d', ...body };
        state = { ...state, closures: [...state.closures, closure] };
        return json(201, closure);
      }
      if (method === 'DELETE' && path.startsWith('/shop/closures/')) {
        state = { ...state, closures: state.closures.filter((c) => `/shop/closures/${c.id}` !== path) };
        return json(204, undefined);
      }
      return json(404, { type: '/problems/route_not_found', title: 'Not found', status: 404, code: 'route_not_found' });
    }),
  );
  return { calls };
}

function renderPage() {
  render(
    <QueryClientProvider client={createQueryClient()}>
      <ShopHoursSetup />
    </QueryClientProvider>,
  );
  return userEvent.setup();
}

describe('Setup › Shop hours', () => {
  it('with no hours set, says the shop counts as open at all times and shows its time zone', async () => {
    fakeServer(noHours);
    renderPage();

    expect(await screen.findByText('No opening hours set: the shop counts as open at all times.')).toBeTruthy();
    expect(screen.getByText('Open at all times')).toBeTruthy();
    expect(screen.getByText(/in its time zone, America\/Chicago/)).toBeTruthy();
    expect(screen.getByText('No closures coming up')).toBeTruthy();
  });

  it('an admin gives Tuesday its hours, and the page saves the week with the CSRF token', async () => {
    const { calls } = fakeServer(noHours);
    const user = renderPage();

    const tuesday = within(await screen.findByRole('group', { name: 'Tuesday' }));
    await user.click(tuesday.getByRole('button', { name: 'Add opening times on Tuesday' }));
    await user.type(tuesday.getByRole('textbox', { name: 'Opens on Tuesday, opening 1' }), '16:00');
    await user.type(tuesday.getByRole('textbox', { name: 'Closes on Tuesday, opening 1' }), '22:00');
    await user.click(screen.getByRole('button', { name: 'Save opening hours' }));

    expect(await screen.findByText('Opening hours saved.')).toBeTruthy();
    expect(calls.find((c) => c.method === 'PUT')).toEqual({
      method: 'PUT',
      path: '/shop/hours',
      body: { weekly: [{ weekday: 2, opensAt: '16:00', closesAt: '22:00' }] },
    });
    const put = vi.mocked(fetch).mock.calls.find(([, init]) => init?.method === 'PUT');
    expect((put?.[1]?.headers as Record<string, string>)['x-csrf-token']).toBe('test-token');
    // Saving waits for the hours to be read again: the other days now read as closed, and the notice is gone.
    expect(within(screen.getByRole('group', { name: 'Monday' })).getByText('Closed')).toBeTruthy();
    expect(screen.queryByText('No opening hours set: the shop counts as open at all times.')).toBeNull();
    expect(calls.filter((c) => c.method === 'GET' && c.path === '/shop/hours')).toHaveLength(2);
  });

  it('adds a closure with its dates and reason, lists it, and removes it after asking', async () => {
    fakeServer(noHours);
    const user = renderPage();

    const form = within(await screen.findByRole('form', { name: 'Add a closure' }));
    fireEvent.change(form.getByLabelText('First day'), { target: { value: '2026-12-24' } });
    fireEvent.change(form.getByLabelText('Last day'), { target: { value: '2026-12-26' } });
    await user.type(form.getByLabelText(/^Reason/), 'Winter deep clean');
    await user.click(form.getByRole('button', { name: 'Add closure' }));

    expect(await screen.findByText('Closure added: Winter deep clean.')).toBeTruthy();
    const list = within(await screen.findByRole('list', { name: 'Closures' }));
    expect(list.getByText('Winter deep clean')).toBeTruthy();

    await user.click(list.getByRole('button', { name: 'Remove the closure Winter deep clean' }));
    const dialog = within(screen.getByRole('dialog', { name: 'Remove the closure “Winter deep clean”?' }));
    await user.click(dialog.getByRole('button', { name: 'Remove closure' }));

    expect(await screen.findByText(/Closure removed: Winter deep clean\./)).toBeTruthy();
    expect(await screen.findByText('No closures coming up')).toBeTruthy();
  });

  it('refuses a closure whose last day is before its first, under the field, without asking the server', async () => {
    const { calls } = fakeServer(noHours);
    const user = renderPage();

    const form = within(await screen.findByRole('form', { name: 'Add a closure' }));
    fireEvent.change(form.getByLabelText('First day'), { target: { value: '2026-12-26' } });
    fireEvent.change(form.getByLabelText('Last day'), { target: { value: '2026-12-24' } });
    await user.click(form.getByRole('button', { name: 'Add closure' }));

    expect(await form.findByText('The last day cannot be before the first day.')).toBeTruthy();
    expect(form.getByText('Say why the shop is closed, for example “Winter deep clean”.')).toBeTruthy();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
  });
});
