import type { UsageGrouping, UsageReport, User } from '@chuckkey/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter, Outlet, Route, Routes } from 'react-router-dom';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import UsageRoute from './usage';

beforeAll(() => {
  // jsdom lays nothing out; the charts only need the observer to exist.
  globalThis.ResizeObserver ??= class {
    observe() {}
    unobserve() {}
    disconnect() {}
  };
});

afterEach(() => {
  vi.unstubAllGlobals();
});

const admin: User = { id: '00000000-0000-4000-8000-0000000000e1', email: 'wren.admin@example.org', name: 'Wren Tallis', role: 'admin' };

function report(groupBy: UsageGrouping, from: string, to: string): UsageReport {
  const base = {
    from,
    to,
    timeZone: 'America/Chicago',
    heatmap: [],
    reservations: { made: 0, used: 0, noShows: 0, cancelled: 0 },
    denials: [],
    trainingsInDemand: [],
    signOffs: [],
  };
  if (groupBy === 'member') return { ...base, groupBy, rows: [{ memberId: '00000000-0000-4000-8000-0000000000b1', memberName: 'Odile Carver', sessions: 1, hours: 2 }] };
  if (groupBy === 'day') return { ...base, groupBy, rows: [] };
  return {
    ...base,
    groupBy,
    rows: [{ machineId: '00000000-0000-4000-8000-0000000000a1', machineName: 'Engine lathe', sessions: 1, hours: 2, openHours: 80, utilization: 0.025 }],
  };
}

function json(body: unknown, status = 200): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': status < 400 ? 'application/json' : 'application/problem+json' } });
}

/** The server as the page sees it: the shop's details, and the report, refused `failures` times first. */
function stubServer(failures = 0) {
  let refused = 0;
  const fetch = vi.fn(async (input: RequestInfo | URL) => {
    const url = new URL(String(input), 'http://chuckkey.test');
    if (url.pathname === '/api/shop') return json({ name: 'Alder Row Metal Shop', town: 'Fenwick Hollow', timeZone: 'America/Chicago' });
    if (url.pathname === '/api/reports/usage') {
      if (refused < failures) {
        refused += 1;
        return json({ type: 'about:blank', title: 'The report could not be worked out. Try again.', status: 503, code: 'unavailable' }, 503);
      }
      const groupBy = (url.searchParams.get('groupBy') ?? 'machine') as UsageGrouping;
      return json(report(groupBy, url.searchParams.get('from') ?? '', url.searchParams.get('to') ?? ''));
    }
    return json({ type: 'about:blank', title: 'Not found', status: 404, code: 'not_found' }, 404);
  });
  vi.stubGlobal('fetch', fetch);
  return fetch;
}

function renderRoute(user: User = admin, entry = '/usage?from=2026-11-01&to=2026-11-30') {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={[entry]}>
        <Routes>
          <Route element={<Outlet context={{ user }} />}>
            <Route path="/usage" element={<UsageRoute />} />
          </Route>
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
  return userEvent.setup();
}

describe('UsageRoute', () => {
  it('shows that it is loading, then the report of the range in the address', async () => {
    const fetch = stubServer();
    renderRoute();
    expect(screen.getByRole('status').textContent).toContain('Loading');
    const table = await screen.findByRole('table', { name: 'Hours per machine' });
    expect(within(table).getByText('Engine lathe')).toBeTruthy();
    expect(screen.getByText('Showing 1 Nov 2026 – 30 Nov 2026, on the shop\'s calendar.')).toBeTruthy();
    const asked = fetch.mock.calls.map(([input]) => String(input)).filter((url) => url.includes('/reports/usage'));
    expect(asked).toEqual(expect.arrayContaining([expect.stringContaining('from=2026-11-01&to=2026-11-30&groupBy=machine'), expect.stringContaining('groupBy=member')]));
  });

  it("says why the report could not load, and loads it on 'Try again'", async () => {
    stubServer(2);
    const user = renderRoute();
    expect((await screen.findByRole('alert')).textContent).toContain("Couldn't load the usage.");
    await user.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('table', { name: 'Hours per machine' })).toBeTruthy();
  });

  it('asks a preset of the shop calendar when one is pressed', async () => {
    const fetch = stubServer();
    const user = renderRoute();
    await screen.findByRole('table', { name: 'Hours per machine' });
    await user.click(screen.getByRole('button', { name: 'This year' }));
    await vi.waitFor(() => expect(fetch.mock.calls.some(([input]) => /from=\d{4}-01-01&/.test(String(input)))).toBe(true));
  });

  it('tells a member the review is for admins, without asking the server for it', () => {
    const fetch = stubServer();
    renderRoute({ ...admin, role: 'member' });
    expect(screen.getByRole('heading', { name: "You don't have access to the usage review" })).toBeTruthy();
    expect(fetch.mock.calls.some(([input]) => String(input).includes('/reports/usage'))).toBe(false);
  });
});
