import type { CribCheckout } from '@chuckkey/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '../../../lib/query-client';
import { CribCheckoutsReturnDialog } from './crib-checkouts-return-dialog';

// jsdom has no modal dialogs; the return form only needs the dialog to open.
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

const checkout: CribCheckout = {
  id: '00000000-0000-4000-8000-0000000000d1',
  itemId: '00000000-0000-4000-8000-0000000000d2',
  itemKind: 'tool',
  itemName: 'Dial bore gauge 35–60 mm',
  memberId: '00000000-0000-4000-8000-0000000000d3',
  memberName: 'Aurelio Penwright',
  quantity: 1,
  checkedOutAt: '2026-12-02T15:00:00.000Z',
  dueAt: '2026-12-02T23:00:00.000Z',
  returnedAt: null,
  returnCondition: null,
  returnNote: null,
  unitPriceCents: null,
};

function fakeServer(answer: { status: number; body: unknown }) {
  const sent: unknown[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init: RequestInit = {}) => {
      const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
      if (input.endsWith('/auth/csrf')) return json(200, { token: 'test-token' });
      if (init.method === 'POST' && input.endsWith(`/crib/checkouts/${checkout.id}/return`)) {
        sent.push(JSON.parse(String(init.body)));
        return json(answer.status, answer.body);
      }
      return json(404, { type: '/problems/route_not_found', title: 'Not found', status: 404, code: 'route_not_found' });
    }),
  );
  return { sent };
}

function renderDialog(onReturned = vi.fn()) {
  render(
    <QueryClientProvider client={createQueryClient()}>
      <CribCheckoutsReturnDialog checkout={checkout} onClose={vi.fn()} onReturned={onReturned} />
    </QueryClientProvider>,
  );
  return { user: userEvent.setup(), onReturned };
}

describe('CribCheckoutsReturnDialog', () => {
  it('starts at good, warns that damaged takes the tool out of circulation, and sends the condition with the note', async () => {
    const returned = { ...checkout, returnedAt: '2026-12-02T18:00:00.000Z', returnCondition: 'damaged', returnNote: 'Dial glass cracked.' };
    const { sent } = fakeServer({ status: 200, body: returned });
    const { user, onReturned } = renderDialog();

    expect(screen.getByRole('radio', { name: /^Good/ })).toHaveProperty('checked', true);
    expect(screen.queryByText(/goes out of circulation: nobody can check it out/)).toBeNull();
    await user.click(screen.getByRole('radio', { name: /^Damaged/ }));
    expect(screen.getByText(`${checkout.itemName} goes out of circulation: nobody can check it out until an admin puts it back.`)).toBeTruthy();
    await user.type(screen.getByRole('textbox', { name: /^Note/ }), 'Dial glass cracked.');
    await user.click(screen.getByRole('button', { name: 'Record return' }));

    await vi.waitFor(() => expect(onReturned).toHaveBeenCalledWith(returned));
    expect(sent).toEqual([{ condition: 'damaged', note: 'Dial glass cracked.' }]);
  });

  it('says in words when someone else recorded the return first', async () => {
    // RFC 9110 §15.5.10: 409 Conflict, the checkout is no longer in a state to be returned.
    fakeServer({ status: 409, body: { type: '/problems/already_returned', title: 'Already returned', status: 409, code: 'already_returned' } });
    const { user, onReturned } = renderDialog();

    await user.click(screen.getByRole('button', { name: 'Record return' }));
    expect(await screen.findByText('Someone has recorded this return already. Close this and look at the list again.')).toBeTruthy();
    expect(onReturned).not.toHaveBeenCalled();
  });
});
