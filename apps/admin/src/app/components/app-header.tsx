import { can, roleLabels, type Permission, type User } from '@chuckkey/core';
import { useId, useRef, useState } from 'react';
import { Link, NavLink } from 'react-router-dom';
import { Button } from '../../components/ui/button';
import { cn } from '../../components/ui/cn';
import { CloseIcon, MenuIcon } from '../../components/ui/icons';
import { paths } from '../../config/paths';

interface NavItem {
  label: string;
  to: string;
  end?: boolean;
  permission?: Permission;
}

// Only pages that exist are listed; the order follows the shop's own: the floor first, admin work last.
const navItems: NavItem[] = [
  { label: 'Shop floor', to: paths.home.getHref(), end: true },
  { label: 'Reserve', to: paths.reserve.getHref() },
  { label: 'My record', to: paths.myRecord.getHref() },
  { label: 'Profile', to: paths.profile.getHref() },
  { label: 'Teach', to: paths.teach.getHref(), permission: 'create:sign-off:any' },
  { label: 'People', to: paths.people.getHref(), permission: 'read:member:any' },
  { label: 'Crib', to: paths.crib.getHref(), permission: 'manage:crib:any' },
  // Instructors see Upkeep too: they clear the tag-outs they set and mark maintenance done.
  { label: 'Upkeep', to: paths.upkeep.getHref(), permission: 'read:tag-out:any' },
  { label: 'Usage', to: paths.usage.getHref(), permission: 'read:report:any' },
  { label: 'Setup', to: paths.setup.getHref(), permission: 'manage:machine:any' },
  { label: 'Outbox', to: paths.outbox.getHref(), permission: 'read:outbox:any' },
];

interface AppHeaderProps {
  user: User;
  shopName: string | undefined;
  signingOut: boolean;
  onSignOut: () => void;
}

export function AppHeader({ user, shopName, signingOut, onSignOut }: AppHeaderProps) {
  const [menuOpen, setMenuOpen] = useState(false);
  const menuId = useId();
  const menuButton = useRef<HTMLButtonElement>(null);
  const items = navItems.filter((item) => !item.permission || can(user.role, item.permission));

  return (
    <header className="border-b border-neutral-300 bg-white">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-2">
        <Link to={paths.home.getHref()} className="flex min-h-11 flex-col justify-center rounded-md">
          <span className="font-bold tracking-[0.2em] text-brand uppercase">Chuckkey</span>
          {shopName && <span className="text-sm text-neutral-700">{shopName}</span>}
        </Link>

        <button
          ref={menuButton}
          type="button"
          aria-expanded={menuOpen}
          aria-controls={menuId}
          onClick={() => setMenuOpen((open) => !open)}
          className="ml-auto inline-flex min-h-11 items-center gap-2 rounded-md border border-neutral-500 px-3 font-bold md:hidden"
        >
          {menuOpen ? <CloseIcon /> : <MenuIcon />}
          Menu
        </button>

        <div
          id={menuId}
          onKeyDown={(event) => {
            if (event.key === 'Escape' && menuOpen) {
              setMenuOpen(false);
              menuButton.current?.focus();
            }
          }}
          className={cn(
            menuOpen ? 'flex' : 'hidden',
            'w-full flex-col gap-3 pb-3 md:flex md:w-auto md:flex-1 md:flex-row md:flex-wrap md:items-center md:gap-x-3 md:pb-0',
          )}
        >
          <nav aria-label="Main">
            <ul className="flex flex-col gap-1 md:flex-row md:flex-wrap">
              {items.map((item) => (
                <li key={item.to}>
                  <NavLink
                    to={item.to}
                    end={item.end}
                    onClick={() => setMenuOpen(false)}
                    className={({ isActive }) =>
                      cn(
                        'flex min-h-11 items-center rounded-md px-3 font-bold whitespace-nowrap md:min-h-10 md:px-2',
                        isActive
                          ? 'bg-brand-soft text-brand shadow-[inset_0_-3px_0_var(--color-brand)]'
                          : 'text-neutral-800 hover:bg-neutral-100',
                      )
                    }
                  >
                    {item.label}
                  </NavLink>
                </li>
              ))}
            </ul>
          </nav>
          <div className="flex flex-wrap items-center gap-3 border-t border-neutral-200 pt-3 md:ml-auto md:border-0 md:pt-0">
            <p className="flex flex-col leading-tight">
              <span className="font-bold text-neutral-900">{user.name}</span>
              <span className="text-sm text-neutral-700">{roleLabels[user.role]}</span>
            </p>
            <Button variant="secondary" onClick={onSignOut} pending={signingOut}>
              Sign out
            </Button>
          </div>
        </div>
      </div>
    </header>
  );
}
