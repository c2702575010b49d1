import { useId, type ReactNode } from 'react';
import { Bar, BarChart, CartesianGrid, Tooltip, XAxis, YAxis } from 'recharts';

export interface ChartBar {
  key: string;
  label: string;
  value: number;
}

interface BarChartFigureProps {
  /** The chart in words, its main figure first; the table beside it carries every value. */
  caption: ReactNode;
  bars: readonly ChartBar[];
  /** How a value reads in the tooltip and on the axis: "12.5 h", "7". */
  formatValue: (value: number) => string;
  /** What the bars count, for the tooltip: "Hours", "Refused scans". */
  valueName: string;
}

const barColour = 'var(--color-brand)';
// Long names (machines, trainings) stay readable on a phone when they run down the side.
const BAR_ROW = 34;
const AXIS_ROOM = 48;

/**
 * Horizontal bars sized to the width of their box, one row each, so a phone shows them as well
 * as a desk screen does. The drawing is left to sighted readers: screen readers get the caption
 * and the table beside it, which say the same in full.
 */
export function BarChartFigure({ caption, bars, formatValue, valueName }: BarChartFigureProps) {
  const captionId = useId();
  const height = Math.max(120, bars.length * BAR_ROW + AXIS_ROOM);
  return (
    <figure aria-labelledby={captionId} className="flex min-w-0 flex-col gap-2">
      <div aria-hidden="true" className="w-full min-w-0">
        <BarChart
          responsive
          layout="vertical"
          data={[...bars]}
          style={{ width: '100%', height }}
          margin={{ top: 4, right: 16, bottom: 4, left: 4 }}
          accessibilityLayer={false}
        >
          <CartesianGrid horizontal={false} stroke="#d4d4d4" />
          <XAxis type="number" tickFormatter={(value: number) => formatValue(value)} allowDecimals={false} stroke="#525252" />
          <YAxis type="category" dataKey="label" width={112} stroke="#525252" tick={{ fontSize: 13 }} interval={0} />
          <Tooltip formatter={(value) => [formatValue(Number(value)), valueName]} cursor={{ fill: 'var(--color-brand-soft)' }} />
          <Bar dataKey="value" name={valueName} fill={barColour} isAnimationActive={false} radius={[0, 3, 3, 0]} />
        </BarChart>
      </div>
      <figcaption id={captionId} className="text-sm text-neutral-700">
        {caption}
      </figcaption>
    </figure>
  );
}
