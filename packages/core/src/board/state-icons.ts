import type { BoardState } from './schemas';

/**
 * How every line icon of the station, the board and the web app is drawn: a 24 × 24 grid, stroked
 * in the text colour with round caps and joins, no fill, and hidden from screen readers (the
 * state's word beside it is what they read). Spread onto the `<svg>` element.
 */
export const lineIconSvg = {
  viewBox: '0 0 24 24',
  fill: 'none',
  stroke: 'currentColor',
  strokeWidth: 2.25,
  strokeLinecap: 'round',
  strokeLinejoin: 'round',
  'aria-hidden': true,
  focusable: false,
} as const;

/**
 * The line icon of each machine state, one SVG path on a 24 × 24 grid, to be stroked in the
 * text colour (round caps and joins, no fill). The station, the wall board and the web app draw
 * the same shapes, always beside the state's word: colour and shape never carry a state alone.
 */
export const boardStateIcons: Record<BoardState, string> = {
  // A ring with a tick.
  available: 'M3 12a9 9 0 1 0 18 0a9 9 0 1 0-18 0M7.5 12.5l3 3 6-6.5',
  // A three-jaw chuck seen from the tailstock: the spindle is turning.
  in_use: 'M3 12a9 9 0 1 0 18 0a9 9 0 1 0-18 0M9.5 12a2.5 2.5 0 1 0 5 0a2.5 2.5 0 1 0-5 0M12 3v5.5M19.8 16.5l-4.8-2.8M4.2 16.5l4.8-2.8',
  // An hourglass: someone's time is coming.
  reserved: 'M6 3h12M6 21h12M8 3c0 5 8 5 8 9s-8 4-8 9M16 3c0 5-8 5-8 9s8 4 8 9',
  // A padlock.
  tagged_out: 'M6.5 11h11a1.5 1.5 0 0 1 1.5 1.5v7a1.5 1.5 0 0 1-1.5 1.5h-11a1.5 1.5 0 0 1-1.5-1.5v-7a1.5 1.5 0 0 1 1.5-1.5zM8 11V8a4 4 0 0 1 8 0v3M12 15v2.5',
  // A plug, struck through.
  offline: 'M9 2.5v4M15 2.5v4M7 6.5h10v4a5 5 0 0 1-10 0zM12 15.5V21M3 3l18 18',
};
