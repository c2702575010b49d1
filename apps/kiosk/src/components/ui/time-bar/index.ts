export { TimeBar, type TimeBarItem } from './time-bar';
export type { TimeBarKind } from './time-bar-layout';
