import type { ReactNode } from 'react';

interface PageHeadingProps {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
}

/** Sets the browser tab's title with the page's heading, so both always say the same thing. */
export function PageHeading({ title, description, actions }: PageHeadingProps) {
  return (
    <header className="flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
      <title>{`${title} · Chuckkey`}</title>
      <div className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold text-neutral-900 md:text-3xl">{title}</h1>
        {description && <div className="max-w-prose text-neutral-700">{description}</div>}
      </div>
      {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
    </header>
  );
}
