import { can, type Permission } from '@chuckkey/core';
import type { ReactNode } from 'react';
import { ButtonLink } from '../../components/ui/button';
import { PlusIcon } from '../../components/ui/icons';
import { PageHeading } from '../../components/ui/page-heading';
import { useSignedInUser } from '../signed-in-user';
import { NoAccess } from './no-access';
import { SavedNotice } from './saved-notice';
import { SetupNav } from './setup-nav';

interface SetupListPageProps {
  /** Who may manage what the page lists; anyone else is told the page is not for them. */
  permission: Permission;
  title: string;
  description: string;
  addHref: string;
  addLabel: string;
  /** The list itself. */
  children: ReactNode;
}

/**
 * A part of Setup that lists what the shop has, with the way to add one more. Its forms come
 * back here when they save, and the notice says what was saved.
 */
export function SetupListPage({ permission, title, description, addHref, addLabel, children }: SetupListPageProps) {
  const user = useSignedInUser();
  if (!can(user.role, permission)) return <NoAccess area="Setup" />;
  return (
    <>
      <SetupNav user={user} />
      <PageHeading
        title={title}
        description={description}
        actions={
          <ButtonLink to={addHref} variant="primary">
            <PlusIcon />
            {addLabel}
          </ButtonLink>
        }
      />
      <SavedNotice />
      {children}
    </>
  );
}
