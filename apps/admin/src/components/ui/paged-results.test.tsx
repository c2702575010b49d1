import { QueryClient, QueryClientProvider, keepPreviousData, useQuery } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactNode } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../lib/api-client';
import { PagedResults } from './paged-results';

interface Page {
  items: { id: string; name: string }[];
  total: number;
}

interface MachinesProps {
  load: (page: number) => Promise<Page>;
  page: number;
  onPageChange: (page: number) => void;
  pastEndNote?: ReactNode;
}

function Machines({ load, page, onPageChange, pastEndNote }: MachinesProps) {
  const query = useQuery({ queryKey: ['machines', page], queryFn: () => load(page), retry: false, placeholderData: keepPreviousData });
  return (
    <PagedResults
      query={query}
      loadingLabel="Loading machines…"
      what="the machines"
      page={page}
      pageSize={2}
      nouns={['machine', 'machines']}
      onPageChange={onPageChange}
      pastEndNote={pastEndNote}
      empty={<p>No machines yet</p>}
    >
      {(items) => (
        <ul aria-label="Machines">
          {items.map((item) => (
            <li key={item.id}>{item.name}</li>
          ))}
        </ul>
      )}
    </PagedResults>
  );
}

function renderList(props: MachinesProps) {
  const client = new QueryClient();
  const view = (next: MachinesProps) => (
    <QueryClientProvider client={client}>
      <Machines {...next} />
    </QueryClientProvider>
  );
  const result = render(view(props));
  return { ...result, rerenderWith: (next: MachinesProps) => result.rerender(view(next)) };
}

describe('a paged list', () => {
  it('says it is loading, then shows the page and where it stands among the rest', async () => {
    renderList({ load: async () => ({ items: [{ id: 'm1', name: 'Lathe 1' }, { id: 'm2', name: 'Lathe 2' }], total: 3 }), page: 1, onPageChange: () => {} });

    expect(screen.getByRole('status').textContent).toBe('Loading machines…');
    expect((await screen.findByRole('list', { name: 'Machines' })).textContent).toBe('Lathe 1Lathe 2');
    expect(screen.getByRole('navigation', { name: 'Pages of machines' }).textContent).toContain('1–2 of 3 machines · page 1 of 2');
  });

  it('says what could not be loaded, and loads again on Try again', async () => {
    const user = userEvent.setup();
    const load = vi
      .fn<(page: number) => Promise<Page>>()
      .mockRejectedValueOnce(new ApiError({ status: 500, code: 'http_500', title: 'The server had a problem. Try again in a moment.' }))
      .mockResolvedValueOnce({ items: [{ id: 'm1', name: 'Mill 1' }], total: 1 });
    renderList({ load, page: 1, onPageChange: () => {} });

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain("Couldn't load the machines.");
    expect(alert.textContent).toContain('The server had a problem. Try again in a moment.');

    await user.click(screen.getByRole('button', { name: 'Try again' }));
    expect((await screen.findByRole('list', { name: 'Machines' })).textContent).toBe('Mill 1');
  });

  it('shows the page’s own words when there is nothing at all, and no pages', async () => {
    renderList({ load: async () => ({ items: [], total: 0 }), page: 1, onPageChange: () => {} });

    expect(await screen.findByText('No machines yet')).toBeTruthy();
    expect(screen.queryByRole('navigation')).toBeNull();
  });

  it('on a page past the end, says why and leads back to the first page', async () => {
    const user = userEvent.setup();
    const onPageChange = vi.fn();
    renderList({ load: async () => ({ items: [], total: 3 }), page: 4, onPageChange, pastEndNote: 'The list is shorter than it was.' });

    expect(await screen.findByText('This page is empty')).toBeTruthy();
    expect(screen.getByText('The list is shorter than it was.')).toBeTruthy();
    expect(screen.queryByText('No machines yet')).toBeNull();

    await user.click(screen.getByRole('button', { name: 'Go to the first page' }));
    expect(onPageChange).toHaveBeenCalledWith(1);
  });

  it('moves between pages with the page buttons', async () => {
    const user = userEvent.setup();
    const onPageChange = vi.fn();
    renderList({ load: async () => ({ items: [{ id: 'm3', name: 'Saw' }], total: 3 }), page: 2, onPageChange });

    await user.click(await screen.findByRole('button', { name: 'Previous page' }));
    expect(onPageChange).toHaveBeenCalledWith(1);
  });

  it('keeps the last page on screen, dimmed and marked busy, until the next one arrives', async () => {
    const load = (page: number) => (page === 1 ? Promise.resolve({ items: [{ id: 'm1', name: 'Lathe 1' }], total: 2 }) : new Promise<Page>(() => {}));
    const { rerenderWith } = renderList({ load, page: 1, onPageChange: () => {} });
    const list = await screen.findByRole('list', { name: 'Machines' });
    expect(list.parentElement?.getAttribute('aria-busy')).toBe('false');

    rerenderWith({ load, page: 2, onPageChange: () => {} });

    expect(screen.getByRole('list', { name: 'Machines' }).textContent).toBe('Lathe 1');
    expect(screen.getByRole('list', { name: 'Machines' }).parentElement?.getAttribute('aria-busy')).toBe('true');
  });
});
