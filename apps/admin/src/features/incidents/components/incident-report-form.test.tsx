import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '../../../lib/query-client';
import { IncidentReportForm } from './incident-report-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

function fakeServer() {
  const writes: string[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string, init: RequestInit = {}) => {
      const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
      if (init.method && init.method !== 'GET') writes.push(input);
      if (input.endsWith('/auth/csrf')) return json(200, { token: 'test-token' });
      if (input.endsWith('/machines') || input.endsWith('/areas')) return json(200, []);
      return json(404, { type: '/problems/route_not_found', title: 'Not found', status: 404, code: 'route_not_found' });
    }),
  );
  return { writes };
}

function renderForm() {
  render(
    <QueryClientProvider client={createQueryClient()}>
      <IncidentReportForm timeZone="America/Chicago" />
    </QueryClientProvider>,
  );
  return userEvent.setup({ applyAccept: false });
}

const png = (name: string) => new File([new Uint8Array([0x89, 0x50, 0x4e, 0x47])], name, { type: 'image/png' });

describe('IncidentReportForm', () => {
  it('shows each mistake under its own field and sends nothing', async () => {
    const { writes } = fakeServer();
    const user = renderForm();

    await user.click(screen.getByRole('button', { name: 'Send report' }));

    expect(await screen.findByText('Say what happened, in a sentence or two.')).toBeTruthy();
    expect(screen.getByLabelText('What happened?').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText('Say where it happened: choose an area or describe the place.')).toBeTruthy();
    expect(screen.getByText('Choose injury, near miss or damage.')).toBeTruthy();
    expect(writes).toEqual([]);
  });

  it('states the photo limits, previews chosen photos, refuses other files and a sixth photo, and removes one on request', async () => {
    fakeServer();
    const user = renderForm();
    expect(screen.getByText(/Up to 5 photos, JPEG or PNG, each at most 10 MB\./)).toBeTruthy();

    await user.upload(screen.getByLabelText('Add photos'), [png('1.png'), png('2.png'), new File(['hello'], 'notes.txt', { type: 'text/plain' })]);

    expect(await screen.findByText('notes.txt is not a JPEG or PNG picture.')).toBeTruthy();
    const chosen = screen.getByRole('list', { name: 'Chosen photos' });
    expect(await within(chosen).findByRole('img', { name: 'Photo 2: 2.png' })).toBeTruthy();

    await user.upload(screen.getByLabelText('Add photos'), [png('3.png'), png('4.png'), png('5.png'), png('6.png')]);
    expect(await screen.findByText('6.png was left out: a report takes at most 5 photos.')).toBeTruthy();
    expect(within(chosen).getAllByRole('listitem')).toHaveLength(5);

    await user.click(screen.getByRole('button', { name: 'Remove photo 1 (1.png)' }));
    expect(within(chosen).getAllByRole('listitem')).toHaveLength(4);
    expect(within(chosen).queryByRole('img', { name: /1\.png/ })).toBeNull();
  });
});
