import type { UsageHeatmapCell } from '@chuckkey/core';
import { useId } from 'react';
import { gridMax, heatColours, heatGrid, heatLegend, heatLevel, heatTextColours, usedHourSpan, weekdayNames, weekdayShortNames } from '../utils/heatmap';
import { hoursLabel } from '../utils/usage-format';

const tenths = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1 });

function hourHeading(hour: number): string {
  return `${String(hour).padStart(2, '0')}:00`;
}

/**
 * When in the week the machines run: a grid of weekdays by hours of the wall clock. Every cell
 * writes its hours, and the shade only repeats them, so the grid reads without colour and out loud.
 */
export function UsageHeatmap({ cells, timeZone }: { cells: readonly UsageHeatmapCell[]; timeZone: string }) {
  const legendId = useId();
  const grid = heatGrid(cells);
  const max = gridMax(grid);
  const { first, last } = usedHourSpan(grid);
  const hours = Array.from({ length: last - first + 1 }, (_, index) => first + index);
  const legend = heatLegend(max);
  const caption = `Hours of use by weekday and hour, ${timeZone} time`;

  return (
    <div className="flex flex-col gap-3">
      <div role="region" aria-label={caption} tabIndex={0} className="overflow-x-auto rounded-lg border border-neutral-300 bg-white">
        <table className="border-collapse text-center text-sm">
          <caption className="sr-only">
            {caption}
            {first > 0 || last < 23 ? `; hours from ${hourHeading(first)} to ${hourHeading(last)}, the others had no use` : ''}
          </caption>
          <thead>
            <tr>
              <td className="sticky left-0 bg-white" />
              {hours.map((hour) => (
                <th key={hour} scope="col" className="px-1 py-2 font-bold whitespace-nowrap text-neutral-800">
                  {hourHeading(hour)}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {grid.map((row, index) => (
              <tr key={weekdayNames[index]}>
                <th scope="row" className="sticky left-0 bg-white px-2 py-1 text-left font-bold text-neutral-800">
                  <span aria-hidden="true">{weekdayShortNames[index]}</span>
                  <span className="sr-only">{weekdayNames[index]}</span>
                </th>
                {hours.map((hour) => {
                  const value = row[hour] ?? 0;
                  const level = heatLevel(value, max);
                  return (
                    <td
                      key={hour}
                      className="min-w-12 border border-white px-1 py-2 tabular-nums"
                      style={{ backgroundColor: heatColours[level], color: heatTextColours[level] }}
                    >
                      {value > 0 ? (
                        tenths.format(value)
                      ) : (
                        <>
                          <span aria-hidden="true">·</span>
                          <span className="sr-only">none</span>
                        </>
                      )}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="flex flex-col gap-1">
        <p id={legendId} className="text-sm font-bold text-neutral-800">
          Shade (hours of use in the cell)
        </p>
        <ul aria-labelledby={legendId} className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-neutral-800">
          {legend.map((step) => (
            <li key={step.level} className="flex items-center gap-2">
              <span aria-hidden="true" className="inline-block size-5 rounded border border-neutral-400" style={{ backgroundColor: heatColours[step.level] }} />
              {step.level === 0 ? 'none' : `over ${hoursLabel(step.above)} to ${hoursLabel(step.upTo)}`}
            </li>
          ))}
        </ul>
      </div>
    </div>
  );
}
