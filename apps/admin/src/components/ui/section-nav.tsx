import { NavLink } from 'react-router-dom';
import { cn } from './cn';

export interface SectionNavItem {
  label: string;
  to: string;
  end?: boolean;
}

/** The parts of one area of the app (People, Setup), as links: each part has its own address. */
export function SectionNav({ label, items }: { label: string; items: SectionNavItem[] }) {
  return (
    <nav aria-label={label} className="-mx-4 overflow-x-auto px-4">
      <ul className="flex min-w-max gap-1 border-b border-neutral-300">
        {items.map((item) => (
          <li key={item.to}>
            <NavLink
              to={item.to}
              end={item.end}
              className={({ isActive }) =>
                cn(
                  '-mb-px flex min-h-11 items-center border-b-4 px-3 font-bold',
                  isActive ? 'border-brand text-brand' : 'border-transparent text-neutral-800 hover:border-neutral-400',
                )
              }
            >
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
