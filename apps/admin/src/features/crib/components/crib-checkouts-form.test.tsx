import type { CribItem } from '@chuckkey/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '../../../lib/query-client';
import { CribCheckoutsForm, type CheckoutMemberSearchProps } from './crib-checkouts-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

const member = { id: '00000000-0000-4000-8000-0000000000a1', name: 'Marisol Thorne', email: 'marisol.thorne@example.org' };

const item = (fields: Partial<CribItem>): CribItem => ({
  id: '00000000-0000-4000-8000-0000000000b1',
  kind: 'tool',
  name: 'Outside micrometer 1–2 in',
  binLocation: 'A4',
  assetTag: 'OM-12',
  serialNumber: null,
  condition: 'good',
  inCirculation: true,
  loanPeriodHours: null,
  unit: null,
  stock: null,
  reorderLevel: null,
  priceCents: null,
  available: true,
  hasPhoto: false,
  ...fields,
});

const micrometer = item({});
const lentOut = item({ id: '00000000-0000-4000-8000-0000000000b2', name: 'Boring bar 12 mm', assetTag: 'BB-03', available: false });
const inserts = item({
  id: '00000000-0000-4000-8000-0000000000b3',
  kind: 'consumable',
  name: 'Turning inserts CNMG',
  assetTag: null,
  condition: null,
  binLocation: null,
  unit: 'each',
  stock: 4,
  priceCents: 650,
});

interface Call {
  method: string;
  path: string;
  body: unknown;
}

/** The crib as the form sees it: a micrometer on the shelf, a boring bar out, four inserts; every call written down. */
function fakeServer() {
  const calls: Call[] = [];
  const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init: RequestInit = {}) => {
      const method = init.method ?? 'GET';
      const path = input.replace(/^\/api/, '');
      const body = typeof init.body === 'string' ? JSON.parse(init.body) : undefined;
      calls.push({ method, path, body });
      if (path === '/auth/csrf') return json(200, { token: 'test-token' });
      if (method === 'GET' && path === '/crib/items') return json(200, [micrometer, lentOut, inserts]);
      if (method === 'POST' && path === '/crib/checkouts' && body.itemId === inserts.id) {
        return json(409, { type: '/problems/short_stock', title: 'There is not enough of this in stock.', status: 409, code: 'short_stock' });
      }
      if (method === 'POST' && path === '/crib/checkouts') {
        return json(201, {
          id: '00000000-0000-4000-8000-0000000000c1',
          itemId: body.itemId,
          itemKind: 'tool',
          itemName: micrometer.name,
          memberId: body.memberId,
          memberName: member.name,
          quantity: 1,
          checkedOutAt: '2026-12-02T15:00:00.000Z',
          dueAt: '2026-12-03T03:00:00.000Z',
          returnedAt: null,
          returnCondition: null,
          returnNote: null,
          unitPriceCents: null,
        });
      }
      return json(404, { type: '/problems/route_not_found', title: 'Not found', status: 404, code: 'route_not_found' });
    }),
  );
  return { calls };
}

function PickMarisol({ onChoose, error }: CheckoutMemberSearchProps) {
  return (
    <>
      <button type="button" onClick={() => onChoose(member)}>
        Choose {member.name}
      </button>
      {error && <p>{error}</p>}
    </>
  );
}

function renderForm() {
  render(
    <QueryClientProvider client={createQueryClient()}>
      <CribCheckoutsForm timeZone="America/Chicago" MemberSearch={PickMarisol} />
    </QueryClientProvider>,
  );
  return userEvent.setup();
}

describe('CribCheckoutsForm', () => {
  it('offers only what is on the shelf and, for a tool, sends a count of one and shows the due time the server answered on the shop clock', async () => {
    const { calls } = fakeServer();
    const user = renderForm();

    await user.click(screen.getByRole('button', { name: `Choose ${member.name}` }));
    const select = await screen.findByRole('combobox', { name: /^Item/ });
    const offered = [...select.querySelectorAll('option')].map((option) => option.textContent);
    expect(offered).toEqual(['Choose an item', 'Outside micrometer 1–2 in · OM-12 · bin A4', 'Turning inserts CNMG · 4 each in stock']);

    await user.selectOptions(select, micrometer.id);
    expect(screen.queryByRole('spinbutton')).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Check out' }));

    // IANA tz database via Intl: 03:00 UTC on 3 December is 21:00 on 2 December in Chicago (CST, UTC−6).
    const done = await screen.findByRole('status');
    expect(done.textContent).toContain(`${micrometer.name} is out to ${member.name}, due back`);
    expect(done.textContent).toMatch(/Dec 2, 2026.*9:00\s?PM/);
    expect(calls.find((call) => call.method === 'POST')?.body).toEqual({ memberId: member.id, itemId: micrometer.id, quantity: 1 });
  });

  it('asks how many of a consumable, and puts short stock under the count in words', async () => {
    const { calls } = fakeServer();
    const user = renderForm();

    await user.click(screen.getByRole('button', { name: `Choose ${member.name}` }));
    await user.selectOptions(await screen.findByRole('combobox', { name: /^Item/ }), inserts.id);
    const count = screen.getByRole('spinbutton', { name: /^How many \(each\)/ });
    await user.clear(count);
    await user.type(count, '6');
    await user.click(screen.getByRole('button', { name: 'Check out' }));

    expect(await screen.findByText('There is not that much of it in stock. Nothing was taken; choose a smaller count.')).toBeTruthy();
    expect(calls.find((call) => call.method === 'POST')?.body).toEqual({ memberId: member.id, itemId: inserts.id, quantity: 6 });
  });

  it('refuses to send without a member or an item, saying which is missing', async () => {
    const { calls } = fakeServer();
    const user = renderForm();

    await screen.findByRole('combobox', { name: /^Item/ });
    await user.click(screen.getByRole('button', { name: 'Check out' }));
    expect(await screen.findByText('Choose the item.')).toBeTruthy();
    expect(screen.getByText('Choose the member.')).toBeTruthy();
    expect(calls.some((call) => call.method === 'POST')).toBe(false);
  });
});
