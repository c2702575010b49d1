import type { ReactNode } from 'react';
import { Icon } from '../icon';
import { fitNameScale, nameplateLook, nameplateSize, type NameplateSize, type NameplateState } from './nameplate-looks';

export interface NameplateProps {
  name: string;
  state: NameplateState;
  detail: ReactNode;
  /** At the end of the detail line, such as a running session's elapsed time. */
  aside?: ReactNode;
  size?: NameplateSize;
  /** Two lets a long detail (a tag-out's reason) wrap once instead of being cut short. */
  detailLines?: 1 | 2;
  className?: string;
}

/** A machine as its riveted plate: name in the band, state word and icon large, one line of detail. */
export function Nameplate({ name, state, detail, aside, size = 'md', detailLines = 1, className }: NameplateProps) {
  const look = nameplateLook(state);
  const sized = nameplateSize(size);
  const rivet = <span aria-hidden="true" className={`shrink-0 rounded-full bg-current opacity-60 ${sized.rivet}`} />;

  return (
    <div className={`flex min-w-0 flex-col overflow-hidden ${sized.plate} ${look.plate} ${className ?? ''}`}>
      <div className={`flex items-center ${sized.band} ${look.band}`}>
        {rivet}
        {/* CSS capitals keep the name spelled normally for screen readers. */}
        <span
          className={`min-w-0 flex-1 truncate text-center font-bold uppercase ${sized.name}`}
          // The line keeps its height whatever the name's size, so the plates of a board line up.
          style={size === 'fit' ? { fontSize: `${0.92 * fitNameScale(name)}em`, lineHeight: 1.3 / fitNameScale(name) } : undefined}
        >
          {name}
        </span>
        {rivet}
      </div>
      <div className={`flex min-w-0 flex-col ${sized.body}`}>
        <p className={`flex min-w-0 items-center font-bold ${sized.state}`}>
          <Icon name={look.icon} className={sized.icon} />
          <span className="min-w-0 truncate">{look.label}</span>
        </p>
        {/* A plate without detail keeps its line, so plates of one board line up. */}
        <p className={`flex min-w-0 items-baseline gap-[0.5em] ${sized.detail}`}>
          <span className={`min-w-0 flex-1 ${detailLines === 2 ? 'line-clamp-2 break-words' : 'truncate'}`}>{detail || '\u00a0'}</span>
          {aside ? <span className="shrink-0 font-bold tabular-nums">{aside}</span> : null}
        </p>
      </div>
    </div>
  );
}
