import type { User } from '@chuckkey/core';
import { render, screen } from '@testing-library/react';
import { Outlet, RouterProvider, createMemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import type { SignedInContext } from '../signed-in-user';
import type { SavedState } from './saved-notice';
import { SetupListPage } from './setup-list-page';

const admin: User = { id: '00000000-0000-4000-8000-000000000001', email: 'ada@example.org', name: 'Ada Admin', role: 'admin' };
const instructor: User = { ...admin, name: 'Ivo Instructor', role: 'instructor' };

function openMachines(user: User, saved?: SavedState) {
  const context: SignedInContext = { user };
  const router = createMemoryRouter(
    [
      {
        element: <Outlet context={context} />,
        children: [
          {
            path: '/setup/machines',
            element: (
              <SetupListPage
                permission="manage:machine:any"
                title="Machines"
                description="Every machine a member needs clearance for."
                addHref="/setup/machines/new"
                addLabel="Add a machine"
              >
                <p>The machines table</p>
              </SetupListPage>
            ),
          },
        ],
      },
    ],
    { initialEntries: [{ pathname: '/setup/machines', state: saved }] },
  );
  return render(<RouterProvider router={router} />);
}

describe('a Setup list page', () => {
  it('shows Setup’s parts, the heading, the way to add one more, and the list', () => {
    openMachines(admin);

    expect(screen.getByRole('navigation', { name: 'Setup' })).toBeTruthy();
    expect(screen.getByRole('heading', { level: 1, name: 'Machines' })).toBeTruthy();
    expect(screen.getByText('Every machine a member needs clearance for.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Add a machine' }).getAttribute('href')).toBe('/setup/machines/new');
    expect(screen.getByText('The machines table')).toBeTruthy();
    expect(screen.queryByRole('status')).toBeNull();
  });

  it('after a form saves, says what was saved and moves focus to it', () => {
    openMachines(admin, { saved: 'Lathe 2 is saved.' });

    const notice = screen.getByRole('status');
    expect(notice.textContent).toBe('Lathe 2 is saved.');
    expect(document.activeElement).toBe(notice);
  });

  it('tells someone who may not manage it that Setup is not for them, and shows none of the list', () => {
    openMachines(instructor);

    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe("You don't have access to Setup");
    expect(screen.queryByRole('navigation', { name: 'Setup' })).toBeNull();
    expect(screen.queryByText('The machines table')).toBeNull();
  });
});
