import type { ShopUpdateKind } from '@chuckkey/core';

/**
 * How services announce a committed change to the screens that show it live. Calls return at
 * once: the announcement is a hint sent after the answer, and a screen that misses one is put
 * right by its next fetch, so a change never waits for or fails on it.
 */
export interface Publisher {
  /** A change to the machine's visible state was committed: its new state goes out as `machine:update`. */
  machineChanged(machineId: string): void;
  /** Something shop-wide that the board shows changed (the supervisor on duty): `shop:update`. */
  shopChanged(kind: ShopUpdateKind): void;
  /** The station was revoked: its device's open sockets are closed, in every server process. */
  stationRevoked(stationId: string): void;
}

/** For code run without live updates (jobs' tests, scripts): announces nothing. */
export const quietPublisher: Publisher = {
  machineChanged() {},
  shopChanged() {},
  stationRevoked() {},
};
