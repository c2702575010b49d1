import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ActionsTh, SortableThs, Table, THead, Tr } from './table';

const columns = [
  { field: 'member', label: 'Member' },
  { field: 'due', label: 'Due' },
] as const;

describe('the sortable headings of a table', () => {
  it('marks only the sorted column, by aria-sort, and names the clicked column', async () => {
    const user = userEvent.setup();
    const onSort = vi.fn();
    render(
      <Table caption="Checked-out tools">
        <THead>
          <Tr>
            <SortableThs columns={columns} sortedField="due" order="desc" onSort={onSort} />
            <ActionsTh />
          </Tr>
        </THead>
      </Table>,
    );

    // WAI-ARIA 1.2, aria-sort: "descending" on the sorted column header, "none" on the others.
    const headers = screen.getAllByRole('columnheader');
    expect(headers.map((header) => header.getAttribute('aria-sort'))).toEqual(['none', 'descending', null]);
    // The actions heading is read out but not shown.
    expect(headers[2]?.textContent).toBe('Actions');

    await user.click(screen.getByRole('button', { name: 'Member' }));
    expect(onSort).toHaveBeenCalledWith('member');
  });
});
