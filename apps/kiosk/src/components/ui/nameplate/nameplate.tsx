import { Icon } from '../icon';
import { nameplateLook, nameplateSize, type NameplateSize, type NameplateState } from './nameplate-looks';

export interface NameplateProps {
  name: string;
  state: NameplateState;
  detail: string;
  size?: NameplateSize;
  className?: string;
}

/** A machine as its riveted plate: name in the band, state word and icon large, one line of detail. */
export function Nameplate({ name, state, detail, size = 'md', className }: NameplateProps) {
  const look = nameplateLook(state);
  const sized = nameplateSize(size);
  const rivet = <span aria-hidden="true" className={`shrink-0 rounded-full bg-current opacity-60 ${sized.rivet}`} />;

  return (
    <div className={`flex min-w-0 flex-col overflow-hidden ${sized.plate} ${look.plate} ${className ?? ''}`}>
      <div className={`flex items-center ${sized.band} ${look.band}`}>
        {rivet}
        {/* CSS capitals keep the name spelled normally for screen readers. */}
        <span className={`min-w-0 flex-1 truncate text-center font-bold tracking-[0.12em] uppercase ${sized.name}`}>
          {name}
        </span>
        {rivet}
      </div>
      <div className={`flex min-w-0 flex-col ${sized.body}`}>
        <p className={`flex items-center leading-tight font-bold ${sized.state}`}>
          <Icon name={look.icon} className={sized.icon} />
          <span>{look.label}</span>
        </p>
        <p className={`truncate ${sized.detail}`}>{detail}</p>
      </div>
    </div>
  );
}
