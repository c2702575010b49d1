import { can } from '@chuckkey/core';
import type { ReactNode } from 'react';
import { PageHeading } from '../../components/ui/page-heading';
import { CribTabs } from '../../features/crib/components/crib-tabs';
import { useSignedInUser } from '../signed-in-user';
import { NoAccess } from './no-access';

interface CribPageProps {
  title: string;
  description: string;
  /** The part of the crib the page is about. */
  children: ReactNode;
}

/**
 * A part of the crib: its tabs, then the heading. The crib is run by admins alone; anyone else
 * is told the page is not for them.
 */
export function CribPage({ title, description, children }: CribPageProps) {
  const user = useSignedInUser();
  if (!can(user.role, 'manage:crib:any')) return <NoAccess area="the crib" />;
  return (
    <>
      <CribTabs />
      <PageHeading title={title} description={description} />
      {children}
    </>
  );
}
