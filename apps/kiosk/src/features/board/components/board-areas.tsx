import type { BoardArea } from '@chuckkey/core';
import { useRef } from 'react';
import { Nameplate } from '@/components/ui/nameplate';
import { useElementSize } from '../hooks/use-element-size';
import { boardLayout } from '../utils/board-layout';
import { plateText } from '../utils/board-text';

interface BoardAreasProps {
  areas: readonly BoardArea[];
  /** The server's clock as this screen reckons it, ticking. */
  now: Date;
  timeZone: string;
}

/** One column per shop area, its nameplates stacked, all sized to fit the screen together. */
export function BoardAreas({ areas, now, timeZone }: BoardAreasProps) {
  const ref = useRef<HTMLDivElement>(null);
  const size = useElementSize(ref);
  const layout = boardLayout({ ...size, areas: areas.map((area) => area.machines.length) });

  return (
    <div ref={ref} className="min-h-0 flex-1 overflow-hidden px-[2.5vw] py-[1.5vh]">
      {areas.length === 0 ? (
        <p className="flex h-full items-center justify-center text-center text-board-message font-bold text-balance">
          No machines yet. They appear here as soon as an admin adds them to the shop.
        </p>
      ) : size.width > 0 ? (
        <div className="flex h-full items-start" style={{ gap: layout.areaGap }}>
          {areas.map((area, index) => {
            const files = layout.columns[index] ?? 1;
            return (
              <section key={area.id} aria-label={area.name} className="min-w-0" style={{ flex: `${files} 1 0` }}>
                <h2
                  className="truncate font-bold"
                  style={{ fontSize: layout.headingFontSize, lineHeight: 1.25, marginBottom: layout.gap }}
                >
                  {area.name}
                </h2>
                <ul
                  className="grid"
                  style={{
                    gridTemplateColumns: `repeat(${files}, minmax(0, 1fr))`,
                    gridAutoRows: layout.plateHeight,
                    gap: layout.gap,
                    fontSize: layout.plateFontSize,
                  }}
                >
                  {area.machines.map((machine) => {
                    const text = plateText(machine, now, timeZone);
                    return (
                      <li key={machine.id} className="grid min-w-0">
                        <Nameplate
                          name={machine.name}
                          state={machine.state}
                          detail={text.detail}
                          aside={text.aside}
                          size="fit"
                          detailLines={layout.detailLines}
                        />
                      </li>
                    );
                  })}
                </ul>
              </section>
            );
          })}
        </div>
      ) : null}
    </div>
  );
}
